import type { Metric } from "./types.ts";

/**
 * Manhattan (city-block, L1) distance, d(x, y) = Σⱼ |xⱼ − yⱼ|, summed in column order;
 * within(x, y, r) ⇔ Σⱼ |xⱼ − yⱼ| ≤ r in Float64.
 * Source: M. M. Deza and E. Deza, Encyclopedia of Distances, Springer 2009, §5.2 (ℓ1-metric). O(d).
 * @example manhattan.distance(Float64Array.of(0, 0, 3, -4), 2, 0, 1) // => 7
 */
export const manhattan: Metric = {
  name: "manhattan",
  isTrueMetric: true,
  distance: absoluteSum,
  within(values, d, i, j, radius) {
    return absoluteSum(values, d, i, j) <= radius;
  },
};

function absoluteSum(values: Float64Array, d: number, i: number, j: number): number {
  const a = i * d;
  const b = j * d;
  let sum = 0;
  for (let k = 0; k < d; ++k) sum += Math.abs(values[a + k]! - values[b + k]!);
  return sum;
}
