import type { MetricName } from "../params.ts";

export type { MetricName };

/**
 * A distance on rows of a row-major matrix. `within` is the reference predicate d(x, y) ≤ r,
 * computed in Float64 in a fixed order: every build decision goes through it, and any faster
 * path may only prune candidates before calling it.
 */
export interface Metric {
  readonly name: MetricName;
  /** True when the triangle inequality holds, so that pruning by it is sound. */
  readonly isTrueMetric: boolean;
  distance(values: Float64Array, d: number, i: number, j: number): number;
  within(values: Float64Array, d: number, i: number, j: number, radius: number): boolean;
  /** Rows on which the distance is undefined (they must be left out, with a notice); absent when none can be. */
  isUndefinedRow?(values: Float64Array, d: number, i: number): boolean;
}
