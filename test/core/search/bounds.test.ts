import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { chebyshev, correlation, cosine, euclidean, manhattan, type NumericTable } from "../../../src/core/index.ts";
import { angularThreshold } from "../../../src/core/search/angularThreshold.ts";
import { boxBound } from "../../../src/core/search/boxBound.ts";
import { searchSpace, type Norm } from "../../../src/core/search/searchSpace.ts";
import { unitRows } from "../../../src/core/search/unitRows.ts";
import { tableArbitrary } from "./support/searchTables.ts";

/** The value a norm gives two rows, summed in column order as the predicates sum it. */
function normValue(norm: Norm, values: Float64Array, d: number, i: number, j: number): number {
  let s = 0;
  for (let k = 0; k < d; ++k) {
    const e = values[i * d + k]! - values[j * d + k]!;
    s = norm === "squares" ? s + e * e : norm === "sum" ? s + Math.abs(e) : Math.max(s, Math.abs(e));
  }
  return s;
}

describe("boxBound", () => {
  it("the JSDoc example: centre (0, 0) and the box [1, 2]² give Σ gaps² = 2", () => {
    expect(boxBound({ norm: "squares", dims: 2, coords: new Float64Array(0), lo: Float64Array.of(1, 1), hi: Float64Array.of(2, 2), centre: Float64Array.of(0, 0), centreBase: 0, limit: Infinity }, 0)).toBe(2); // worked by hand: 1² + 1²
  });

  it("never exceeds the value the reference computes between the centre and a row inside the box, for all three norms", () => {
    fc.assert(
      fc.property(tableArbitrary, fc.nat(), fc.nat(), fc.constantFrom<Norm>("squares", "sum", "max"), (table, pick, split, norm) => {
        const { values, columns: d, rows: n } = table;
        const centre = pick % n;
        const from = split % n; // the box of rows from..n−1, the centre possibly outside it
        const lo = new Float64Array(d).fill(Infinity);
        const hi = new Float64Array(d).fill(-Infinity);
        for (let i = from; i < n; ++i) {
          for (let k = 0; k < d; ++k) {
            lo[k] = Math.min(lo[k]!, values[i * d + k]!);
            hi[k] = Math.max(hi[k]!, values[i * d + k]!);
          }
        }
        const bound = boxBound({ norm, dims: d, coords: values, lo, hi, centre: values, centreBase: centre * d, limit: Infinity }, 0);
        for (let i = from; i < n; ++i) expect(bound).toBeLessThanOrEqual(normValue(norm, values, d, centre, i));
      }),
      { numRuns: 300 },
    );
  });
});

describe("angularThreshold", () => {
  it("the JSDoc example: r = 0.5 in 2 columns gives 1 + 64 · 33 · 10 · 2⁻⁵³", () => {
    expect(angularThreshold(0.5, 2)).toBe(1 + 64 * 33 * 10 * 2 ** -53); // worked by hand from the formula
  });

  it("every pair the cosine or correlation predicate accepts at r = its own computed distance has a unit-row value ≤ T(r)", () => {
    fc.assert(
      fc.property(tableArbitrary, fc.nat(), fc.nat(), fc.boolean(), (table, a, b, centre) => {
        const metric = centre ? correlation : cosine;
        const i = a % table.rows;
        const j = b % table.rows;
        const radius = metric.distance(table.values, table.columns, i, j);
        fc.pre(metric.within(table.values, table.columns, i, j, radius));
        const units = unitRows(table, centre)!;
        expect(normValue("squares", units, table.columns, i, j)).toBeLessThanOrEqual(angularThreshold(radius, table.columns));
      }),
      { numRuns: 2000 },
    );
  });

  it("holds for nearly parallel rows, where rounding is largest relative to 1 − cos: x and x + tiny noise in 50 columns", () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -5, max: 5, noNaN: true }), { minLength: 50, maxLength: 50 }), fc.array(fc.double({ min: -1e-9, max: 1e-9, noNaN: true }), { minLength: 50, maxLength: 50 }), (x, noise) => {
        const table: NumericTable = { rows: 2, columns: 50, names: [], values: Float64Array.from([...x, ...x.map((v, k) => v + noise[k]!)]) };
        const radius = cosine.distance(table.values, 50, 0, 1);
        fc.pre(Number.isFinite(radius) && cosine.within(table.values, 50, 0, 1, radius));
        expect(normValue("squares", unitRows(table, false)!, 50, 0, 1)).toBeLessThanOrEqual(angularThreshold(radius, 50));
      }),
    );
  });
});

describe("unitRows and searchSpace", () => {
  it("the JSDoc example: (3, 4) becomes (0.6, 0.8)", () => {
    expect(Array.from(unitRows({ rows: 1, columns: 2, names: ["a", "b"], values: Float64Array.of(3, 4) }, false)!)).toEqual([0.6, 0.8]); // worked by hand: 3/5, 4/5
  });

  it("a zero row becomes NaN; a row of 1e-200 (whose squared norm underflows) still gets its direction", () => {
    const units = unitRows({ rows: 2, columns: 2, names: ["a", "b"], values: Float64Array.of(0, 0, 1e-200, 0) }, false)!;
    expect(Array.from(units)).toEqual([NaN, NaN, 1, 0]); // worked by hand: direction (1, 0)
  });

  it("centring: the constant row (2, 2) becomes NaN and (1, 3) becomes (−1, 1)/√2", () => {
    const units = unitRows({ rows: 2, columns: 2, names: ["a", "b"], values: Float64Array.of(2, 2, 1, 3) }, true)!;
    expect(Array.from(units.subarray(0, 2))).toEqual([NaN, NaN]);
    expect(Array.from(units.subarray(2))).toEqual([-1 / Math.SQRT2, 1 / Math.SQRT2]); // worked by hand: (−1, 1)/√2, the division done in Float64
  });

  it("thresholds are r·r, r and r for Euclidean, Manhattan and Chebyshev distance, exact spaces over the table itself", () => {
    const table: NumericTable = { rows: 1, columns: 1, names: ["x"], values: Float64Array.of(1) };
    expect([euclidean, manhattan, chebyshev].map((metric) => searchSpace(table, metric)?.threshold(0.1 + 0.2))).toEqual([(0.1 + 0.2) * (0.1 + 0.2), 0.1 + 0.2, 0.1 + 0.2]);
    expect(searchSpace(table, euclidean)?.points).toBe(table.values);
  });

  it("a table with ±∞ or NaN gets no search space", () => {
    for (const bad of [Infinity, -Infinity, NaN]) expect(searchSpace({ rows: 2, columns: 1, names: ["x"], values: Float64Array.of(0, bad) }, manhattan)).toBeNull();
  });
});
