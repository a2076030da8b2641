import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { quantile } from "d3-array";
import { robust, type NumericTable } from "../../../src/core/index.ts";
import { assertClose } from "../../assertClose.ts";

const table = (rows: number, columns: number, names: string[], values: number[]): NumericTable =>
  Object.freeze({ rows, columns, names: Object.freeze(names), values: Float64Array.from(values) });

// 2..60 multiples of 1/64 (exact in binary), in any order, with a nonzero interquartile range (type 7).
const column = fc
  .array(fc.integer({ min: -64_000, max: 64_000 }).map((k) => k / 64), { minLength: 2, maxLength: 60 })
  .filter((xs) => quantile(xs, 0.75)! > quantile(xs, 0.25)!);

describe("robust", () => {
  it("1, 2, 3, 4, 100 become −1, −0.5, 0, 0.5, 48.5 (median 3, quartiles 2 and 4, IQR 2; the JSDoc example)", () => {
    assertClose(robust(table(5, 1, ["x"], [1, 2, 3, 4, 100])).table.values, [-1, -0.5, 0, 0.5, 48.5]); // worked by hand: (x − 3) / 2
  });

  it("1, 2, 3, 4 become −1, −1/3, 1/3, 1 (type 7: median 2.5, Q1 1.75, Q3 3.25, IQR 1.5)", () => {
    // h = (n − 1)p: p = 0.25 → h = 0.75 → 1 + 0.75 = 1.75; p = 0.5 → 2.5; p = 0.75 → h = 2.25 → 3.25.
    assertClose(robust(table(4, 1, ["x"], [1, 2, 3, 4])).table.values, [-1, -1 / 3, 1 / 3, 1]); // worked by hand: (x − 2.5) / 1.5
  });

  it("sorts a copy: 5, 1, 4, 2, 3 become 1, −1, 0.5, −0.5, 0 and the input is unchanged", () => {
    const input = table(5, 1, ["x"], [5, 1, 4, 2, 3]);
    assertClose(robust(input).table.values, [1, -1, 0.5, -0.5, 0]); // worked by hand: median 3, IQR 4 − 2
    expect(Array.from(input.values)).toEqual([5, 1, 4, 2, 3]); // the input as given
  });

  it("1, 1, 1, 1, 5 has zero IQR though its extremes differ: it becomes all 0 and is named", () => {
    // Sorted 1, 1, 1, 1, 5: Q1 at h = 1 is 1, Q3 at h = 3 is 1, IQR 0 (worked by hand).
    const scaled = robust(table(5, 2, ["spiky", "x"], [1, 1, 1, 2, 1, 3, 1, 4, 5, 100]));
    assertClose(scaled.table.values, [0, -1, 0, -0.5, 0, 0, 0, 0.5, 0, 48.5]); // worked by hand
    expect(scaled.constantColumns).toEqual(["spiky"]);
  });

  it("matches (x − median) / IQR with d3-array's quantile (type 7, R's default) on random columns", () => {
    fc.assert(
      fc.property(column, (xs) => {
        const median = quantile(xs, 0.5)!; // d3-array quantile
        const iqr = quantile(xs, 0.75)! - quantile(xs, 0.25)!; // d3-array quantile
        assertClose(robust(table(xs.length, 1, ["x"], xs)).table.values, xs.map((x) => (x - median) / iqr), { relative: 1e-12, absolute: 1e-12 }); // d3-array quantile (type 7)
      }),
    );
  });
});
