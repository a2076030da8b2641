import type { HotspotDirection } from "./types.ts";

/**
 * Normal-model log-likelihood ratio of a region with n rows summing to s, in a scan of N rows
 * summing to S with sum of squares Q (one common variance, inside and outside means):
 *   σ0² = (Q − S²/N) / N;   σ² = (Q − s²/n − (S−s)²/(N−n)) / N;   LLR = (N/2) · ln(σ0² / σ²)
 * when the inside mean is above ("high"), below ("low") or either ("both") the outside mean; else 0.
 * Source: M. Kulldorff, L. Huang and K. Konty, Int J Health Geogr 8:58, 2009 (the normal model,
 * unweighted: the variance estimate is shared inside and outside). O(1); Q stays the same under
 * permutation, so a replicate needs only each region's sum.
 * Degenerate: a constant outcome (σ0² = 0), n = 0 or n = N give 0; σ² = 0 with σ0² > 0 gives Infinity.
 * @example normalScore(2, 5, 4, 6, 14, "high") // => 2.0794415... (σ0² = 1.25, σ² = 0.25: 2 ln 5)
 */
export function normalScore(n: number, s: number, total: number, sum: number, squares: number, direction: HotspotDirection): number {
  const m = total - n;
  if (n <= 0 || m <= 0) return 0;
  const inside = s / n;
  const outside = (sum - s) / m;
  if (direction === "high" ? !(inside > outside) : direction === "low" ? !(inside < outside) : inside === outside) return 0;
  const null0 = squares - (sum * sum) / total;
  if (!(null0 > 0)) return 0;
  const within = squares - (s * s) / n - ((sum - s) * (sum - s)) / m;
  return within > 0 ? Math.max(0, (total / 2) * Math.log(null0 / within)) : Infinity;
}
