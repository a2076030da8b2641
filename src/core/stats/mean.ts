/**
 * Arithmetic mean, Σx / n, skipping NaN (missing) values.
 * Returns NaN when no value is present. O(n).
 * @example mean([1, 2, NaN, 6]) // => 3
 */
export function mean(values: ArrayLike<number>): number {
  let sum = 0;
  let count = 0;
  for (let i = 0; i < values.length; ++i) {
    const x = values[i]!;
    if (Number.isNaN(x)) continue;
    sum += x;
    count++;
  }
  return count === 0 ? NaN : sum / count;
}
