import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { ksExactPValue } from "../../../src/core/stats/ksExactPValue.ts";
import { ksStatistic } from "../../../src/core/stats/ksStatistic.ts";
import { assertClose } from "../../assertClose.ts";

// Fully independent check: enumerate all C(m + n, m) orderings as bit masks (bit set: a value of x),
// walk each one and count those whose largest |i·n − j·m| reaches k. Returns count / C(m + n, m).
function bruteForceP(k: number, m: number, n: number): number {
  let reaching = 0;
  let orderings = 0;
  for (let mask = 0; mask < 1 << (m + n); ++mask) {
    let ones = 0;
    for (let b = 0; b < m + n; ++b) ones += (mask >> b) & 1;
    if (ones !== m) continue;
    orderings++;
    let i = 0;
    let j = 0;
    let largest = 0;
    for (let b = 0; b < m + n; ++b) {
      if ((mask >> b) & 1) i++;
      else j++;
      largest = Math.max(largest, Math.abs(i * n - j * m));
    }
    if (largest >= k) reaching++;
  }
  return reaching / orderings;
}

function binomial(n: number, k: number): bigint {
  let result = 1n;
  for (let t = 1; t <= k; ++t) result = (result * BigInt(n - k + t)) / BigInt(t);
  return result;
}

