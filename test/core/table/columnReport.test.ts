import { describe, expect, it } from "vitest";
import { missingCode } from "../../../src/core/table/finishColumn.ts";
import { distinctCap } from "../../../src/core/table/readOptions.ts";
import { readTableText } from "../../../src/core/table/readTableText.ts";
import { assertClose } from "../../assertClose.ts";

const lines = (header: string, cells: readonly string[]): string => `${header}\n${cells.join("\n")}\n`;

describe("column report", () => {
  const { table, report } = readTableText(
    "id,x,grade,note,blank\n" + "a,1.5,A,ok,\n" + "b,NaN,B,ok,NA\n" + "c,,A,,\n" + "d,-2,A,fine,\n" + "e,1.50,B,ok,\n",
  );
  const column = (name: string) => report.columns.find((c) => c.name === name)!;

  it("types: all-distinct text is an identifier, repeated text categorical, numbers numeric, nothing empty", () => {
    expect(report.columns.map((c) => c.type)).toEqual(["identifier", "numeric", "categorical", "categorical", "empty"]);
  });

  it("numeric x: 2 missing (NaN and empty), 2 distinct (1.5 and 1.50 are one number), min -2, max 1.5", () => {
    expect(column("x")).toMatchObject({ missing: 2, distinct: 2, distinctAtLeast: false, min: -2, max: 1.5, firstValues: ["1.5", "-2", "1.50"] }); // counted by hand
  });

  it("flags NaN as a missing token with its 1-based row and line, and counts it; an empty cell is not flagged", () => {
    expect(column("x").flagged).toEqual([{ row: 2, line: 3, column: "x", text: "NaN", reason: "missing-token" }]);
    expect(column("x").flaggedCount).toBe(1);
  });

  it("a text column's min and max are NaN and its distinct count skips missing cells", () => {
    expect(column("note")).toMatchObject({ missing: 1, distinct: 2, min: NaN, max: NaN, firstValues: ["ok", "ok", "fine", "ok"] });
  });

  it("a categorical column keeps level codes in first-seen order, with missingCode for a missing cell", () => {
    expect(table.columns[2]!.categories).toEqual({ codes: Uint32Array.of(0, 1, 0, 0, 1), levels: ["A", "B"] });
    expect(table.columns[3]!.categories).toEqual({ codes: Uint32Array.of(0, 0, missingCode, 1, 0), levels: ["ok", "fine"] });
    expect(table.columns[0]!.categories).toBeUndefined();
  });

  it("text cells that are not numbers in a numeric column are missing and flagged as not-a-number, first five in row order", () => {
    const cells = [...Array.from({ length: 140 }, (_, i) => String(i)), ...Array.from({ length: 7 }, (_, i) => `bad${i}`)];
    const numeric = readTableText(lines("v", cells)).report.columns[0]!; // 140 of 147 = 95.2% numbers
    expect(numeric).toMatchObject({ type: "numeric", missing: 7, flaggedCount: 7, min: 0, max: 139 });
    expect(numeric.flagged.map((f) => [f.row, f.text, f.reason])).toEqual([141, 142, 143, 144, 145].map((row) => [row, `bad${row - 141}`, "not-a-number"]));
  });
});

describe("column report: distinct counts and memory modes", () => {
  it(`counts distinct numbers exactly up to ${distinctCap}, then reports at least ${distinctCap}`, () => {
    const exact = readTableText(lines("v", Array.from({ length: distinctCap }, (_, i) => String(i)))).report.columns[0]!;
    expect(exact).toMatchObject({ type: "numeric", distinct: distinctCap, distinctAtLeast: false });
    const capped = readTableText(lines("v", Array.from({ length: 12_000 }, (_, i) => String(i)))).report.columns[0]!;
    expect(capped).toMatchObject({ type: "numeric", distinct: distinctCap, distinctAtLeast: true, min: 0, max: 11_999 });
  });

  it("text with more than 10,000 distinct values is an identifier with distinct ≥ cap, its texts kept", () => {
    const cells = Array.from({ length: 12_000 }, (_, i) => `tag-${i % 11_000}`);
    const { table, report } = readTableText(lines("t", cells));
    expect(report.columns[0]).toMatchObject({ type: "identifier", distinct: distinctCap, distinctAtLeast: true });
    expect(table.columns[0]!.texts?.[11_500]).toBe("tag-500");
  });

  it("a column of 12,000 texts then 300,000 numbers becomes numeric (96.2%) and flags its first text cells", () => {
    const cells = [...Array.from({ length: 12_000 }, (_, i) => `t${i}`), ...Array.from({ length: 300_000 }, (_, i) => String(i / 8))];
    const { table, report } = readTableText(lines("v", cells));
    expect(report.columns[0]).toMatchObject({ type: "numeric", missing: 12_000, flaggedCount: 12_000, min: 0, max: 299_999 / 8 });
    expect(report.columns[0]!.flagged.map((f) => f.text)).toEqual(["t0", "t1", "t2", "t3", "t4"]);
    expect(table.columns[0]!.numbers[12_008]).toBe(1); // 8 / 8
  });

  it("a column that looked numeric past 10,000 distinct values and then turns to text keeps its texts, numbers in shortest form, with a notice", () => {
    const cells = [...Array.from({ length: 10_500 }, (_, i) => `${i}.50`), ...Array.from({ length: 2_000 }, (_, i) => `w${i}`)];
    const { table, report } = readTableText(lines("v", cells)); // 10,500 of 12,500 = 84% numbers: text
    expect(report.columns[0]).toMatchObject({ type: "identifier", distinctAtLeast: true });
    expect(table.columns[0]!.texts?.slice(0, 2)).toEqual(["0.5", "1.5"]); // "0.50" written back as 0.5
    expect(table.columns[0]!.texts?.[10_500]).toBe("w0");
    expect(report.notices.map((n) => n.code)).toContain("texts-reformatted");
  });

  it("the numbers of a text column are still parsed (NaN elsewhere), as before", () => {
    assertClose(readTableText("x,y\n1,0\n2,0\nthree,0\n").table.columns[0]!.numbers, [1, 2, NaN]);
  });
});
