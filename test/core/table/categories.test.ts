import { describe, expect, it } from "vitest";
import { categoryCounts, majorityLevel } from "../../../src/core/table/categoryCounts.ts";
import { missingCode } from "../../../src/core/table/finishColumn.ts";
import { oneHot } from "../../../src/core/table/oneHot.ts";
import { readTableText } from "../../../src/core/table/readTableText.ts";
import { assertClose } from "../../assertClose.ts";

const grades = Object.freeze({ codes: Uint32Array.of(0, 1, 0, missingCode, 2), levels: ["lo", "mid", "hi"] });

describe("oneHot", () => {
  it("one column per level, 1 where the row has it (JSDoc example)", () => {
    const table = oneHot({ codes: Uint32Array.of(0, 1, 0), levels: ["a", "b"] }, { name: "g" });
    expect(table).toMatchObject({ rows: 3, columns: 2, names: ["g=a", "g=b"] });
    assertClose(table.values, [1, 0, 0, 1, 1, 0]);
  });

  it("puts the weight in the indicator and NaN across a row with no level", () => {
    assertClose(oneHot(grades, { name: "grade", weight: 0.5 }).values, [0.5, 0, 0, 0, 0.5, 0, 0.5, 0, 0, NaN, NaN, NaN, 0, 0, 0.5]);
  });

  it("encodes only the rows asked for, in their order", () => {
    assertClose(oneHot(grades, { name: "grade", rows: Uint32Array.of(4, 1) }).values, [0, 0, 1, 0, 1, 0]);
  });

  it("rows with different levels are w·√2 apart in Euclidean distance (w = 2 → √8)", () => {
    const { values } = oneHot(grades, { name: "g", weight: 2 });
    const d = Math.hypot(...[0, 1, 2].map((k) => values[0 * 3 + k]! - values[1 * 3 + k]!));
    assertClose(d, Math.sqrt(8)); // worked by hand: (2 − 0)² + (0 − 2)² = 8
  });

  it("throws for a negative weight and a row out of range", () => {
    expect(() => oneHot(grades, { name: "g", weight: -1 })).toThrow("invalid one-hot weight: -1");
    expect(() => oneHot(grades, { name: "g", rows: [9] })).toThrow("row out of range: 9");
  });

  it("works on a column read from text", () => {
    const column = readTableText("g,x\nb,1\na,2\nb,3\n").table.columns[0]!;
    expect(oneHot(column.categories!, { name: column.name }).names).toEqual(["g=b", "g=a"]);
  });
});

describe("categoryCounts and majorityLevel", () => {
  it("counts rows per level, skipping a row with no level (JSDoc example)", () => {
    expect(categoryCounts({ codes: Uint32Array.of(0, 1, 1, missingCode), levels: ["a", "b"] })).toEqual(Uint32Array.of(1, 2));
  });

  it("counts among given rows only; shares follow as count / total", () => {
    expect(categoryCounts(grades, [0, 2, 3, 4])).toEqual(Uint32Array.of(2, 0, 1));
  });

  it("majority ties go to the lowest level; no rows gives -1 (JSDoc example)", () => {
    expect(majorityLevel(Uint32Array.of(2, 3, 3))).toBe(1);
    expect(majorityLevel(Uint32Array.of(0, 0))).toBe(-1);
  });
});
