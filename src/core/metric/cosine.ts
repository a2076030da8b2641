import { cosineOfSums, rowScale, rowSums } from "./cosineOfSums.ts";
import type { Metric } from "./types.ts";

/**
 * Cosine distance, d(x, y) = 1 − (x·y) / (‖x‖ ‖y‖), with x·y, ‖x‖² and ‖y‖² summed together in
 * column order; within(x, y, r) ⇔ 1 − x·y / √(‖x‖²‖y‖²) ≤ r in Float64 (rows of tiny or huge norm
 * are first divided by their largest |value|, which leaves the cosine unchanged; see cosineOfSums).
 * Not a metric: the triangle inequality fails (x = (1, 0), y = (1, 1), z = (0, 1):
 * d(x, z) = 1 > d(x, y) + d(y, z) = 2 − √2 ≈ 0.586), so no pruning may rely on it.
 * Undefined for a zero row (‖x‖ = 0); such rows are left out of the build and reported.
 * Source: M. M. Deza and E. Deza, Encyclopedia of Distances, Springer 2009, §17.1 (cosine similarity). O(d).
 * @example cosine.distance(Float64Array.of(1, 0, 0, 1), 2, 0, 1) // => 1
 */
export const cosine: Metric = {
  name: "cosine",
  isTrueMetric: false,
  distance: cosineDistance,
  within(values, d, i, j, radius) {
    return cosineDistance(values, d, i, j) <= radius;
  },
  isUndefinedRow(values, d, i) {
    for (let k = i * d; k < i * d + d; ++k) if (values[k] !== 0) return false;
    return true;
  },
};

function cosineDistance(values: Float64Array, d: number, i: number, j: number): number {
  const [dot, xx, yy] = rowSums(values, d, i, j);
  return cosineOfSums(dot, xx, yy, () => rowSums(values, d, i, j, 0, 0, rowScale(values, d, i), rowScale(values, d, j)));
}
