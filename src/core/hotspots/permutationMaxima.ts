import { Cancelled, type RunControl } from "../control.ts";

/**
 * Monte Carlo permutation maxima: `replicates` times, shuffle the values over the scanned rows
 * (Fisher–Yates driven by `random`; Knuth, TAOCP vol. 2, Algorithm P) and record the largest score
 * over all candidate regions that `maximum` finds for that order. Source: M. Kulldorff, Commun
 * Stat Theory Methods 26:1481, 1997, §4 (Monte Carlo hypothesis testing, after Dwass 1957).
 * O(R·(N + cost of maximum)). Reports progress after each replicate and stops with Cancelled
 * when asked. Memory: one copy of the values, shuffled in place.
 * @example permutationMaxima(Float64Array.of(1, 0), 3, random, (v) => v[0]) // => three values, each 0 or 1
 */
export function permutationMaxima(values: Float64Array, replicates: number, random: () => number, maximum: (permuted: Float64Array) => number, control: RunControl = {}): Float64Array {
  const permuted = values.slice();
  const n = permuted.length;
  const maxima = new Float64Array(replicates);
  for (let r = 0; r < replicates; ++r) {
    if (control.shouldStop?.()) throw new Cancelled("the hotspot scan");
    for (let i = n - 1; i > 0; --i) {
      const j = Math.floor(random() * (i + 1));
      const t = permuted[i]!;
      permuted[i] = permuted[j]!;
      permuted[j] = t;
    }
    maxima[r] = maximum(permuted);
    control.onProgress?.((r + 1) / replicates);
  }
  return maxima;
}

/**
 * Monte Carlo p-value of an observed maximum: p = (1 + #{replicate maxima ≥ observed}) / (1 + R),
 * never 0 and at best 1/(R + 1). Source: A. C. A. Hope, J R Stat Soc B 30:582–598, 1968; the form
 * used by Kulldorff 1997. "≥" allows a relative 1e-10 below the observed value, so that a
 * replicate scoring the same region equally, summed in another order, counts as equal (common
 * practice, no source). A zero observed score gets p = 1. O(R).
 * @example monteCarloP(2, Float64Array.of(1, 3, 2)) // => 0.75
 */
export function monteCarloP(observed: number, maxima: Float64Array): number {
  if (!(observed > 0)) return 1;
  const threshold = observed - 1e-10 * Math.abs(observed);
  let atLeast = 0;
  for (let r = 0; r < maxima.length; ++r) if (maxima[r]! >= threshold) ++atLeast;
  return (1 + atLeast) / (1 + maxima.length);
}
