import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { ksStatistic } from "../../../src/core/stats/ksStatistic.ts";
import { assertClose } from "../../assertClose.ts";

// Independent definition for the checks below: D = max over every pooled value t of |#{x ≤ t}/m − #{y ≤ t}/n|.
function bruteD(x: readonly number[], y: readonly number[]): number {
  let largest = 0;
  for (const t of [...x, ...y]) {
    const gap = Math.abs(x.filter((v) => v <= t).length / x.length - y.filter((v) => v <= t).length / y.length);
    largest = Math.max(largest, gap);
  }
  return largest;
}

const sample = fc.array(fc.integer({ min: -6, max: 6 }), { minLength: 1, maxLength: 25 });

describe("ksStatistic", () => {
  it("D of 1, 2, 3 against 2, 4 is 1/2 (after 3: F = 1, G = 1/2)", () => {
    assertClose(ksStatistic(Object.freeze([1, 2, 3]), Object.freeze([2, 4])), 0.5); // worked by hand; also the JSDoc example
  });

  it("D of 1, 3, 5 against 2, 4, 6 is 1/3 (the EDFs alternate, a gap of one step)", () => {
    assertClose(ksStatistic([1, 3, 5], [2, 4, 6]), 1 / 3); // worked by hand
  });

  it("ties: D of 1, 2, 2, 3 against 2, 2, 2, 5 is 1/4, not the 3/4 seen if the tied 2s of x were passed alone", () => {
    // worked by hand: after 1: 1/4 − 0; after 2: 3/4 − 3/4 = 0; after 3: 1 − 3/4 = 1/4; after 5: 0
    assertClose(ksStatistic([1, 2, 2, 3], [2, 2, 2, 5]), 0.25);
  });

  it("ties across the samples only: D of 2, 2 against 2, 2, 2 is 0", () => {
    expect(ksStatistic([2, 2], [2, 2, 2])).toBe(0); // worked by hand: both EDFs jump from 0 to 1 at 2
  });

  it("identical samples give D = 0 and samples entirely apart give D = 1", () => {
    expect(ksStatistic([0.5, 1.5, 7], [7, 0.5, 1.5])).toBe(0); // worked by hand
    expect(ksStatistic([1, 2], [3, 4, 5])).toBe(1); // worked by hand: after 2, F = 1 and G = 0
  });

  it("the input need not be sorted and is not modified", () => {
    const x = Object.freeze([3, 1, 2]);
    assertClose(ksStatistic(x, Float64Array.of(4, 2)), 0.5); // worked by hand, as the first case
    expect(x).toEqual([3, 1, 2]);
  });

  it("NaN values are skipped: 1, NaN, 2, 3 against 2, 4, NaN gives the D of 1, 2, 3 against 2, 4, 1/2", () => {
    assertClose(ksStatistic([1, NaN, 2, 3], [2, 4, NaN]), 0.5); // worked by hand
  });

  it("an empty sample, or one of NaN only, gives NaN", () => {
    expect(ksStatistic([], [1, 2])).toBeNaN();
    expect(ksStatistic([1], [NaN])).toBeNaN();
  });

  it("equals the definition max_t |F_m(t) − G_n(t)| on random samples full of ties", () => {
    fc.assert(
      fc.property(sample, sample, (x, y) => {
        assertClose(ksStatistic(x, y), bruteD(x, y), { absolute: 1e-15 }); // brute force
      }),
    );
  });

  it("D lies in [0, 1] and D·m·n is an integer to within rounding", () => {
    fc.assert(
      fc.property(sample, sample, (x, y) => {
        const d = ksStatistic(x, y);
        expect(d).toBeGreaterThanOrEqual(0);
        expect(d).toBeLessThanOrEqual(1);
        const scaled = d * x.length * y.length;
        assertClose(scaled, Math.round(scaled), { absolute: 1e-9 });
      }),
    );
  });

  it("D is symmetric in its two samples", () => {
    fc.assert(
      fc.property(sample, sample, (x, y) => {
        expect(ksStatistic(x, y)).toBe(ksStatistic(y, x));
      }),
    );
  });

  it("D is invariant under a common strictly increasing transform (v ↦ v³ + 5, exact on small integers) and under v ↦ −v", () => {
    const cube = (v: number): number => v * v * v + 5;
    fc.assert(
      fc.property(sample, sample, (x, y) => {
        expect(ksStatistic(x.map(cube), y.map(cube))).toBe(ksStatistic(x, y));
        expect(ksStatistic(x.map((v) => -v), y.map((v) => -v))).toBe(ksStatistic(x, y));
      }),
    );
  });
});
