// Lanczos coefficients for g = 607/128 with 14 terms, as printed in W. H. Press et al.,
// Numerical Recipes, 3rd ed., 2007, §6.1 (routine gammln), each written as its nearest double.
const coefficients = [
  57.15623566586292, -59.59796035547549, 14.136097974741746, -0.4919138160976202,
  0.00003399464998481189, 0.00004652362892704858, -0.00009837447530487956, 0.0001580887032249125,
  -0.00021026444172410488, 0.00021743961811521265, -0.0001643181065367639, 0.00008441822398385275,
  -0.000026190838401581408, 0.0000036899182659531625,
];

/**
 * Natural logarithm of the gamma function, ln Γ(x) for x > 0, by the Lanczos approximation:
 *   ln Γ(x) = (x + ½) ln(x + g + ½) − (x + g + ½) + ln(√(2π) · (c₀ + Σ_{k=1}^{14} c_k / (x + k)) / x),
 * g = 607/128, c₀ = 0.9999999999999971 and c_k as listed above this function.
 * Source: C. Lanczos, SIAM J. Numer. Anal. B 1:86–96, 1964; the coefficient set of W. H. Press et al.,
 * Numerical Recipes, 3rd ed., 2007, §6.1 (gammln, relative error below about 1e-15). O(1).
 * Degenerate input: x ≤ 0 or NaN throws (the gamma function has poles at 0, −1, …, and this
 * routine is only needed for positive shapes).
 * @example logGamma(0.5) // => 0.5723649429247001 (ln √π)
 */
export function logGamma(x: number): number {
  if (!(x > 0)) throw new Error(`logGamma requires a positive argument: ${x}`);
  let y = x;
  const shifted = x + 5.2421875; // g + ½ = 607/128 + ½, Numerical Recipes 3rd ed. §6.1
  const leading = (x + 0.5) * Math.log(shifted) - shifted;
  let series = 0.9999999999999971; // c₀, Numerical Recipes 3rd ed. §6.1
  for (const c of coefficients) series += c / ++y;
  return leading + Math.log((2.5066282746310007 * series) / x); // √(2π)
}