describe("ksExactPValue", () => {
  it("P(D ≥ 1/2) for m = 3, n = 2 is 9/10 (only the ordering x y x y x stays below; the JSDoc example)", () => {
    assertClose(ksExactPValue(0.5, 3, 2), 0.9); // worked by hand: 1 of C(5, 2) = 10 orderings has max |2i − 3j| = 2 < 3
  });

  it("agrees with a brute-force enumeration of all orderings for every m, n ≤ 6 and every lattice value k/(m·n)", () => {
    for (let m = 1; m <= 6; ++m) {
      for (let n = 1; n <= 6; ++n) {
        for (let k = 0; k <= m * n; ++k) {
          assertClose(ksExactPValue(k / (m * n), m, n), bruteForceP(k, m, n), { relative: 1e-12 }); // brute-force enumeration
        }
      }
    }
  });

  it("agrees with the brute-force enumeration for unequal sizes 3 × 9, 7 × 5 and 8 × 8", () => {
    for (const [m, n] of [[3, 9], [7, 5], [8, 8]] as const) {
      for (let k = 1; k <= m * n; ++k) {
        assertClose(ksExactPValue(k / (m * n), m, n), bruteForceP(k, m, n), { relative: 1e-12 }); // brute-force enumeration
      }
    }
  });

  it("m = n = 10, D = 1/2 gives 0.16782134274394334", () => {
    assertClose(ksExactPValue(0.5, 10, 10), 0.16782134274394334); // SciPy 1.17.1 ks_2samp(range(10), range(5, 15), method="exact")
  });

  it("equal sizes follow the published closed form P(D ≥ k/n) = 2 Σ_j (−1)^(j−1) C(2n, n − jk) / C(2n, n): n = 10, k = 5 gives 31,006 / 184,756", () => {
    // B. V. Gnedenko and V. S. Korolyuk, Dokl. Akad. Nauk SSSR 80:525–528, 1951 (the reflection formula for m = n),
    // evaluated exactly by hand: C(20, 5) = 15,504, C(20, 0) = 1, C(20, 10) = 184,756, so 2 · (15,504 − 1) / 184,756
    assertClose(ksExactPValue(0.5, 10, 10), 31006 / 184756, { relative: 1e-14 });
    // and for every n ≤ 30 and k, against the same closed form in exact integer arithmetic
    const binomial = (a: number, b: number): bigint => {
      if (b < 0 || b > a) return 0n;
      let c = 1n;
      for (let i = 1; i <= b; ++i) c = (c * BigInt(a - b + i)) / BigInt(i);
      return c;
    };
    for (let n = 1; n <= 30; ++n) {
      for (let k = 1; k <= n; ++k) {
        let sum = 0n;
        for (let j = 1; j * k <= n; ++j) sum += (j % 2 === 1 ? 2n : -2n) * binomial(2 * n, n - j * k);
        const total = binomial(2 * n, n);
        assertClose(ksExactPValue(k / n, n, n), Number((sum * 10n ** 18n) / total) / 1e18, { relative: 1e-12, absolute: 1e-17 });
      }
    }
  });

  it("m = 7, n = 5, D = 4/7 gives 0.23737373737373738", () => {
    assertClose(ksExactPValue(4 / 7, 7, 5), 0.23737373737373738); // SciPy 1.17.1 ks_2samp(range(7), [3.5 … 7.5], method="exact")
  });

  it("m = n = 100 at D = 0.1, 0.2, 0.3, 0.5 matches SciPy's exact values", () => {
    assertClose(ksExactPValue(0.1, 100, 100), 0.7020569828664881); // SciPy 1.17.1 ks_2samp(range(100), range(10, 110), method="exact")
    assertClose(ksExactPValue(0.2, 100, 100), 0.03638428787491733); // SciPy 1.17.1, shift 20
    assertClose(ksExactPValue(0.3, 100, 100), 0.0002248739317492479); // SciPy 1.17.1, shift 30
    assertClose(ksExactPValue(0.5, 100, 100), 1.0024645454361508e-11); // SciPy 1.17.1, shift 50
  });

  it("D = 1 for m = n = 100 gives 2 / C(200, 100) ≈ 2.2e-59 to full relative accuracy (no 1 − p cancellation)", () => {
    // worked by hand: only the two orderings with one sample wholly below the other reach D = 1
    assertClose(ksExactPValue(1, 100, 100), 2 / Number(binomial(200, 100)), { relative: 1e-12 });
  });

  it("D = 1 for m = 1, n = 10,000 gives 2 / 10,001", () => {
    assertClose(ksExactPValue(1, 1, 10_000), 2 / 10_001, { relative: 1e-12 }); // worked by hand: the x value first or last
  });

  it("a d between lattice values counts like the next lattice value up: 0.55 for m = n = 10 equals 0.6", () => {
    expect(ksExactPValue(0.55, 10, 10)).toBe(ksExactPValue(0.6, 10, 10)); // worked by hand: gaps are multiples of 1/10
  });

  it("with ties the p given the ties (all 70 splits of 1, 1, 2, 2, 2, 3, 4, 4 into 4 + 4) never exceeds the no-ties p: conservative", () => {
    const pooled = [1, 1, 2, 2, 2, 3, 4, 4];
    const statistics: number[] = [];
    for (let mask = 0; mask < 1 << 8; ++mask) {
      const x = pooled.filter((_, b) => (mask >> b) & 1);
      if (x.length === 4) statistics.push(ksStatistic(x, pooled.filter((_, b) => !((mask >> b) & 1))));
    }
    expect(statistics.length).toBe(70); // C(8, 4)
    let strictlyBelow = 0;
    for (const d of statistics) {
      const givenTies = statistics.filter((other) => other >= d).length / statistics.length; // brute-force permutation p with the ties kept
      expect(givenTies).toBeLessThanOrEqual(ksExactPValue(d, 4, 4) + 1e-15);
      if (givenTies < ksExactPValue(d, 4, 4) - 1e-15) strictlyBelow++;
    }
    expect(strictlyBelow).toBeGreaterThan(0);
  });

  it("d ≤ 0 gives 1, d > 1 gives 0, NaN gives NaN", () => {
    expect(ksExactPValue(0, 4, 5)).toBe(1);
    expect(ksExactPValue(-0.2, 4, 5)).toBe(1);
    expect(ksExactPValue(1.5, 4, 5)).toBe(0);
    expect(ksExactPValue(NaN, 4, 5)).toBeNaN();
  });

  it("a sample size that is not a positive integer throws an error naming it", () => {
    expect(() => ksExactPValue(0.5, 0, 5)).toThrow("invalid sample size: 0");
    expect(() => ksExactPValue(0.5, 4, 2.5)).toThrow("invalid sample size: 2.5");
  });

  it("p lies in (0, 1], is symmetric in m and n and does not increase with d", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 40 }), fc.integer({ min: 1, max: 40 }), fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 1, noNaN: true }), (m, n, a, b) => {
        const [lo, hi] = a <= b ? [a, b] : [b, a];
        const p = ksExactPValue(lo, m, n);
        expect(p).toBeGreaterThan(0);
        expect(p).toBeLessThanOrEqual(1);
        expect(ksExactPValue(lo, n, m)).toBe(p);
        expect(ksExactPValue(hi, m, n)).toBeLessThanOrEqual(p);
      }),
    );
  });
});
