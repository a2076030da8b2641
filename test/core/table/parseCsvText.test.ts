import { describe, expect, it } from "vitest";
import { parseCsvText } from "../../../src/core/index.ts";
import { assertClose } from "../../assertClose.ts";

describe("parseCsvText", () => {
  it("reads a header and records into numeric and text columns, column-major", () => {
    const table = parseCsvText("name,x,y\nann,1,2.5\nbob,3,-4\n");
    expect(table.rows).toBe(2);
    expect(table.columns.map((c) => [c.name, c.kind, c.missing])).toEqual([
      ["name", "text", 0],
      ["x", "numeric", 0],
      ["y", "numeric", 0],
    ]);
    expect(table.columns[0]!.texts).toEqual(["ann", "bob"]);
    assertClose(table.columns[1]!.numbers, [1, 3]);
    assertClose(table.columns[2]!.numbers, [2.5, -4]);
    expect(table.columns[1]!.texts).toBeNull();
  });

  it("row k is data record k + 1: blank lines are not records and a quoted newline does not start one", () => {
    const table = parseCsvText('id,x,note\na,0,"plain"\nb,1,"two\nlines"\n\nc,,missing\n\nd,2,ok\n');
    // Records after the header: a (row 0), b (row 1, its note spans two lines), c (row 2), d (row 3).
    expect(table.rows).toBe(4);
    expect(table.columns[0]!.texts).toEqual(["a", "b", "c", "d"]);
    expect(table.columns[2]!.texts).toEqual(["plain", "two\nlines", "missing", "ok"]);
    assertClose(table.columns[1]!.numbers, [0, 1, NaN, 2]);
  });

  it("missing cells are NaN in a numeric column and counted (3 of 5 in a one-column file)", () => {
    const column = parseCsvText("x\n1\nNA\n\n3\n?\n").columns[0]!;
    // One column: the empty line is a record with an empty cell, so the rows are 1, NA, empty, 3, ? (worked by hand).
    expect(column.kind).toBe("numeric");
    expect(column.missing).toBe(3);
    assertClose(column.numbers, [1, NaN, NaN, 3, NaN]);
  });

  it("a column with one non-numeric cell is text and keeps its raw cells", () => {
    const column = parseCsvText("x,y\n1,0\n2,0\nthree,0\n").columns[0]!;
    expect(column.kind).toBe("text");
    expect(column.texts).toEqual(["1", "2", "three"]);
  });

  it("a column with every cell missing is text of type empty", () => {
    const column = parseCsvText("x,y\nNA,1\n,2\n").columns[0]!;
    expect(column.kind).toBe("text");
    expect(column.type).toBe("empty");
    expect(column.missing).toBe(2);
    expect(column.texts).toEqual(["NA", ""]);
  });

  it("drops a byte-order mark from the first header name", () => {
    expect(parseCsvText("\ufeffx,y\n1,2\n").columns[0]!.name).toBe("x");
  });

  it("reads CRLF line ends and a semicolon delimiter", () => {
    const table = parseCsvText("a;b\r\n1;2\r\n3;4\r\n");
    expect(table.columns.map((c) => c.name)).toEqual(["a", "b"]);
    assertClose(table.columns[1]!.numbers, [2, 4]);
  });

  it("names empty header cells column_j and suffixes repeats _2, _3", () => {
    const table = parseCsvText("a,a, ,a\n1,2,3,4\n");
    expect(table.columns.map((c) => c.name)).toEqual(["a", "a_2", "column_3", "a_3"]);
  });

  it("throws for an empty file and for a header without data", () => {
    expect(() => parseCsvText("")).toThrow("the file is empty");
    expect(() => parseCsvText("\n\n")).toThrow("the file is empty");
    expect(() => parseCsvText("x,y\n")).toThrow("the file has a header but no data records");
  });

  it("throws one error naming the ragged records by data-record number and line", () => {
    // Rows 2 and 3 start on lines 3 and 5: the blank line 4 is not a record (worked by hand).
    expect(() => parseCsvText("a,b\n1,2\n3\n\n4,5,6\n")).toThrow("ragged records: the header has 2 fields but row 2 has 1 fields, row 3 has 3 fields (lines 3, 5)");
  });

  it("lists at most five ragged records and counts the rest", () => {
    const text = `a,b\n${Array.from({ length: 7 }, () => "1").join("\n")}\n`;
    expect(() => parseCsvText(text)).toThrow(/row 5 has 1 fields and 2 more \(lines 2, 3, 4, 5, 6\)$/);
  });

  it("a column is numeric when at least 95% of its present cells are numbers: 19 of 20 is numeric, the odd cell missing", () => {
    const column = parseCsvText(`x\n${[...Array.from({ length: 19 }, (_, i) => String(i)), "oops"].join("\n")}\n`).columns[0]!;
    expect(column).toMatchObject({ kind: "numeric", type: "numeric", missing: 1, texts: null });
    expect(column.numbers[19]).toBeNaN();
  });

  it("18 numbers of 20 present cells (90%) make a text column", () => {
    const cells = [...Array.from({ length: 18 }, (_, i) => String(i)), "oops", "again"];
    expect(parseCsvText(`x\n${cells.join("\n")}\n`).columns[0]!.kind).toBe("text");
  });
});
