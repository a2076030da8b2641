// The reference predicate `within(x, y, r)` against `distance(x, y) ≤ r`: they agree wherever the
// distance is not within rounding of r, and a tie at exactly d = r is inside (closed balls) for
// every metric. The ties use values exact in binary, so d = r holds bit for bit.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { chebyshev, correlation, cosine, euclidean, manhattan, metrics, type Metric } from "../../../src/core/index.ts";
import { definedPoints, nextDown, rowsOf } from "../support/metricVectors.ts";

describe("within agrees with distance ≤ r", () => {
  for (const metric of Object.values(metrics) as Metric[]) {
    it(`${metric.name}: within(x, y, r) ⇔ d(x, y) ≤ r whenever |d − r| > 1e-9 · max(1, r)`, () => {
      fc.assert(
        fc.property(definedPoints(metric, 2), fc.double({ min: 1e-3, max: 3e3, noNaN: true }), ([a, b], r) => {
          const values = rowsOf(a!, b!);
          const d = metric.distance(values, a!.length, 0, 1);
          fc.pre(Math.abs(d - r) > 1e-9 * Math.max(1, r)); // away from ties, where √ versus r² may round either way
          expect(metric.within(values, a!.length, 0, 1, r)).toBe(d <= r);
        }),
      );
    });
  }
});

describe("a tie at exactly d = r is inside, and the double just below r is outside", () => {
  it("euclidean: (0, 0)–(0.75, 1) has d = 1.25", () => {
    const values = rowsOf([0, 0], [0.75, 1]);
    expect(euclidean.distance(values, 2, 0, 1)).toBe(1.25); // worked by hand: 0.5625 + 1 = 1.5625 = 1.25²
    expect(euclidean.within(values, 2, 0, 1, 1.25)).toBe(true);
    expect(euclidean.within(values, 2, 0, 1, nextDown(1.25))).toBe(false);
  });

  it("manhattan: (0, 0)–(0.5, 0.25) has d = 0.75", () => {
    const values = rowsOf([0, 0], [0.5, 0.25]);
    expect(manhattan.distance(values, 2, 0, 1)).toBe(0.75); // worked by hand: 0.5 + 0.25
    expect(manhattan.within(values, 2, 0, 1, 0.75)).toBe(true);
    expect(manhattan.within(values, 2, 0, 1, nextDown(0.75))).toBe(false);
  });

  it("chebyshev: (0, 0)–(0.5, −0.25) has d = 0.5", () => {
    const values = rowsOf([0, 0], [0.5, -0.25]);
    expect(chebyshev.distance(values, 2, 0, 1)).toBe(0.5); // worked by hand: max(0.5, 0.25)
    expect(chebyshev.within(values, 2, 0, 1, 0.5)).toBe(true);
    expect(chebyshev.within(values, 2, 0, 1, nextDown(0.5))).toBe(false);
  });

  it("cosine: (1, 1, 0, 0)–(1, 0, 1, 0) has d = 0.5", () => {
    const values = rowsOf([1, 1, 0, 0], [1, 0, 1, 0]);
    expect(cosine.distance(values, 4, 0, 1)).toBe(0.5); // worked by hand: x·y = 1, ‖x‖²‖y‖² = 4, √4 = 2, 1 − 1/2
    expect(cosine.within(values, 4, 0, 1, 0.5)).toBe(true);
    expect(cosine.within(values, 4, 0, 1, nextDown(0.5))).toBe(false);
  });

  it("correlation: (1, 0, −1)–(1, −1, 0) has d = 0.5", () => {
    const values = rowsOf([1, 0, -1], [1, -1, 0]);
    expect(correlation.distance(values, 3, 0, 1)).toBe(0.5); // worked by hand: means 0, dot 1, ‖x‖²‖y‖² = 4, r = 1/2
    expect(correlation.within(values, 3, 0, 1, 0.5)).toBe(true);
    expect(correlation.within(values, 3, 0, 1, nextDown(0.5))).toBe(false);
  });

  it("nextDown gives the double one ulp below: 1 − 2⁻⁵³ below 1 and 0.5 − 2⁻⁵⁴ below 0.5", () => {
    expect(nextDown(1)).toBe(1 - 2 ** -53); // from memory: the spacing of doubles in [0.5, 1) is 2⁻⁵³
    expect(nextDown(0.5)).toBe(0.5 - 2 ** -54); // from memory: the spacing in [0.25, 0.5) is 2⁻⁵⁴
  });
});
