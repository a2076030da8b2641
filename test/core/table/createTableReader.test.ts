import { describe, expect, it } from "vitest";
import { createTableReader } from "../../../src/core/table/createTableReader.ts";
import { maxRecordLength } from "../../../src/core/table/readOptions.ts";
import { readTableText } from "../../../src/core/table/readTableText.ts";
import { assertClose } from "../../assertClose.ts";
import { outcomeOf, readInChunksOf, readInPieces } from "./readerSupport.ts";

const texts = (text: string, column = 0): readonly string[] | null => readTableText(text).table.columns[column]!.texts;

describe("createTableReader: records", () => {
  it("reads RFC 4180 quoting: delimiters, doubled quotes and line breaks inside quotes", () => {
    const text = 'name,x\n"Smith, J",1\n"say ""hi""",2\n"two\nlines",3\n';
    expect(texts(text)).toEqual(["Smith, J", 'say "hi"', "two\nlines"]); // worked by hand from RFC 4180 §2
  });

  it("pushing one character at a time gives the same table and report as one push", () => {
    const text = 'id;x;note\r\na;1,5;"x;\r\ny"\r\n\r\nb;NA;z\r\n';
    expect(readInChunksOf(text, 1)).toEqual(readInPieces(text));
  });

  it("reads \\n, \\r\\n and lone \\r line ends, mixed in one file, as the same records", () => {
    const table = outcomeOf(readInPieces("x,y\r\n1,2\r3,4\n5,6\r\n")).table;
    expect(table.rows).toBe(3);
    assertClose(table.columns[1]!.numbers, [2, 4, 6]);
  });

  it("turns a quoted \\r\\n into \\n", () => {
    expect(texts('a,b\n"p\r\nq",1\nr,2\n')).toEqual(["p\nq", "r"]);
  });

  it("drops a UTF-8 byte-order mark even when it arrives alone in the first chunk", () => {
    expect(outcomeOf(readInPieces("\ufeffx,y\n1,2\n", [1])).table.columns[0]!.name).toBe("x");
  });

  it("counts lines: a quoted line break and a blank line move the line of later records (flagged cell on line 6)", () => {
    const report = readTableText('id,x\na,1\n"b\nc",2\n\nd,NA\n').report;
    // Line 1 header, 2 a, 3–4 "b\nc", 5 blank, 6 d (worked by hand).
    expect(report.columns[1]!.flagged).toEqual([{ row: 3, line: 6, column: "x", text: "NA", reason: "missing-token" }]);
    expect(report.lines).toBe(6);
  });

  it("reports rows read so far while reading, for progress", () => {
    const reader = createTableReader();
    reader.push(`x\n${"1\n".repeat(40_000)}`); // 80,002 characters: past the 64 Ki held back for detection
    expect(reader.rowsRead).toBeGreaterThan(30_000);
    expect(reader.finish().table.rows).toBe(40_000);
  });
});

describe("createTableReader: format", () => {
  it.each([
    ["a,b\n1,2\n", ","],
    ["a;b\n1;2\n", ";"],
    ["a\tb\n1\t2\n", "\t"],
    ["a|b\n1|2\n", "|"],
  ])("detects the delimiter of %j as %j", (text, delimiter) => {
    expect(readTableText(text).report.format).toMatchObject({ kind: "delimited", delimiter, delimiterDetected: true });
  });

  it("detects a decimal comma after semicolons and reads 12,5 as 12.5", () => {
    const { table, report } = readTableText("x;y\n12,5;1\n-0,5;2\n");
    expect(report.format).toEqual({ kind: "delimited", delimiter: ";", decimal: ",", delimiterDetected: true, decimalDetected: true });
    assertClose(table.columns[0]!.numbers, [12.5, -0.5]); // worked by hand
  });

  it("an explicit delimiter and decimal mark override detection", () => {
    const { table, report } = readTableText("x;y\n1.5;2\n", { delimiter: ",", decimal: "," });
    expect(report.format).toMatchObject({ delimiter: ",", decimal: ",", delimiterDetected: false, decimalDetected: false });
    expect(table.columns.map((c) => c.name)).toEqual(["x;y"]);
  });

  it("rejects an unknown delimiter, decimal mark and ragged policy by name", () => {
    expect(() => createTableReader({ delimiter: ":" as ",", decimal: "." })).toThrow('invalid delimiter: ":"');
    expect(() => createTableReader({ decimal: "·" as "." })).toThrow('invalid decimal mark: "·"');
    expect(() => createTableReader({ ragged: "trim" as "pad" })).toThrow('invalid ragged-record policy: "trim"');
  });
});

