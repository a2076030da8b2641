/**
 * K radii evenly spaced in log r from `min` to `max`, both included:
 *   r_k = min · (max / min)^(k / (K − 1)),  k = 0..K−1 (r_0 = min and r_{K−1} = max exactly).
 * O(K). Throws for a non-positive or non-finite end, max ≤ min, or K not an integer ≥ 2.
 * @example logSpacedRadii(1, 100, 3) // => Float64Array [1, 10, 100]
 */
export function logSpacedRadii(min: number, max: number, steps: number): Float64Array {
  if (!(min > 0) || !Number.isFinite(min)) throw new Error(`invalid radius: ${min}`);
  if (!(max > 0) || !Number.isFinite(max)) throw new Error(`invalid radius: ${max}`);
  if (!(max > min)) throw new Error(`invalid radius range: ${min} to ${max}`);
  if (!Number.isInteger(steps) || steps < 2) throw new Error(`invalid steps: ${steps}`);
  const radii = new Float64Array(steps);
  const ratio = Math.log(max / min);
  for (let k = 0; k < steps; ++k) radii[k] = min * Math.exp((ratio * k) / (steps - 1));
  radii[0] = min;
  radii[steps - 1] = max;
  return radii;
}

/** Radii of an explicit list, checked, ascending, each once. */
export function ascendingRadii(radii: ArrayLike<number>): Float64Array {
  if (radii.length === 0) throw new Error("a sweep needs at least one radius");
  for (let k = 0; k < radii.length; ++k) {
    const r = radii[k]!;
    if (!(r > 0) || !Number.isFinite(r)) throw new Error(`invalid radius: ${r}`);
  }
  const sorted = Float64Array.from(radii).sort();
  return sorted.filter((r, k) => k === 0 || r !== sorted[k - 1]);
}
