import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { chiSquaredIndependence } from "../../../src/core/stats/chiSquaredIndependence.ts";
import { assertClose } from "../../assertClose.ts";

const undefinedTest = { statistic: NaN, degreesOfFreedom: 0, pValue: NaN, minExpected: NaN, hasSmallExpected: false };

describe("chiSquaredIndependence", () => {
  it("the 2×2 table 10, 20 / 30, 40 gives X² = 50/63 = 0.7936507936507936 (the JSDoc example)", () => {
    // worked by hand: totals 30, 70 and 40, 60 of 100; expected 12, 18, 28, 42; X² = 4/12 + 4/18 + 4/28 + 4/42 = 50/63
    const table = Object.freeze([Object.freeze([10, 20]), Object.freeze([30, 40])]);
    assertClose(chiSquaredIndependence(table).statistic, 0.7936507936507936);
    // the textbook 2×2 shortcut N(ad − bc)² / (r₁r₂c₁c₂), an independent route to the same number
    assertClose(chiSquaredIndependence(table).statistic, (100 * (10 * 40 - 20 * 30) ** 2) / (30 * 70 * 40 * 60));
  });

  it("the 2×2 table 10, 20 / 30, 40 has 1 df, p = 0.37299848361348686 and smallest expected count 12", () => {
    assertClose(chiSquaredIndependence([[10, 20], [30, 40]]), {
      statistic: 50 / 63, // worked by hand, as above
      degreesOfFreedom: 1, // worked by hand: (2 − 1)(2 − 1)
      pValue: 0.37299848361348686, // SciPy 1.17.1 scipy.stats.chi2_contingency([[10, 20], [30, 40]], correction=False)
      minExpected: 12, // worked by hand: 30 · 40 / 100
      hasSmallExpected: false,
    });
  });

  it("the 2×3 table 3, 9, 1 / 12, 4, 7 has X² = 9.801595060457936 on 2 df, p = exp(−X²/2), and flags the expected 2.89", () => {
    const result = chiSquaredIndependence([Uint32Array.of(3, 9, 1), Uint32Array.of(12, 4, 7)]);
    assertClose(result.statistic, 9.801595060457936); // SciPy 1.17.1 chi2_contingency(..., correction=False)
    expect(result.degreesOfFreedom).toBe(2); // worked by hand: (2 − 1)(3 − 1)
    assertClose(result.pValue, Math.exp(-result.statistic / 2)); // closed form of the chi-squared tail with 2 df
    assertClose(result.pValue, 0.007440646563409515); // SciPy 1.17.1 chi2_contingency(..., correction=False)
    assertClose(result.minExpected, 26 / 9); // worked by hand: row 13 · column 8 / 36
    expect(result.hasSmallExpected).toBe(true);
  });

  it("an expected count of exactly 5 is not flagged (the flag is for counts below 5)", () => {
    const result = chiSquaredIndependence([[5, 5], [5, 5]]);
    expect(result.minExpected).toBe(5); // worked by hand: 10 · 10 / 20
    expect(result.hasSmallExpected).toBe(false);
  });

  it("a table in exact proportion gives X² = 0 and p = 1", () => {
    const result = chiSquaredIndependence([[1, 2], [2, 4]]);
    expect(result.statistic).toBe(0); // worked by hand: expected 1, 2, 2, 4 equal the observed counts
    expect(result.pValue).toBe(1); // closed form: Q(a, 0) = 1
  });

  it("rows and columns with total 0 are dropped and not counted in the degrees of freedom", () => {
    const padded = chiSquaredIndependence([[10, 0, 20], [0, 0, 0], [30, 0, 40]]);
    assertClose(padded, chiSquaredIndependence([[10, 20], [30, 40]])); // worked by hand: the same 2×2 table remains
    expect(padded.degreesOfFreedom).toBe(1);
  });

  it("fewer than two non-empty rows or columns give NaN statistic and p with 0 df", () => {
    assertClose(chiSquaredIndependence([[3, 4, 5]]), undefinedTest);
    assertClose(chiSquaredIndependence([[3, 0], [4, 0]]), undefinedTest);
    assertClose(chiSquaredIndependence([[0, 0], [0, 0]]), undefinedTest);
    assertClose(chiSquaredIndependence([]), undefinedTest);
  });

  it("a ragged table or a negative, NaN or infinite count throws an error naming it", () => {
    expect(() => chiSquaredIndependence([[1, 2], [3]])).toThrow("ragged table: row 1 has 1 cells, not 2");
    expect(() => chiSquaredIndependence([[1, -2], [3, 4]])).toThrow("invalid count: -2");
    expect(() => chiSquaredIndependence([[1, NaN], [3, 4]])).toThrow("invalid count: NaN");
    expect(() => chiSquaredIndependence([[1, Infinity], [3, 4]])).toThrow("invalid count: Infinity");
  });

  it("is invariant under transposing the table and under reordering its rows; p lies in [0, 1]", () => {
    const table = fc.integer({ min: 2, max: 4 }).chain((columns) => fc.array(fc.array(fc.integer({ min: 0, max: 30 }), { minLength: columns, maxLength: columns }), { minLength: 2, maxLength: 4 }));
    fc.assert(
      fc.property(table, (rows) => {
        const result = chiSquaredIndependence(rows);
        const transposed = rows[0]!.map((_, j) => rows.map((row) => row[j]!));
        assertClose(chiSquaredIndependence(transposed), result, { absolute: 1e-12, relative: 1e-12 }); // X² is symmetric in rows and columns
        assertClose(chiSquaredIndependence([...rows].reverse()), result, { absolute: 1e-12, relative: 1e-12 }); // a sum over cells
        if (!Number.isNaN(result.pValue)) {
          expect(result.pValue).toBeGreaterThanOrEqual(0);
          expect(result.pValue).toBeLessThanOrEqual(1);
        }
      }),
    );
  });
});
