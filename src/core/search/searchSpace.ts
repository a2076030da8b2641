import { chebyshev } from "../metric/chebyshev.ts";
import { correlation } from "../metric/correlation.ts";
import { cosine } from "../metric/cosine.ts";
import { euclidean } from "../metric/euclidean.ts";
import { manhattan } from "../metric/manhattan.ts";
import type { Metric } from "../metric/types.ts";
import type { NumericTable } from "../table/types.ts";
import { angularThreshold } from "./angularThreshold.ts";
import { unitRows } from "./unitRows.ts";

/** How coordinate differences δₖ = fl(cₖ − xₖ) combine, always over k = 0..d−1 in column order: Σ δₖ², Σ |δₖ| or max |δₖ|. */
export type Norm = "squares" | "sum" | "max";

/**
 * The coordinates an index prunes in, and the largest norm value that a pair the metric's
 * reference predicate accepts at radius r can have there ("threshold"): a pair whose value,
 * summed in column order, exceeds it is rejected by the predicate, so it may be pruned.
 * - Euclidean, Manhattan, Chebyshev: the table itself, thresholds r·r, r, r — the exact values
 *   the predicates compare with, so that pruning is exact (see boxBound.ts for the argument).
 * - cosine, correlation: rows centred (correlation) and scaled to unit length, Euclidean in
 *   them, since 1 − cos(x, y) = ‖u − v‖²/2; threshold 2r plus a rounding margin (angularThreshold.ts).
 */
export interface SearchSpace {
  /** Row-major n × dims coordinates, rows in table order. */
  readonly points: Float64Array;
  readonly dims: number;
  readonly norm: Norm;
  /** True when the threshold is the predicate's own bound, so a candidate's norm value already decides it. */
  readonly exact: boolean;
  readonly threshold: (radius: number) => number;
}

/**
 * The search space for a metric of the registry, or null when none applies: another metric
 * object, a value that is not finite (NaN or ±∞ make no box a bound), or cosine/correlation
 * rows whose squared norms could overflow or underflow in the reference predicate. Callers
 * then test every pair with the predicate. O(n·d).
 * @example searchSpace(table, manhattan)?.threshold(0.5) // => 0.5
 */
export function searchSpace(table: NumericTable, metric: Metric): SearchSpace | null {
  const { values: points, columns: dims } = table;
  for (let k = 0; k < points.length; ++k) if (!Number.isFinite(points[k]!)) return null;
  if (metric === euclidean) return { points, dims, norm: "squares", exact: true, threshold: (radius) => radius * radius };
  if (metric === manhattan) return { points, dims, norm: "sum", exact: true, threshold: (radius) => radius };
  if (metric === chebyshev) return { points, dims, norm: "max", exact: true, threshold: (radius) => radius };
  if (metric !== cosine && metric !== correlation) return null;
  const units = unitRows(table, metric === correlation);
  if (!units) return null;
  return { points: units, dims, norm: "squares", exact: false, threshold: (radius) => angularThreshold(radius, dims) };
}
