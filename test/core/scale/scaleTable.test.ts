// scaleTable: one scaling for every column, constant columns reported, then weights x_j ← w_j · x_j.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { deviation, mean as d3Mean } from "d3-array";
import { scaleTable, zScore, type NumericTable, type ScaleName } from "../../../src/core/index.ts";
import { assertClose } from "../../assertClose.ts";

const table = (rows: number, columns: number, names: string[], values: number[]): NumericTable =>
  Object.freeze({ rows, columns, names: Object.freeze(names), values: Float64Array.from(values) });

// 2..60 multiples of 1/64 (exact in binary), not all equal.
const column = fc
  .array(fc.integer({ min: -64_000, max: 64_000 }).map((k) => k / 64), { minLength: 2, maxLength: 60 })
  .filter((xs) => xs.some((x) => x !== xs[0]));

const columnOf = (t: NumericTable, j: number): number[] => Array.from({ length: t.rows }, (_, i) => t.values[i * t.columns + j]!);

describe("scaleTable scalings", () => {
  it("zscore divides by the sample sd (n − 1): d3-array's deviation of the result is 1 and it equals zScore", () => {
    fc.assert(
      fc.property(column, (xs) => {
        const scaled = scaleTable(table(xs.length, 1, ["x"], xs), "zscore").table.values;
        const s = deviation(xs)!; // d3-array deviation (n − 1)
        const m = d3Mean(xs)!; // d3-array mean
        assertClose(scaled, xs.map((x) => (x - m) / s), { relative: 1e-9, absolute: 1e-9 }); // d3-array mean and deviation; 1e-9 as in zScore.test.ts (common practice, no source)
        assertClose(deviation(scaled)!, 1, { relative: 1e-9 }); // d3-array deviation
        expect(Array.from(scaled)).toEqual(Array.from(zScore(table(xs.length, 1, ["x"], xs)).table.values));
      }),
    );
  });

  it("none leaves values unchanged and reports no constant column, even a constant one", () => {
    const input = table(3, 2, ["flat", "x"], [7, 1, 7, 5, 7, -2]);
    const scaled = scaleTable(input, "none");
    expect(Array.from(scaled.table.values)).toEqual([7, 1, 7, 5, 7, -2]); // the input as given
    expect(scaled.constantColumns).toEqual([]);
  });

  const constantCases: [ScaleName, string[]][] = [
    // columns: flat (4, 4, 4, 4, 4), spiky (1, 1, 1, 1, 5), x (1, 2, 3, 4, 100)
    ["zscore", ["flat"]], // worked by hand: spiky has sd > 0
    ["minmax", ["flat"]], // worked by hand: spiky has max > min
    ["robust", ["flat", "spiky"]], // worked by hand: spiky has Q1 = Q3 = 1
  ];
  for (const [scale, expected] of constantCases) {
    it(`${scale}: the constant columns are ${expected.join(" and ")}, set to 0; x is still scaled`, () => {
      const input = table(5, 3, ["flat", "spiky", "x"], [4, 1, 1, 4, 1, 2, 4, 1, 3, 4, 1, 4, 4, 5, 100]);
      const scaled = scaleTable(input, scale);
      expect(scaled.constantColumns).toEqual(expected);
      for (const name of expected) expect(columnOf(scaled.table, input.names.indexOf(name))).toEqual([0, 0, 0, 0, 0]); // worked by hand: constant columns become 0
      expect(new Set(columnOf(scaled.table, 2)).size).toBe(5); // worked by hand: 1, 2, 3, 4, 100 stay distinct under every scaling
    });
  }
});

