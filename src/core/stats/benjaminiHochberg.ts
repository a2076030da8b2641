/**
 * Benjamini–Hochberg adjusted p-values (false discovery rate), step-up:
 *   with the m present p-values in ascending order p_(1) ≤ … ≤ p_(m),
 *   adjusted p_(i) = min_{k ≥ i} min(1, (m / k) · p_(k)),
 * i.e. a running minimum from the largest rank down, capped at 1 (the cap never binds: the largest
 * rank contributes p_(m) itself). Rejecting every hypothesis whose adjusted p is ≤ q is the step-up
 * procedure at level q. Same formula, in the same order of operations, as R's p.adjust(p, "BH").
 * Source: Y. Benjamini and Y. Hochberg, J. R. Stat. Soc. B 57(1):289–300, 1995, §3.
 * O(m log m) for the sort.
 * Ties: equal p-values get equal adjusted values whatever their order (the running minimum reaches
 * the tied run from its highest rank). NaN (a test not run) stays NaN and is not counted in m, as in
 * p.adjust, which leaves NA out. Empty input gives an empty array; a p outside [0, 1] throws.
 * Results are in input order.
 * @example benjaminiHochberg([0.01, 0.04, 0.03]) // => Float64Array [0.03, 0.04, 0.04]
 */
export function benjaminiHochberg(pValues: ArrayLike<number>): Float64Array {
  const adjusted = new Float64Array(pValues.length).fill(NaN);
  const order: number[] = [];
  for (let k = 0; k < pValues.length; ++k) {
    const p = pValues[k]!;
    if (Number.isNaN(p)) continue;
    if (!(p >= 0 && p <= 1)) throw new Error(`invalid p-value: ${p}`);
    order.push(k);
  }
  order.sort((a, b) => pValues[a]! - pValues[b]! || a - b);
  const m = order.length;
  let running = 1;
  for (let rank = m; rank >= 1; --rank) {
    const k = order[rank - 1]!;
    // m / rank ≥ 1 rounds to at least 1, so the product never rounds below the raw p (m · p / rank can).
    running = Math.min(running, (m / rank) * pValues[k]!);
    adjusted[k] = running;
  }
  return adjusted;
}
