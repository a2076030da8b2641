import { describe, expect, it } from "vitest";
import { CellKind, cellKind } from "../../../src/core/table/cellKind.ts";
import { createTableReader } from "../../../src/core/table/createTableReader.ts";
import { readTableText } from "../../../src/core/table/readTableText.ts";
import { assertClose } from "../../assertClose.ts";

describe("reader JSDoc examples and small decisions", () => {
  it("createTableReader: push x;y / 1,5;2 then finish gives x = [1.5] (JSDoc example)", () => {
    const reader = createTableReader();
    reader.push("x;y\n1,5;2\n");
    assertClose(reader.finish().table.columns[0]!.numbers, [1.5]); // decimal comma detected, worked by hand
  });

  it("readTableText: a;b / 1,5;2 reads with ';' and ',' (JSDoc example)", () => {
    expect(readTableText("a;b\n1,5;2\n").report.format).toEqual({ kind: "delimited", delimiter: ";", decimal: ",", delimiterDetected: true, decimalDetected: true });
  });

  it("cellKind: ' Inf ' is a missing token (JSDoc example); ' 7 ' a number; '   ' blank; 'None' text", () => {
    expect(cellKind(" Inf ", ".")).toEqual({ kind: CellKind.token, value: NaN });
    expect(cellKind(" 7 ", ".")).toEqual({ kind: CellKind.number, value: 7 });
    expect(cellKind("            ", ".").kind).toBe(CellKind.blank);
    expect(cellKind("None", ".").kind).toBe(CellKind.text);
  });

  it("finish twice returns the same outcome; a push after finish throws", () => {
    const reader = createTableReader();
    reader.push("x\n1\n2\n");
    const first = reader.finish();
    expect(reader.finish()).toBe(first);
    expect(() => reader.push("3\n")).toThrow("cannot push text after finish");
  });

  it("a blank header over data names every column column_j, with notices", () => {
    const { table, report } = readTableText(",,\n1,2,3\n4,5,6\n");
    expect(table.columns.map((c) => c.name)).toEqual(["column_1", "column_2", "column_3"]);
    expect(report.notices.filter((n) => n.code === "renamed-column")).toHaveLength(3);
  });
});
