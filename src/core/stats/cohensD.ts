import { mean } from "./mean.ts";
import { sampleVariance } from "./sampleVariance.ts";

/**
 * Cohen's d with the pooled standard deviation ("d vs rest": a region against the other rows):
 *   d = (mean_x − mean_y) / s_pooled,  s_pooled = √(((n_x − 1)s_x² + (n_y − 1)s_y²) / (n_x + n_y − 2)),
 * with s² the sample variances (n − 1) by `sampleVariance` (Welford's update, so large offsets
 * do not cancel) and the means by `mean`.
 * Source: J. Cohen, Statistical Power Analysis for the Behavioral Sciences, 2nd ed., 1988, §2.2
 * (d_s with the pooled within-group standard deviation; no small-sample (Hedges) correction).
 * O(n_x + n_y).
 * Degenerate input: NaN values are skipped; NaN when either sample is empty, when n_x + n_y < 3
 * (no degree of freedom for the spread) or when the pooled standard deviation is 0.
 * @example cohensD([2, 4, 6], [1, 3]) // => 1.0954451150103321
 */
export function cohensD(x: ArrayLike<number>, y: ArrayLike<number>): number {
  const a = spread(x);
  const b = spread(y);
  if (a.count === 0 || b.count === 0 || a.count + b.count < 3) return NaN;
  const pooled = Math.sqrt((a.squares + b.squares) / (a.count + b.count - 2));
  return pooled > 0 ? (mean(x) - mean(y)) / pooled : NaN;
}

/** Count of present values and their sum of squared deviations, (n − 1)·s² (0 for a single value). */
function spread(values: ArrayLike<number>): { count: number; squares: number } {
  let count = 0;
  for (let k = 0; k < values.length; ++k) if (!Number.isNaN(values[k]!)) count++;
  return { count, squares: count < 2 ? 0 : sampleVariance(values) * (count - 1) };
}
