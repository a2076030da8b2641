/**
 * Survival function of the Kolmogorov distribution, the limit law of √N·D for Kolmogorov–Smirnov
 * statistics: Q_KS(λ) = P(K > λ) = 2 Σ_{k≥1} (−1)^{k−1} exp(−2k²λ²).
 * Variant: for λ < 1.18 the alternating series converges slowly, so Q = 1 − P with the equivalent
 * theta-function form P(λ) = (√(2π) / λ) Σ_{k≥1} exp(−(2k − 1)² π² / (8λ²)); at λ ≥ 1.18 the series
 * above. Each sum stops when a term no longer changes it (at most a handful of terms either way).
 * Source: A. N. Kolmogorov, Giorn. Ist. Ital. Attuari 4:83–91, 1933; the two forms and the switch at
 * 1.18 as in W. H. Press et al., Numerical Recipes, 3rd ed., 2007, §6.14 (the KSdist functions).
 * O(1). Degenerate input: λ ≤ 0 gives 1; +∞ gives 0; NaN gives NaN. Beyond λ ≈ 19.3 the value
 * (below 5e-324) underflows to 0.
 * @example kolmogorovSurvival(1) // => 0.26999967167735456
 */
export function kolmogorovSurvival(lambda: number): number {
  if (Number.isNaN(lambda)) return NaN;
  if (lambda <= 0) return 1;
  if (lambda < 1.18) {
    const y = (Math.PI * Math.PI) / (8 * lambda * lambda);
    let sum = 0;
    for (let k = 1; k <= 20; ++k) {
      const term = Math.exp(-(2 * k - 1) * (2 * k - 1) * y);
      if (sum + term === sum) break;
      sum += term;
    }
    // Below λ ≈ 0.04 every term underflows to 0, and below λ ≈ 2.5e-308 √(2π)/λ overflows too (∞ · 0 = NaN): P is 0.
    return sum === 0 ? 1 : 1 - (Math.sqrt(2 * Math.PI) / lambda) * sum;
  }
  let sum = 0;
  for (let k = 1; k <= 20; ++k) {
    const term = Math.exp(-2 * k * k * lambda * lambda);
    if (sum + term === sum) break;
    sum += k % 2 === 1 ? term : -term;
  }
  return 2 * sum;
}
