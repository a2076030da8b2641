/**
 * Exact two-sided p-value of the two-sample Kolmogorov–Smirnov test, P(D_{m,n} ≥ d) under the null
 * hypothesis that both samples come from one continuous distribution, by counting lattice paths.
 * Formula: the C(m + n, m) orderings of the pooled sample are equally likely; an ordering is a path
 * from (0, 0) to (m, n) stepping i → i + 1 for a value of x and j → j + 1 for a value of y, and
 * D ≥ d exactly when the path touches a point with |i·n − j·m| ≥ q, q = ⌈d·m·n − 1e-7⌉. The
 * comparison is in integers; the 1e-7 (R's) only absorbs the rounding of d·m·n: d from ksStatistic is
 * an integer over m·n, so d·m·n is off by a few ulps, far less than 1e-7 while m·n < 1e8.
 *   p = hits(m, n) / C(m + n, m), where hits(i, j) = C(i + j, i) on a touching point and
 *   hits(i − 1, j) + hits(i, j − 1) elsewhere (the paths into (i, j) that have touched).
 * Source: the lattice-path recursion of J. L. Hodges Jr., Ark. Mat. 3:469–486, 1958, in the
 * ratio-scaled form of R's psmirnov exact branch without ties (row i scaled by 1 / C(i + n, n), so
 * every stored number is at most 1 and nothing overflows). Variant: this counts the paths that
 * touch the boundary instead of 1 − the paths that avoid it, so a small p keeps its relative accuracy.
 * Ties: the count assumes no ties. With ties D can only be read at the ends of tied runs, so the
 * exact p given the ties is at most this one: the value is conservative.
 * O(m·n) time, O(min(m, n)) memory. A p below about 1e-300 (possible only when C(m + n, m) > 1e300,
 * far beyond the m·n ≤ 10,000 where ksPValue uses this) underflows and loses digits.
 * Degenerate input: d ≤ 0 gives 1; d > 1 gives 0; NaN gives NaN; m or n not a positive integer throws.
 * @example ksExactPValue(0.5, 3, 2) // => 0.9 (1 of the 10 orderings of 3 and 2 values has D < 1/2)
 */
export function ksExactPValue(d: number, m: number, n: number): number {
  if (!Number.isInteger(m) || m < 1) throw new Error(`invalid sample size: ${m}`);
  if (!Number.isInteger(n) || n < 1) throw new Error(`invalid sample size: ${n}`);
  if (Number.isNaN(d)) return NaN;
  const q = Math.ceil(d * m * n - 1e-7); // R's psmirnov tolerance for the rounding of d·m·n
  if (q <= 0) return 1;
  if (q > m * n) return 0;
  // P(D ≥ d) is symmetric in the two sizes; keep the shorter side as the stored row.
  const rows = Math.max(m, n);
  const cols = Math.min(m, n);
  const total = new Float64Array(cols + 1);
  const hits = new Float64Array(cols + 1);
  for (let j = 0; j <= cols; ++j) {
    total[j] = 1;
    hits[j] = j * rows >= q ? 1 : j > 0 ? hits[j - 1]! : 0;
  }
  for (let i = 1; i <= rows; ++i) {
    const w = i / (i + cols);
    total[0] = w * total[0]!;
    hits[0] = i * cols >= q ? total[0] : w * hits[0]!;
    for (let j = 1; j <= cols; ++j) {
      total[j] = w * total[j]! + total[j - 1]!;
      hits[j] = Math.abs(i * cols - j * rows) >= q ? total[j]! : w * hits[j]! + hits[j - 1]!;
    }
  }
  return Math.min(1, hits[cols]!);
}
