import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { deviation, mean as d3Mean } from "d3-array";
import { zScore, type NumericTable } from "../../../src/core/index.ts";
import { assertClose } from "../../assertClose.ts";

const table = (rows: number, columns: number, names: string[], values: number[]): NumericTable =>
  Object.freeze({ rows, columns, names: Object.freeze(names), values: Float64Array.from(values) });

// A column of 2..60 multiples of 1/64 (exact in binary) that is not constant.
const column = fc
  .array(fc.integer({ min: -64_000, max: 64_000 }).map((k) => k / 64), { minLength: 2, maxLength: 60 })
  .filter((xs) => xs.some((x) => x !== xs[0]));

describe("zScore", () => {
  it("z-scores of 1, 2, 3 are −1, 0, 1 (mean 2, sample sd 1)", () => {
    assertClose(zScore(table(3, 1, ["x"], [1, 2, 3])).table.values, [-1, 0, 1], { absolute: 1e-15 }); // worked by hand
  });

  it("z-scores of 2, 4, 4, 4, 5, 5, 7, 9 are (x − 5) / √(32/7)", () => {
    const xs = [2, 4, 4, 4, 5, 5, 7, 9];
    const sd = Math.sqrt(32 / 7); // worked by hand: mean 5, squared deviations sum 32, n − 1 = 7
    assertClose(zScore(table(8, 1, ["x"], xs)).table.values, xs.map((x) => (x - 5) / sd), { absolute: 1e-15 });
  });

  it("scales each column of a row-major table on its own: (1, 10), (2, 30), (3, 50) → (−1, −1), (0, 0), (1, 1)", () => {
    // x: mean 2, sd 1. y: mean 30, deviations −20, 0, 20, variance 800/2 = 400, sd 20.
    const scaled = zScore(table(3, 2, ["x", "y"], [1, 10, 2, 30, 3, 50]));
    assertClose(scaled.table.values, [-1, -1, 0, 0, 1, 1], { absolute: 1e-15 }); // worked by hand
    expect(scaled.constantColumns).toEqual([]);
  });

  it("a constant column becomes all 0 and is named in constantColumns; the other column is still scaled", () => {
    const scaled = zScore(table(3, 2, ["flat", "x"], [0.7, 1, 0.7, 2, 0.7, 3]));
    assertClose(scaled.table.values, [0, -1, 0, 0, 0, 1], { absolute: 1e-15 }); // worked by hand
    expect(scaled.constantColumns).toEqual(["flat"]);
  });

  it("a one-row table is constant in every column: all 0, every column named", () => {
    const scaled = zScore(table(1, 2, ["a", "b"], [5, -3]));
    expect(Array.from(scaled.table.values)).toEqual([0, 0]);
    expect(scaled.constantColumns).toEqual(["a", "b"]);
  });

  it("a table with no rows gives no values and names every column constant", () => {
    const scaled = zScore(table(0, 2, ["a", "b"], []));
    expect(scaled.table.values.length).toBe(0);
    expect(scaled.constantColumns).toEqual(["a", "b"]);
  });

  it("returns a new table and leaves the input unchanged, keeping rows, columns and names", () => {
    const input = table(3, 1, ["x"], [1, 2, 3]);
    const scaled = zScore(input);
    expect(scaled.table.values).not.toBe(input.values);
    expect(Array.from(input.values)).toEqual([1, 2, 3]);
    expect(scaled.table).toMatchObject({ rows: 3, columns: 1, names: ["x"] });
  });

  it("matches (x − mean) / sd with d3-array's mean and deviation (the n − 1 sample sd) on random columns", () => {
    fc.assert(
      fc.property(column, (xs) => {
        const m = d3Mean(xs)!; // d3-array mean
        const s = deviation(xs)!; // d3-array deviation (n − 1)
        assertClose(zScore(table(xs.length, 1, ["x"], xs)).table.values, xs.map((x) => (x - m) / s), { absolute: 1e-9, relative: 1e-9 });
      }),
    );
  });

  it("scaled columns have mean 0 and sample sd 1", () => {
    fc.assert(
      fc.property(column, (xs) => {
        const z = zScore(table(xs.length, 1, ["x"], xs)).table.values;
        assertClose(d3Mean(z)!, 0, { absolute: 1e-9 }); // simple formula
        assertClose(deviation(z)!, 1, { relative: 1e-9 }); // simple formula
      }),
    );
  });

  it("is invariant under translation of a column", () => {
    fc.assert(
      fc.property(column, fc.integer({ min: -10_000, max: 10_000 }), (xs, shift) => {
        const z = zScore(table(xs.length, 1, ["x"], xs)).table.values;
        const moved = zScore(table(xs.length, 1, ["x"], xs.map((x) => x + shift))).table.values;
        assertClose(moved, z, { absolute: 1e-8 });
      }),
    );
  });

  it("is invariant under positive scaling of a column", () => {
    fc.assert(
      fc.property(column, fc.constantFrom(0.5, 2, 1024, 1 / 1024), (xs, factor) => {
        const z = zScore(table(xs.length, 1, ["x"], xs)).table.values;
        const stretched = zScore(table(xs.length, 1, ["x"], xs.map((x) => x * factor))).table.values;
        assertClose(stretched, z, { absolute: 1e-9 });
      }),
    );
  });
});
