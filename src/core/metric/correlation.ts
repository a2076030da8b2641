import { cosineOfSums, rowScale, rowSums } from "./cosineOfSums.ts";
import type { Metric } from "./types.ts";

/**
 * Correlation distance, d(x, y) = 1 − r(x, y), with r the Pearson correlation between the two
 * rows' values across columns: each row is centred on its own mean (summed in column order),
 * then the cosine distance of the centred rows is taken, all in Float64.
 * Not a metric (the triangle inequality fails, as for cosine distance). Undefined for a
 * constant row (zero spread); such rows are left out of the build and reported.
 * Source: M. M. Deza and E. Deza, Encyclopedia of Distances, Springer 2009, §17.4 (Pearson correlation distance). O(d).
 * @example correlation.distance(Float64Array.of(1, 2, 3, 6, 4, 2), 3, 0, 1) // => 2
 */
export const correlation: Metric = {
  name: "correlation",
  isTrueMetric: false,
  distance: correlationDistance,
  within(values, d, i, j, radius) {
    return correlationDistance(values, d, i, j) <= radius;
  },
  isUndefinedRow(values, d, i) {
    for (let k = i * d + 1; k < i * d + d; ++k) if (values[k] !== values[i * d]) return false;
    return true;
  },
};

function rowMean(values: Float64Array, d: number, i: number): number {
  let sum = 0;
  for (let k = i * d; k < i * d + d; ++k) sum += values[k]!;
  return sum / d;
}

function correlationDistance(values: Float64Array, d: number, i: number, j: number): number {
  const meanX = rowMean(values, d, i);
  const meanY = rowMean(values, d, j);
  const [dot, xx, yy] = rowSums(values, d, i, j, meanX, meanY);
  return cosineOfSums(dot, xx, yy, () => rowSums(values, d, i, j, meanX, meanY, rowScale(values, d, i, meanX), rowScale(values, d, j, meanY)));
}