describe("createTableReader: bad input gives one clear error", () => {
  it.each([
    ["", "the file is empty"],
    ["\n\n\r\n", "the file is empty"],
    [",,\n", "the file is empty"],
    ["x,y\n", "the file has a header but no data records"],
    ["x,y\n\n\n", "the file has a header but no data records"],
    ['x,y\n1,"2\n3,4\n', "a quoted field is never closed: the record that starts on line 2 runs to the end of the file"],
    ["PK\u0003\u0004\u0000\u0000", "this looks like a binary file: it has NUL characters in its first 1 KiB"],
  ])("%j → %s", (text, message) => {
    expect(readInPieces(text)).toEqual({ error: message });
  });

  it("a record longer than 16 Mi characters (an open quote, or no line breaks) stops the read with its line", () => {
    const reader = createTableReader();
    reader.push('x,y\n1,2\n3,"');
    const long = "z".repeat(1 << 20);
    const push = (): void => {
      for (let k = 0; k <= maxRecordLength >> 20; ++k) reader.push(long);
    };
    expect(push).toThrow(`a record is longer than ${maxRecordLength} characters from line 3: is a quote left open, or are there no line breaks?`);
  });

  it("after an error every later call throws the same error", () => {
    const reader = createTableReader();
    expect(() => reader.push("\u0000".repeat(70_000))).toThrow("this looks like a binary file");
    expect(() => reader.push("x\n1\n")).toThrow("this looks like a binary file");
    expect(() => reader.finish()).toThrow("this looks like a binary file");
  });
});

describe("createTableReader: decisions and notices", () => {
  it("ragged records are padded with empty cells and cut under ragged: pad, with a notice naming rows and lines", () => {
    const { table, report } = readTableText("a,b\n1,2\n3\n4,5,6\n", { ragged: "pad" });
    assertClose(table.columns[0]!.numbers, [1, 3, 4]);
    assertClose(table.columns[1]!.numbers, [2, NaN, 5]);
    expect(report.notices).toContainEqual({ code: "ragged-records", message: "padded short records with empty cells and cut long ones to the header's 2 fields: row 2 has 1 fields, row 3 has 3 fields (lines 3, 4)" });
  });

  it("one data record loads, with a notice that scaling needs two", () => {
    const { table, report } = readTableText("x,y\n1,2\n");
    expect(table.rows).toBe(1);
    expect(report.notices.map((n) => n.code)).toEqual(["one-row"]);
  });

  it("no numeric column loads, with a notice naming the columns, delimiter and decimal mark", () => {
    expect(readTableText("name,town\nann,ely\nbob,ely\n").report.notices).toEqual([
      { code: "no-numeric-column", message: 'no numeric column among name, town (read with delimiter "," and decimal mark ".")' },
    ]);
  });

  it("renamed columns come with a notice each; the names are never merged", () => {
    const { table, report } = readTableText("a,a,,b\n1,2,3,4\n5,6,7,8\n");
    expect(table.columns.map((c) => c.name)).toEqual(["a", "a_2", "column_3", "b"]);
    expect(report.columns.map((c) => c.header)).toEqual(["a", "a", "", "b"]);
    expect(report.notices).toEqual([
      { code: "renamed-column", message: 'column 2 repeats the name "a": renamed it a_2' },
      { code: "renamed-column", message: "column 3 has no name: called it column_3" },
    ]);
  });

  it("a stray quote after a closing quote is read as text with a notice naming the row and line", () => {
    const { table, report } = readTableText('a,b\n1,"x"y,"z"\n3,4\n5,6\n', { ragged: "pad" });
    expect(table.columns[1]!.texts?.[0]).toBe('x"y,"z'); // papaparse keeps the malformed field whole up to the next closing quote
    expect(report.notices).toContainEqual({ code: "malformed-quotes", message: "a quote inside an unquoted field or after a closing quote was read as text in row 1 (line 2)" });
  });
});
