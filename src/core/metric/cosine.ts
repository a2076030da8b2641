import type { Metric } from "./types.ts";

/**
 * Cosine distance, d(x, y) = 1 − (x·y) / (‖x‖ ‖y‖), with x·y, ‖x‖² and ‖y‖² summed together in
 * column order; within(x, y, r) ⇔ 1 − x·y / √(‖x‖²‖y‖²) ≤ r in Float64.
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
  const a = i * d;
  const b = j * d;
  let dot = 0;
  let xx = 0;
  let yy = 0;
  for (let k = 0; k < d; ++k) {
    const x = values[a + k]!;
    const y = values[b + k]!;
    dot += x * y;
    xx += x * x;
    yy += y * y;
  }
  return 1 - dot / Math.sqrt(xx * yy);
}
