import type { Metric } from "./types.ts";

/**
 * Chebyshev (maximum, L∞) distance, d(x, y) = maxⱼ |xⱼ − yⱼ|;
 * within(x, y, r) ⇔ maxⱼ |xⱼ − yⱼ| ≤ r (a maximum is exact in any order).
 * Source: M. M. Deza and E. Deza, Encyclopedia of Distances, Springer 2009, §5.2 (ℓ∞-metric). O(d).
 * @example chebyshev.distance(Float64Array.of(0, 0, 3, -4), 2, 0, 1) // => 4
 */
export const chebyshev: Metric = {
  name: "chebyshev",
  isTrueMetric: true,
  distance: largestDifference,
  within(values, d, i, j, radius) {
    return largestDifference(values, d, i, j) <= radius;
  },
};

function largestDifference(values: Float64Array, d: number, i: number, j: number): number {
  const a = i * d;
  const b = j * d;
  let largest = 0;
  for (let k = 0; k < d; ++k) largest = Math.max(largest, Math.abs(values[a + k]! - values[b + k]!));
  return largest;
}
