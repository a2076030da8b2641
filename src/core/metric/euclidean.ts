import type { Metric } from "./types.ts";

/**
 * Euclidean distance, d(x, y) = √Σⱼ (xⱼ − yⱼ)², summed in column order.
 * The reference predicate compares the squared sum with r², so no square root is taken:
 *   within(x, y, r) ⇔ Σⱼ (xⱼ − yⱼ)² ≤ r²   (Float64, j = 0..d−1).
 * Source: any linear-algebra text, e.g. Deza and Deza, Encyclopedia of Distances, 2009, §5.1. O(d).
 * @example euclidean.distance(Float64Array.of(0, 0, 3, 4), 2, 0, 1) // => 5
 */
export const euclidean: Metric = {
  name: "euclidean",
  isTrueMetric: true,
  distance(values, d, i, j) {
    return Math.sqrt(squaredSum(values, d, i, j));
  },
  within(values, d, i, j, radius) {
    return squaredSum(values, d, i, j) <= radius * radius;
  },
};

function squaredSum(values: Float64Array, d: number, i: number, j: number): number {
  const a = i * d;
  const b = j * d;
  let sum = 0;
  for (let k = 0; k < d; ++k) {
    const delta = values[a + k]! - values[b + k]!;
    sum += delta * delta;
  }
  return sum;
}
