/**
 * Cohen's d with the pooled standard deviation ("d vs rest": a region against the other rows):
 *   d = (mean_x − mean_y) / s_pooled,  s_pooled = √(((n_x − 1)s_x² + (n_y − 1)s_y²) / (n_x + n_y − 2)),
 * with s² the sample variances (n − 1). The sums of squared deviations are taken about each
 * sample's own mean in a second pass, so large offsets do not cancel.
 * Source: J. Cohen, Statistical Power Analysis for the Behavioral Sciences, 2nd ed., 1988, §2.2
 * (d_s with the pooled within-group standard deviation; no small-sample (Hedges) correction).
 * O(n_x + n_y).
 * Degenerate input: NaN values are skipped; NaN when either sample is empty, when n_x + n_y < 3
 * (no degree of freedom for the spread) or when the pooled standard deviation is 0.
 * @example cohensD([2, 4, 6], [1, 3]) // => 1.0954451150103321
 */
export function cohensD(x: ArrayLike<number>, y: ArrayLike<number>): number {
  const a = moments(x);
  const b = moments(y);
  if (a.count === 0 || b.count === 0 || a.count + b.count < 3) return NaN;
  const pooled = Math.sqrt((a.squares + b.squares) / (a.count + b.count - 2));
  return pooled > 0 ? (a.mean - b.mean) / pooled : NaN;
}

function moments(values: ArrayLike<number>): { count: number; mean: number; squares: number } {
  let count = 0;
  let sum = 0;
  for (let k = 0; k < values.length; ++k) {
    const v = values[k]!;
    if (Number.isNaN(v)) continue;
    count++;
    sum += v;
  }
  const mean = count === 0 ? NaN : sum / count;
  let squares = 0;
  for (let k = 0; k < values.length; ++k) {
    const v = values[k]!;
    if (!Number.isNaN(v)) squares += (v - mean) * (v - mean);
  }
  return { count, mean, squares };
}
