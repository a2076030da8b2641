/**
 * Quantile of ascending-sorted values, Hyndman–Fan type 7 (linear interpolation between
 * order statistics; the default of R's quantile(), NumPy's percentile and d3-array's quantile):
 *   h = (n − 1) · p; Q(p) = x[⌊h⌋] + (h − ⌊h⌋) · (x[⌊h⌋ + 1] − x[⌊h⌋])   (0-based)
 * Source: R. J. Hyndman and Y. Fan, The American Statistician 50(4):361–365, 1996. O(1).
 * Returns NaN for an empty array; throws for p outside [0, 1].
 * @example quantileSorted([1, 2, 3, 4], 0.25) // => 1.75
 */
export function quantileSorted(sorted: ArrayLike<number>, p: number): number {
  if (!(p >= 0 && p <= 1)) throw new Error(`invalid quantile probability: ${p}`);
  const n = sorted.length;
  if (n === 0) return NaN;
  const h = (n - 1) * p;
  const lo = Math.floor(h);
  const below = sorted[lo]!;
  if (lo + 1 >= n) return below;
  return below + (h - lo) * (sorted[lo + 1]! - below);
}
