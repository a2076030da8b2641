import { kolmogorovSurvival } from "./kolmogorovSurvival.ts";
import { ksExactPValue } from "./ksExactPValue.ts";

/** Largest m·n for which the two-sided p-value is counted exactly (the product owner's rule). */
export const ksExactLimit = 10_000;

/**
 * Two-sided p-value of the two-sample Kolmogorov–Smirnov test for a statistic d between samples of
 * m and n values:
 *   m·n ≤ 10,000: exact, P(D ≥ d) by the lattice-path count (ksExactPValue; assumes no ties, which is conservative);
 *   m·n > 10,000: asymptotic, Q_KS(λ) with λ = √(m·n / (m + n)) · d (kolmogorovSurvival).
 * Variant: Stephens' small-sample correction λ = (√N_e + 0.12 + 0.11/√N_e) · d (M. A. Stephens,
 * J. R. Stat. Soc. B 32:115–122, 1970) is NOT applied. It was fitted to the one-sample statistic;
 * the plain λ is the one of R's ks.test. At m = n = 100 (checked in the tests) the plain asymptotic p
 * is within 1% of the exact p for p ≥ 0.03 and larger than it (conservative) below that, while the
 * corrected λ gives p up to 14% too small already at p ≈ 0.04 (anti-conservative).
 * Source: N. V. Smirnov, Bull. Math. Univ. Moscou 2(2):3–14, 1939 (the limit law for two samples).
 * O(m·n) in the exact branch, O(1) otherwise.
 * Degenerate input: NaN d gives NaN; d ≤ 0 gives 1; m or n not a positive integer throws.
 * @example ksPValue(0.5, 10, 10) // => 0.16782134274394334 (exact branch; SciPy ks_2samp agrees)
 */
export function ksPValue(d: number, m: number, n: number): number {
  if (!Number.isInteger(m) || m < 1) throw new Error(`invalid sample size: ${m}`);
  if (!Number.isInteger(n) || n < 1) throw new Error(`invalid sample size: ${n}`);
  if (m * n <= ksExactLimit) return ksExactPValue(d, m, n);
  return kolmogorovSurvival(Math.sqrt((m * n) / (m + n)) * d);
}
