import type { HotspotDirection } from "./types.ts";

/**
 * Midranks 1..N of the values (ties share the mean of their ranks) and the tie term Σ(t³ − t)
 * over groups of t equal values. O(N log N).
 * @example midranks([5, 1, 5, 3]) // => { ranks: Float64Array [3.5, 1, 3.5, 2], ties: 6 }
 */
export function midranks(values: ArrayLike<number>): { ranks: Float64Array; ties: number } {
  const n = values.length;
  const order = Array.from({ length: n }, (_, i) => i).sort((a, b) => values[a]! - values[b]!);
  const ranks = new Float64Array(n);
  let ties = 0;
  for (let start = 0; start < n; ) {
    let stop = start + 1;
    while (stop < n && values[order[stop]!] === values[order[start]!]) ++stop;
    const t = stop - start;
    for (let k = start; k < stop; ++k) ranks[order[k]!] = (start + stop + 1) / 2;
    ties += t * t * t - t;
    start = stop;
  }
  return { ranks, ties };
}

/**
 * Wilcoxon rank-sum scan score of a region with n rows whose midranks sum to w, among N rows:
 *   Z = (w − n(N+1)/2) / sqrt( n(N−n)/12 · ((N+1) − T/(N(N−1))) ),  T = Σ(t³ − t) over ties;
 * the score is max(Z, 0) for "high", max(−Z, 0) for "low" and |Z| for "both".
 * Source: I. Jung and H. J. Cho, Int J Health Geogr 14:30, 2015 (the standardised Wilcoxon
 * rank-sum statistic as the scan score), with the usual tie-corrected variance (E. L. Lehmann,
 * Nonparametrics, 1975, §1.4). O(1). Degenerate: n = 0, n = N or all values tied give 0.
 * @example rankScore(2, 7, 4, 0, "high") // => 2 / sqrt(5/3) = 1.5491933...
 */
export function rankScore(n: number, w: number, total: number, ties: number, direction: HotspotDirection): number {
  const m = total - n;
  if (n <= 0 || m <= 0) return 0;
  const variance = ((n * m) / 12) * (total + 1 - ties / (total * (total - 1)));
  if (!(variance > 0)) return 0;
  const z = (w - (n * (total + 1)) / 2) / Math.sqrt(variance);
  return direction === "high" ? Math.max(z, 0) : direction === "low" ? Math.max(-z, 0) : Math.abs(z);
}
