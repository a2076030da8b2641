const unitRoundoff = 2 ** -53; // IEEE 754 binary64, round to nearest
const slack = 64; // safety factor over the derived rounding bound

/**
 * Pruning threshold for cosine and correlation distance in unit rows:
 *   T(r) = 2r + 64 · (2r + 32) · (d + 8) · u,  u = 2⁻⁵³.
 * If the reference predicate accepts a pair (its computed 1 − x·y/√(‖x‖²‖y‖²) is ≤ r), the pair's
 * Σₖ (ûₖ − v̂ₖ)², computed in column order from the unit rows of unitRows.ts, is ≤ T(r); so a
 * pair whose value exceeds T(r) may be pruned. Derivation, with γₘ = m·u/(1 − m·u) and
 * D = 1 − cos(x, y) of the rows the predicate sees (Higham, Accuracy and Stability of
 * Numerical Algorithms, 2nd ed., SIAM 2002, §3.1–3.2):
 * 1. The predicate forms x·y, ‖x‖² and ‖y‖² with absolute errors ≤ γ_{d+2}·‖x‖‖y‖ (Cauchy–Schwarz
 *    bounds Σ|xₖyₖ|; rows of tiny or huge norm are first divided by their largest |xₖ|, one more
 *    rounding each), then a product, square root, division and subtraction, so its value is
 *    within 6(d + 6)·u of D, and acceptance gives D ≤ r + 6(d + 6)·u.
 * 2. ‖u − v‖² = 2D for the true unit vectors, ‖û − u‖ ≤ γ_{d+4} and ‖u − v‖ ≤ 2, so
 *    ‖û − v̂‖² ≤ 2D + 9γ_{d+4}, and summation adds a relative γ_{d+4}.
 * Together the computed value is ≤ 2r + (2r + 25)(d + 8)·u·(1 + 10⁻²); the 64-fold slack also
 * covers the rounding of T itself. O(1).
 * @example angularThreshold(0.5, 2) // => 1.0000000000023448 (1 + 64 · 33 · 10 · 2⁻⁵³)
 */
export function angularThreshold(radius: number, dims: number): number {
  return 2 * radius + slack * (2 * radius + 32) * (dims + 8) * unitRoundoff;
}
