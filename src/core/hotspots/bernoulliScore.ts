import type { HotspotDirection } from "./types.ts";

/** x·ln(x / y), with 0·ln 0 = 0. */
function xlogx(x: number, y: number): number {
  return x > 0 ? x * Math.log(x / y) : 0;
}

/**
 * Bernoulli log-likelihood ratio of a region with n rows and c cases, in a scan of N rows with C cases:
 *   LLR = c ln(c/n) + (n−c) ln((n−c)/n) + (C−c) ln((C−c)/(N−n)) + (N−n−C+c) ln((N−n−C+c)/(N−n))
 *         − C ln(C/N) − (N−C) ln((N−C)/N),   with 0 ln 0 = 0,
 * when the inside rate c/n is above (direction "high"), below ("low") or either ("both") the
 * outside rate (C−c)/(N−n); otherwise 0.
 * Source: M. Kulldorff, Commun Stat Theory Methods 26:1481–1496, 1997 (the Bernoulli model). O(1).
 * Degenerate: n = 0 or n = N gives 0; C = 0 or C = N (no cases, only cases) gives 0 everywhere.
 * @example bernoulliScore(4, 3, 10, 4, "high") // => 1.777408838419503 (3 ln 3/4 + ln 1/4 + ln 1/6 + 5 ln 5/6 − 4 ln 0.4 − 6 ln 0.6)
 */
export function bernoulliScore(n: number, c: number, total: number, cases: number, direction: HotspotDirection): number {
  const m = total - n;
  if (n <= 0 || m <= 0) return 0;
  const outsideCases = cases - c;
  const inside = c / n;
  const outside = outsideCases / m;
  if (direction === "high" ? !(inside > outside) : direction === "low" ? !(inside < outside) : inside === outside) return 0;
  const alternative = xlogx(c, n) + xlogx(n - c, n) + xlogx(outsideCases, m) + xlogx(m - outsideCases, m);
  const none = xlogx(cases, total) + xlogx(total - cases, total);
  return Math.max(0, alternative - none);
}
