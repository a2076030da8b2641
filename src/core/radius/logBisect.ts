/** The bracket left by a log-bisection, and the radius probed last. */
export interface Bisection {
  readonly lo: number;
  readonly hi: number;
  /** The last radius probed (the found one when `fits` answered "found"); hi when no step ran. */
  readonly last: number;
  readonly probes: number;
}

/**
 * Bisection in log r, the one search every radius rule uses: probe r = √(lo · hi), the midpoint
 * in log r; when `fits(r)` is true the answer lies at or below r (hi = r), when false above it
 * (lo = r), when "found" the search stops. Stops after `steps` probes; each halves the bracket's
 * log width, so k steps leave a factor (hi/lo)^(2^−k).
 * Source: bisection method, e.g. R. L. Burden and J. D. Faires, Numerical Analysis, 9th ed.,
 * Brooks/Cole 2011, §2.1, on log r. O(steps) calls of `fits`.
 * Degenerate input: lo and hi must be positive and finite with lo < hi, else it throws.
 * @example logBisect(1, 16, 2, (r) => r >= 3).hi // => 4 (probes 4, then 2)
 */
export function logBisect(lo: number, hi: number, steps: number, fits: (radius: number) => boolean | "found"): Bisection {
  if (!(lo > 0 && lo < hi && Number.isFinite(hi))) throw new Error(`invalid radius bracket: ${lo} to ${hi}`);
  let last = hi;
  let probes = 0;
  while (probes < steps) {
    const mid = Math.sqrt(lo * hi);
    last = mid;
    probes++;
    const verdict = fits(mid);
    if (verdict === "found") break;
    if (verdict) hi = mid;
    else lo = mid;
  }
  return { lo, hi, last, probes };
}
