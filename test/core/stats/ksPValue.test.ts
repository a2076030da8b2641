import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { kolmogorovSurvival } from "../../../src/core/stats/kolmogorovSurvival.ts";
import { ksExactPValue } from "../../../src/core/stats/ksExactPValue.ts";
import { ksExactLimit, ksPValue } from "../../../src/core/stats/ksPValue.ts";
import { ksStatistic } from "../../../src/core/stats/ksStatistic.ts";
import { randomSource } from "../../../src/core/random.ts";
import { assertClose } from "../../assertClose.ts";

describe("ksPValue", () => {
  it("the exact limit is m·n = 10,000", () => {
    expect(ksExactLimit).toBe(10_000); // the product owner's rule
  });

  it("m = n = 10, D = 1/2 gives 0.16782134274394334 (exact branch; the JSDoc example)", () => {
    assertClose(ksPValue(0.5, 10, 10), 0.16782134274394334); // SciPy 1.17.1 ks_2samp(range(10), range(5, 15), method="exact")
  });

  it("at m·n = 10,000 (100 × 100) the exact count is used: D = 0.2 gives 0.03638428787491733", () => {
    expect(ksPValue(0.2, 100, 100)).toBe(ksExactPValue(0.2, 100, 100));
    assertClose(ksPValue(0.2, 100, 100), 0.03638428787491733); // SciPy 1.17.1 ks_2samp(range(100), range(20, 120), method="exact")
  });

  it("at m·n = 10,100 (100 × 101) the asymptotic law at λ = √(m·n/(m + n))·D is used, without Stephens' correction", () => {
    const lambda = Math.sqrt((100 * 101) / 201) * 0.2;
    expect(ksPValue(0.2, 100, 101)).toBe(kolmogorovSurvival(lambda));
    expect(ksPValue(0.2, 101, 100)).toBe(kolmogorovSurvival(lambda));
    const stephens = (Math.sqrt((100 * 101) / 201) + 0.12 + 0.11 / Math.sqrt((100 * 101) / 201)) * 0.2; // Stephens 1970 as in Numerical Recipes
    expect(ksPValue(0.2, 100, 101)).not.toBe(kolmogorovSurvival(stephens));
  });

  it("at m = n = 100 the plain asymptotic p is within 1% of the exact p for p ≥ 0.03 and not below it further out", () => {
    for (let k = 5; k <= 40; ++k) {
      const d = k / 100;
      const exact = ksExactPValue(d, 100, 100);
      const ratio = kolmogorovSurvival(Math.sqrt(50) * d) / exact;
      if (exact >= 0.03) expect(Math.abs(ratio - 1)).toBeLessThan(0.01);
      else expect(ratio).toBeGreaterThan(1);
    }
  });

  it("at m = n = 100 Stephens' correction would give a p about 14% below the exact one at D = 0.2", () => {
    const corrected = kolmogorovSurvival((Math.sqrt(50) + 0.12 + 0.11 / Math.sqrt(50)) * 0.2);
    expect(corrected / ksExactPValue(0.2, 100, 100)).toBeLessThan(0.87); // compared with the exact count, checked against SciPy above
  });

  it("NaN D gives NaN, D = 0 gives 1 in both branches, and a bad size throws", () => {
    expect(ksPValue(NaN, 3, 4)).toBeNaN();
    expect(ksPValue(0, 3, 4)).toBe(1);
    expect(ksPValue(0, 300, 400)).toBe(1);
    expect(() => ksPValue(0.3, 3, -1)).toThrow("invalid sample size: -1");
  });

  it("p lies in (0, 1] for random samples on both sides of the switch", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 160 }), fc.integer({ min: 1, max: 160 }), fc.integer(), (m, n, seed) => {
        const random = randomSource(seed);
        const x = Array.from({ length: m }, () => random());
        const y = Array.from({ length: n }, () => random() * 1.5);
        const p = ksPValue(ksStatistic(x, y), m, n);
        expect(p).toBeGreaterThan(0);
        expect(p).toBeLessThanOrEqual(1);
      }),
      { numRuns: 60 },
    );
  });
});
