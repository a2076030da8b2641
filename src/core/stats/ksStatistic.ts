/**
 * Two-sample Kolmogorov–Smirnov statistic D = sup_t |F_m(t) − G_n(t)|, the largest gap between the
 * empirical distribution functions of `x` (m values) and `y` (n values).
 * Variant: both samples are sorted copies, and at each distinct value every tied value of both
 * samples is passed before the gap is read, so D is taken over the steps of F_m − G_n (as in R's
 * ks.test and SciPy's ks_2samp). The gap at a point is the integer |i·n − j·m| over m·n, with i and j
 * the values of x and y passed so far; D is the largest integer divided once by m·n, so D·m·n
 * recovers that integer to within one rounding.
 * Source: N. V. Smirnov, Bull. Math. Univ. Moscou 2(2):3–14, 1939; J. L. Hodges Jr., Ark. Mat.
 * 3:469–486, 1958, §1. O((m + n) log(m + n)) for the sorts, O(m + n) memory for the copies.
 * NaN values are skipped (the sizes for a p-value are then the counts of the values present).
 * Returns NaN when either sample has no value.
 * @example ksStatistic([1, 2, 3], [2, 4]) // => 0.5
 */
export function ksStatistic(x: ArrayLike<number>, y: ArrayLike<number>): number {
  const xs = sortedPresent(x);
  const ys = sortedPresent(y);
  const m = xs.length;
  const n = ys.length;
  if (m === 0 || n === 0) return NaN;
  let i = 0;
  let j = 0;
  let largest = 0;
  // Once one sample is used up the gap only shrinks towards 0 at the end, so the walk stops there.
  while (i < m && j < n) {
    const point = Math.min(xs[i]!, ys[j]!);
    while (i < m && xs[i] === point) ++i;
    while (j < n && ys[j] === point) ++j;
    const gap = Math.abs(i * n - j * m);
    if (gap > largest) largest = gap;
  }
  return largest / (m * n);
}

function sortedPresent(values: ArrayLike<number>): Float64Array {
  const present = new Float64Array(values.length);
  let count = 0;
  for (let k = 0; k < values.length; ++k) {
    const v = values[k]!;
    if (!Number.isNaN(v)) present[count++] = v;
  }
  return present.subarray(0, count).sort();
}
