import { quantileSorted } from "./quantileSorted.ts";
import { sampleVariance } from "./sampleVariance.ts";

/** Descriptive statistics of one column over a set of rows. */
export interface ColumnSummary {
  readonly count: number;
  readonly missing: number;
  readonly mean: number;
  /** Sample standard deviation (n − 1); NaN for fewer than two values. */
  readonly sd: number;
  readonly min: number;
  readonly q1: number;
  readonly median: number;
  readonly q3: number;
  readonly max: number;
}

/**
 * Summarises `column` over `rows` (0-based row numbers): count of present values, missing
 * count, mean, sample standard deviation, minimum, type-7 quartiles and maximum.
 * O(m log m) for m rows. Every statistic is NaN when no value is present.
 * @example columnSummary(Float64Array.of(4, NaN, 1, 3), Uint32Array.of(0, 1, 2, 3)).median // => 3
 */
export function columnSummary(column: Float64Array, rows: ArrayLike<number>): ColumnSummary {
  const present = new Float64Array(rows.length);
  let count = 0;
  for (let k = 0; k < rows.length; ++k) {
    const x = column[rows[k]!]!;
    if (!Number.isNaN(x)) present[count++] = x;
  }
  const sorted = present.subarray(0, count).sort();
  let sum = 0;
  for (let k = 0; k < count; ++k) sum += sorted[k]!;
  return {
    count,
    missing: rows.length - count,
    mean: count === 0 ? NaN : sum / count,
    sd: Math.sqrt(sampleVariance(sorted)),
    min: count === 0 ? NaN : sorted[0]!,
    q1: quantileSorted(sorted, 0.25),
    median: quantileSorted(sorted, 0.5),
    q3: quantileSorted(sorted, 0.75),
    max: count === 0 ? NaN : sorted[count - 1]!,
  };
}
