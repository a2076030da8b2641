import type { TreeQuery } from "./treeQuery.ts";

/**
 * Lower bound, in the norm's own units, on the value that the reference predicate computes for
 * a centre c (query.centre[query.centreBase + k]) and any row x inside the box of the node whose
 * values start at `base` (query.lo[base + k] ≤ xₖ ≤ query.hi[base + k]):
 *   gₖ = fl(loₖ − cₖ) if cₖ < loₖ, fl(cₖ − hiₖ) if cₖ > hiₖ, else 0;
 *   bound = Σ gₖ² ("squares"), Σ gₖ ("sum") or max gₖ ("max"), in column order.
 * Why it is a bound in floating point, with no margin: rounding is monotone and symmetric, so
 * for loₖ ≤ xₖ, cₖ < loₖ gives |fl(cₖ − xₖ)| = fl(xₖ − cₖ) ≥ fl(loₖ − cₖ) = gₖ (likewise above hiₖ);
 * squaring non-negative numbers is monotone; and fl(a + b) ≥ fl(a' + b') when a ≥ a' ≥ 0 and
 * b ≥ b' ≥ 0, so each partial sum of the predicate's terms is at least the same partial sum of
 * the gₖ terms. Hence bound > threshold proves that the predicate rejects every row of the box.
 * (Source of the box test: J. H. Friedman, J. L. Bentley and R. A. Finkel, ACM Trans. Math. Softw.
 * 3(3):209–226, 1977, "bounds-overlap-ball".) Stops early once the bound exceeds query.limit. O(d).
 * @example boxBound({ norm: "squares", dims: 2, lo: Float64Array.of(1, 1), hi: Float64Array.of(2, 2), centre: Float64Array.of(0, 0), centreBase: 0, limit: Infinity, … }, 0) // => 2
 */
export function boxBound(query: TreeQuery, base: number): number {
  const { norm, lo, hi, centre, centreBase, dims, limit } = query;
  if (norm === "squares") return squaresBound(lo, hi, base, centre, centreBase, dims, limit);
  return absoluteBound(norm === "max", lo, hi, base, centre, centreBase, dims, limit);
}

function squaresBound(lo: Float64Array, hi: Float64Array, base: number, centre: Float64Array, centreBase: number, dims: number, limit: number): number {
  let bound = 0;
  for (let k = 0; k < dims; ++k) {
    const c = centre[centreBase + k]!;
    const low = lo[base + k]!;
    const high = hi[base + k]!;
    const gap = c < low ? low - c : c > high ? c - high : 0;
    bound += gap * gap;
    if (bound > limit) return bound;
  }
  return bound;
}

function absoluteBound(max: boolean, lo: Float64Array, hi: Float64Array, base: number, centre: Float64Array, centreBase: number, dims: number, limit: number): number {
  let bound = 0;
  for (let k = 0; k < dims; ++k) {
    const c = centre[centreBase + k]!;
    const low = lo[base + k]!;
    const high = hi[base + k]!;
    const gap = c < low ? low - c : c > high ? c - high : 0;
    bound = max ? Math.max(bound, gap) : bound + gap;
    if (bound > limit) return bound;
  }
  return bound;
}
