import { describe, expect, it } from "vitest";
import { cellText } from "../../../src/core/table/cellText.ts";
import { looksLikeRowNumber } from "../../../src/core/table/looksLikeRowNumber.ts";
import { readTableText } from "../../../src/core/table/readTableText.ts";
import { outcomeOf, readInChunksOf } from "./readerSupport.ts";

const flagOf = (text: string, name: string): boolean => readTableText(text).report.columns.find((c) => c.name === name)!.looksLikeRowNumber;

describe("looksLikeRowNumber: distinct integers, consecutive or written as ids", () => {
  it("JSDoc example: 3, 1, 2 looks like a row number", () => {
    expect(looksLikeRowNumber(Float64Array.of(3, 1, 2), { hasOriginalTexts: false, notNumbers: 0 })).toBe(true); // worked by hand: 1..3 in another order
  });

  it("a column 1, 2, 3 is flagged and a measurement beside it is not; a notice suggests the row label", () => {
    const { report } = readTableText("n,x\n1,0.5\n2,0.7\n3,0.1\n");
    expect(report.columns.map((c) => c.looksLikeRowNumber)).toEqual([true, false]); // worked by hand
    expect(report.notices.find((n) => n.code === "row-number-column")?.message).toBe('column n looks like a row number or numeric id (distinct whole numbers): suggested role "row label", not a feature');
  });

  it("consecutive from any start and with a missing cell is flagged (101, 103, empty, 102)", () => {
    expect(flagOf("n,x\n101,1\n103,2\n,3\n102,4\n", "n")).toBe(true); // worked by hand: 101..103, one missing
  });

  it("not flagged: a gap (1, 2, 4), a repeat (1, 1, 2, 3), a fraction (1, 2, 2.5), two values (1, 2), text in the column", () => {
    expect(flagOf("n\n1\n2\n4\n", "n")).toBe(false); // worked by hand: range 4 over 3 values
    expect(flagOf("n\n1\n1\n2\n3\n", "n")).toBe(false); // a repeat
    expect(flagOf("n\n1\n2\n2.5\n", "n")).toBe(false); // not an integer
    expect(flagOf("n,x\n1,1\n2,1\n", "n")).toBe(false); // fewer than 3 values
    const many = `n\n${Array.from({ length: 40 }, (_, i) => String(i + 1)).join("\n")}\nabc\n`;
    expect(flagOf(many, "n")).toBe(false); // 40 numbers and one text cell: numeric, but the text is flagged
  });

  it("zero-padded ids that are not consecutive are flagged (007, 012, 100)", () => {
    expect(flagOf("id,x\n007,1\n012,2\n100,3\n", "id")).toBe(true); // leading zeros, distinct integers
  });
});

describe("original texts of a numeric column", () => {
  it("cellText returns 007 and 12345678901234567890123 exactly; plain numbers as their shortest form", () => {
    const { table } = readTableText("id,x\n007,1\n12345678901234567890123,2\n8,3\n,4\n");
    const id = table.columns[0]!;
    expect(id.kind).toBe("numeric");
    expect([0, 1, 2, 3].map((r) => cellText(id, r))).toEqual(["007", "12345678901234567890123", "8", ""]); // as written in the file
    expect(cellText(table.columns[1]!, 1)).toBe("2");
  });

  it("a column of 20,000 zero-padded ids (past the 10,000-level dictionary) keeps every text, in any chunking", () => {
    const ids = Array.from({ length: 20_000 }, (_, i) => String(i + 1).padStart(6, "0"));
    const text = `id,x\n${ids.map((id, i) => `${id},${i % 7}`).join("\n")}\n`;
    for (const size of [4096, text.length]) {
      const { table, report } = outcomeOf(readInChunksOf(text, size));
      const id = table.columns[0]!;
      expect(cellText(id, 0)).toBe("000001");
      expect(cellText(id, 14_999)).toBe("015000");
      expect(cellText(id, 19_999)).toBe("020000");
      expect(report.columns[0]!.looksLikeRowNumber).toBe(true); // 1..20,000
    }
  });

  it("a column with no such cells has no originalTexts", () => {
    expect(readTableText("x\n1\n2.5\n-3\n").table.columns[0]!.originalTexts).toBeUndefined();
  });
});
