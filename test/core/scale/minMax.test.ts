import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { extent } from "d3-array";
import { minMax, type NumericTable } from "../../../src/core/index.ts";
import { assertClose } from "../../assertClose.ts";

const table = (rows: number, columns: number, names: string[], values: number[]): NumericTable =>
  Object.freeze({ rows, columns, names: Object.freeze(names), values: Float64Array.from(values) });

// 2..60 multiples of 1/64 (exact in binary), not all equal.
const column = fc
  .array(fc.integer({ min: -64_000, max: 64_000 }).map((k) => k / 64), { minLength: 2, maxLength: 60 })
  .filter((xs) => xs.some((x) => x !== xs[0]));

describe("minMax", () => {
  it("2, 4, 6 become 0, 0.5, 1 (the JSDoc example)", () => {
    assertClose(minMax(table(3, 1, ["x"], [2, 4, 6])).table.values, [0, 0.5, 1]); // worked by hand: (x − 2) / 4
  });

  it("−1, 3, 0 become 0, 1, 0.25 in the original row order", () => {
    assertClose(minMax(table(3, 1, ["x"], [-1, 3, 0])).table.values, [0, 1, 0.25]); // worked by hand: (x + 1) / 4
  });

  it("scales each column of a row-major table on its own: (0, 10), (5, 30), (10, 20) → (0, 0), (0.5, 1), (1, 0.5)", () => {
    const scaled = minMax(table(3, 2, ["a", "b"], [0, 10, 5, 30, 10, 20]));
    assertClose(scaled.table.values, [0, 0, 0.5, 1, 1, 0.5]); // worked by hand: a / 10, (b − 10) / 20
    expect(scaled.constantColumns).toEqual([]);
  });

  it("a constant column (max = min) becomes all 0 and is named; the other column is still scaled", () => {
    const scaled = minMax(table(3, 2, ["flat", "x"], [4, 1, 4, 2, 4, 3]));
    assertClose(scaled.table.values, [0, 0, 0, 0.5, 0, 1], { absolute: 0 }); // worked by hand
    expect(scaled.constantColumns).toEqual(["flat"]);
  });

  it("matches (x − min) / (max − min) with d3-array's extent on random columns, and maps min to 0 and max to 1 exactly", () => {
    fc.assert(
      fc.property(column, (xs) => {
        const [lo, hi] = extent(xs) as [number, number]; // d3-array extent
        const scaled = minMax(table(xs.length, 1, ["x"], xs)).table.values;
        assertClose(scaled, xs.map((x) => (x - lo) / (hi - lo)), { relative: 1e-15, absolute: 1e-15 }); // d3-array extent; a few ulps allowed (common practice, no source)
        expect(Math.min(...scaled)).toBe(0); // worked by hand: (lo − lo) / span
        expect(Math.max(...scaled)).toBe(1); // worked by hand: span / span
      }),
    );
  });
});
