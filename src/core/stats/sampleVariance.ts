/**
 * Sample variance (divides by n − 1), Welford's one-pass update, skipping NaN values; for k = 1..n:
 *   delta = x_k − mean; mean += delta / k; m2 += delta · (x_k − mean); then var = m2 / (n − 1)
 * Source: B. P. Welford, Technometrics 4(3):419–420, 1962. O(n).
 * Returns NaN for fewer than two values (the sample variance is undefined there).
 * @example sampleVariance([2, 4, 4, 4, 5, 5, 7, 9]) // => 4.571428571428571
 */
export function sampleVariance(values: ArrayLike<number>): number {
  let mean = 0;
  let m2 = 0;
  let k = 0;
  for (let i = 0; i < values.length; ++i) {
    const x = values[i]!;
    if (Number.isNaN(x)) continue;
    k++;
    const delta = x - mean;
    mean += delta / k;
    m2 += delta * (x - mean);
  }
  return k < 2 ? NaN : m2 / (k - 1);
}
