import { logGamma } from "./logGamma.ts";

const epsilon = 1e-16; // relative stopping size of a term, about one ulp of 1 (common practice, no source)
const tiny = 1e-300; // Lentz's guard against a zero denominator, Numerical Recipes 3rd ed. §5.2
const maxTerms = 100_000; // both expansions need O(√a) terms; far more than any table's degrees of freedom

/**
 * Regularized upper incomplete gamma function Q(a, x) = Γ(a, x) / Γ(a) = 1 − P(a, x), for a > 0, x ≥ 0.
 * The chi-squared survival function is Q(df/2, X²/2).
 * Variant: for x < a + 1 the series P(a, x) = e^{−x} x^a / Γ(a) · Σ_{n≥0} x^n / (a (a+1) … (a+n)),
 * then Q = 1 − P; otherwise the continued fraction
 *   Q(a, x) = e^{−x} x^a / Γ(a) · 1/(x + 1 − a − 1·(1 − a)/(x + 3 − a − 2·(2 − a)/(x + 5 − a − …)))
 * by the modified Lentz method. Both stop when a term changes the sum by less than 1e-16 relative.
 * Source: W. H. Press et al., Numerical Recipes, 3rd ed., 2007, §6.2 (gser and gcf; the quadrature
 * they use for a > 100 is not needed here: the expansions converge there too, only more slowly).
 * O(√a) terms for x near a, fewer elsewhere.
 * Degenerate input: x = 0 gives 1; x = +∞ gives 0; NaN gives NaN; a ≤ 0 or x < 0 throws.
 * @example regularizedGammaQ(1, 2) // => 0.1353352832366127 (e^{−2}: chi-squared with 2 df at 4)
 */
export function regularizedGammaQ(a: number, x: number): number {
  if (Number.isNaN(a) || Number.isNaN(x)) return NaN;
  if (!(a > 0) || a === Infinity) throw new Error(`invalid gamma shape: ${a}`);
  if (x < 0) throw new Error(`invalid gamma argument: ${x}`);
  if (x === 0) return 1;
  if (x === Infinity) return 0;
  const logPrefactor = -x + a * Math.log(x) - logGamma(a);
  if (x < a + 1) {
    let term = 1 / a;
    let sum = term;
    for (let n = 1; n <= maxTerms; ++n) {
      term *= x / (a + n);
      sum += term;
      if (Math.abs(term) < Math.abs(sum) * epsilon) return Math.max(0, 1 - sum * Math.exp(logPrefactor));
    }
    throw new Error(`regularizedGammaQ did not converge: a = ${a}, x = ${x}`);
  }
  let b = x + 1 - a;
  let c = 1 / tiny;
  let d = 1 / b;
  let h = d;
  for (let n = 1; n <= maxTerms; ++n) {
    const an = -n * (n - a);
    b += 2;
    d = an * d + b;
    if (Math.abs(d) < tiny) d = tiny;
    c = b + an / c;
    if (Math.abs(c) < tiny) c = tiny;
    d = 1 / d;
    const delta = d * c;
    h *= delta;
    if (Math.abs(delta - 1) < epsilon) return Math.exp(logPrefactor) * h;
  }
  throw new Error(`regularizedGammaQ did not converge: a = ${a}, x = ${x}`);
}