describe("scaleTable weights", () => {
  const input = table(3, 2, ["a", "b"], [2, 10, 4, 20, 6, 40]);

  it("multiply after scaling: minmax a = 2, 4, 6 with weight 2 becomes 0, 1, 2 (weighting first would give 0, 0.5, 1 again)", () => {
    const scaled = scaleTable(input, "minmax", { a: 2 });
    assertClose(columnOf(scaled.table, 0), [0, 1, 2]); // worked by hand: 2 · (x − 2) / 4
    assertClose(columnOf(scaled.table, 1), [0, 1 / 3, 1]); // worked by hand: unweighted b, (x − 10) / 30
  });

  it("zscore with weight 3 gives a column whose sample sd is 3", () => {
    const scaled = scaleTable(input, "zscore", { b: 3 });
    assertClose(deviation(columnOf(scaled.table, 1))!, 3, { relative: 1e-12 }); // d3-array deviation; worked by hand: 3 · sd 1
    assertClose(columnOf(scaled.table, 0), [-1, 0, 1], { absolute: 1e-15 }); // worked by hand: a has mean 4, sd 2
  });

  it("none with weights 0.5 and 1 halves a and keeps b", () => {
    const scaled = scaleTable(input, "none", { a: 0.5, b: 1 });
    expect(Array.from(scaled.table.values)).toEqual([1, 10, 2, 20, 3, 40]); // worked by hand
  });

  it("weight 0 zeroes a column", () => {
    const scaled = scaleTable(input, "zscore", { a: 0 });
    assertClose(columnOf(scaled.table, 0), [0, 0, 0], { absolute: 0 }); // worked by hand (−0 counts as 0)
  });

  it("all weights 1 give the same values as no weights", () => {
    expect(Array.from(scaleTable(input, "robust", { a: 1, b: 1 }).table.values)).toEqual(Array.from(scaleTable(input, "robust").table.values));
  });

  it("leaves the input table unchanged", () => {
    scaleTable(input, "none", { a: 2 });
    expect(Array.from(input.values)).toEqual([2, 10, 4, 20, 6, 40]); // the input as given
  });

  it("throws for a negative, NaN or infinite weight, naming the column and value", () => {
    expect(() => scaleTable(input, "zscore", { a: -1 })).toThrow("invalid weight for a: -1");
    expect(() => scaleTable(input, "zscore", { b: NaN })).toThrow("invalid weight for b: NaN");
    expect(() => scaleTable(input, "zscore", { b: Infinity })).toThrow("invalid weight for b: Infinity");
  });

  it("throws for a weight on a column that is not a feature", () => {
    expect(() => scaleTable(input, "zscore", { c: 2 })).toThrow("weight for a column that is not a feature: c");
  });
});

describe("scaleTable in place (overwrite)", () => {
  const scales: ScaleName[] = ["none", "zscore", "minmax", "robust"];
  const matrix = fc
    .record({ rows: fc.integer({ min: 1, max: 30 }), columns: fc.integer({ min: 1, max: 4 }) })
    .chain(({ rows, columns }) =>
      fc.record({
        rows: fc.constant(rows),
        columns: fc.constant(columns),
        // some columns constant, so the zeroing of constant columns is written over old values too
        values: fc.array(fc.oneof(fc.constant(3), fc.integer({ min: -1000, max: 1000 }).map((k) => k / 8)), { minLength: rows * columns, maxLength: rows * columns }),
        weight: fc.constantFrom(1, 0, 2.5),
        scale: fc.constantFrom(...scales),
      }),
    );
  it("gives bit for bit the values of the copying call, written over the input's own array", () => {
    fc.assert(
      fc.property(matrix, ({ rows, columns, values, weight, scale }) => {
        const names = Array.from({ length: columns }, (_, j) => `c${j}`);
        const weights = { c0: weight };
        const copied = scaleTable(table(rows, columns, names, values), scale, weights);
        const input = table(rows, columns, names, values);
        const inPlace = scaleTable(input, scale, weights, { overwrite: true });
        expect(inPlace.table.values).toBe(input.values);
        expect(Array.from(inPlace.table.values)).toEqual(Array.from(copied.table.values));
        expect(inPlace.constantColumns).toEqual(copied.constantColumns);
      }),
    );
  });
  it("leaves the input untouched without overwrite", () => {
    const input = table(3, 2, ["a", "b"], [1, 5, 2, 5, 4, 5]);
    scaleTable(input, "zscore", { a: 2 });
    scaleTable(input, "none", { a: 2 });
    expect(Array.from(input.values)).toEqual([1, 5, 2, 5, 4, 5]);
  });
});
