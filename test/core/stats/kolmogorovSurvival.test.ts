import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { kolmogorovSurvival } from "../../../src/core/stats/kolmogorovSurvival.ts";
import { assertClose } from "../../assertClose.ts";

// The two textbook forms written out with a fixed, generous number of terms, as independent checks of each branch.
function alternatingSeries(lambda: number): number {
  let sum = 0;
  for (let k = 1; k <= 200; ++k) sum += (k % 2 === 1 ? 2 : -2) * Math.exp(-2 * k * k * lambda * lambda);
  return sum;
}
function thetaForm(lambda: number): number {
  let sum = 0;
  for (let k = 1; k <= 200; ++k) sum += Math.exp(-((2 * k - 1) ** 2) * Math.PI ** 2 / (8 * lambda * lambda));
  return 1 - (Math.sqrt(2 * Math.PI) / lambda) * sum;
}

describe("kolmogorovSurvival", () => {
  it("Q(1) is 0.26999967167735456 (the JSDoc example)", () => {
    assertClose(kolmogorovSurvival(1), 0.26999967167735456); // SciPy 1.17.1 scipy.stats.kstwobign.sf(1.0)
  });

  it("Q(1) rounds to the four-decimal table value 0.2700", () => {
    assertClose(kolmogorovSurvival(1), 0.27, { absolute: 5e-5 }); // N. Smirnov, Ann. Math. Statist. 19:279–281, 1948, table of the limiting distribution, four decimals (from memory; SciPy above agrees)
  });

  it("the classic critical values: Q(1.358) ≈ 0.05, Q(1.628) ≈ 0.01, Q(1.36) ≈ 0.0495, Q(1.63) ≈ 0.0098", () => {
    assertClose(kolmogorovSurvival(1.358), 0.05, { absolute: 5e-5 }); // common practice: the 5% critical value 1.358
    assertClose(kolmogorovSurvival(1.628), 0.01, { absolute: 5e-5 }); // common practice: the 1% critical value 1.628
    assertClose(kolmogorovSurvival(1.36), 0.0495, { absolute: 5e-5 }); // SciPy 1.17.1 kstwobign.sf(1.36) = 0.049486 to four decimals (the often quoted 0.0494 is truncated)
    assertClose(kolmogorovSurvival(1.63), 0.0098, { absolute: 5e-5 }); // SciPy 1.17.1 kstwobign.sf(1.63) = 0.009846 to four decimals
  });

  it("matches SciPy's kstwobign.sf on both sides of the switch at 1.18 and in the tails", () => {
    assertClose(kolmogorovSurvival(0.5), 0.9639452436648751); // SciPy 1.17.1 kstwobign.sf(0.5)
    assertClose(kolmogorovSurvival(1.17), 0.12939004218561884); // SciPy 1.17.1 kstwobign.sf(1.17)
    assertClose(kolmogorovSurvival(1.18), 0.1234538094297657); // SciPy 1.17.1 kstwobign.sf(1.18)
    assertClose(kolmogorovSurvival(1.19), 0.11774229287977166); // SciPy 1.17.1 kstwobign.sf(1.19)
    assertClose(kolmogorovSurvival(1.358), 0.05002679733444698); // SciPy 1.17.1 kstwobign.sf(1.358)
    assertClose(kolmogorovSurvival(1.628), 0.009975522431181053); // SciPy 1.17.1 kstwobign.sf(1.628)
    assertClose(kolmogorovSurvival(3), 3.045995948942526e-8); // SciPy 1.17.1 kstwobign.sf(3)
  });

  it("below 1.18 equals the theta-function form, from 1.18 on the alternating series (200 terms each)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.2, max: 1.18, noNaN: true, maxExcluded: true }), (lambda) => {
        assertClose(kolmogorovSurvival(lambda), thetaForm(lambda), { absolute: 1e-15 }); // theta form (Numerical Recipes 3rd ed. §6.14)
      }),
    );
    fc.assert(
      fc.property(fc.double({ min: 1.18, max: 6, noNaN: true }), (lambda) => {
        assertClose(kolmogorovSurvival(lambda), alternatingSeries(lambda), { relative: 1e-13 }); // Kolmogorov's series
      }),
    );
  });

  it("the two forms agree with each other where both converge fast (λ from 0.8 to 1.6)", () => {
    for (let lambda = 0.8; lambda <= 1.6; lambda += 0.05) assertClose(thetaForm(lambda), alternatingSeries(lambda), { absolute: 1e-15 }); // identity of the two forms
  });

  it("λ ≤ 0 gives 1, +∞ gives 0, NaN gives NaN; a very small λ gives 1", () => {
    expect(kolmogorovSurvival(0)).toBe(1);
    expect(kolmogorovSurvival(-1)).toBe(1);
    expect(kolmogorovSurvival(Infinity)).toBe(0);
    expect(kolmogorovSurvival(NaN)).toBeNaN();
    expect(kolmogorovSurvival(0.1)).toBe(1); // theta form: the first term is exp(−123), far below one ulp of 1
  });

  it("the smallest positive λ (5e-324) gives 1, not NaN (the theta sum underflows while √(2π)/λ overflows)", () => {
    expect(kolmogorovSurvival(Number.MIN_VALUE)).toBe(1); // worked by hand: P(λ) underflows to 0
    expect(kolmogorovSurvival(1e-200)).toBe(1);
  });

  it("is non-increasing in λ and stays in [0, 1]", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 20, noNaN: true }), fc.double({ min: 0, max: 20, noNaN: true }), (a, b) => {
        const [lo, hi] = a <= b ? [a, b] : [b, a];
        const q = kolmogorovSurvival(lo);
        expect(q).toBeGreaterThanOrEqual(0);
        expect(q).toBeLessThanOrEqual(1);
        expect(kolmogorovSurvival(hi)).toBeLessThanOrEqual(q);
      }),
    );
  });
});
