const smallestNormal = 2.2250738585072014e-308; // 2^-1022, IEEE 754 binary64

/**
 * 1 − cos from the sums of a row pair: dot = Σxᵢyᵢ, xx = Σxᵢ², yy = Σyᵢ², as 1 − dot / √(xx·yy).
 * When a sum or the product xx·yy leaves the normal range (rows of tiny or huge norm), the
 * caller's `rescaled` recomputes the sums on rows divided by their largest |value|, which
 * leaves the cosine unchanged and keeps every sum near 1.
 */
export function cosineOfSums(dot: number, xx: number, yy: number, rescaled: () => readonly [number, number, number]): number {
  const product = xx * yy;
  if (xx >= smallestNormal && yy >= smallestNormal && product >= smallestNormal && product < Infinity) return 1 - dot / Math.sqrt(product);
  const [d, x, y] = rescaled();
  return 1 - d / Math.sqrt(x * y);
}

/** Σxᵢyᵢ, Σxᵢ², Σyᵢ² (column order) of two rows after subtracting `shiftX`, `shiftY` and dividing by `scaleX`, `scaleY`. */
export function rowSums(
  values: Float64Array, d: number, i: number, j: number,
  shiftX = 0, shiftY = 0, scaleX = 1, scaleY = 1,
): [number, number, number] {
  const a = i * d;
  const b = j * d;
  let dot = 0;
  let xx = 0;
  let yy = 0;
  for (let k = 0; k < d; ++k) {
    const x = (values[a + k]! - shiftX) / scaleX;
    const y = (values[b + k]! - shiftY) / scaleY;
    dot += x * y;
    xx += x * x;
    yy += y * y;
  }
  return [dot, xx, yy];
}

/** Largest |xᵢ − shift| of a row (1 for an all-zero row, so division is harmless). */
export function rowScale(values: Float64Array, d: number, i: number, shift = 0): number {
  let largest = 0;
  for (let k = i * d; k < i * d + d; ++k) largest = Math.max(largest, Math.abs(values[k]! - shift));
  return largest > 0 ? largest : 1;
}
