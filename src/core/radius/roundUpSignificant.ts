/**
 * x rounded up to `digits` significant decimal digits: ⌈x · 10^s⌉ / 10^s with
 * s = digits − 1 − ⌊log10 x⌋. For positive finite x; the radius rules print radii this way.
 * O(1). Floating point may leave the last digit one unit above the decimal value (e.g. 0.1 + ε).
 * @example roundUpSignificant(0.00028284, 3) // => 0.000283
 */
export function roundUpSignificant(x: number, digits: number): number {
  if (!(x > 0) || !Number.isFinite(x)) throw new Error(`invalid value to round: ${x}`);
  const scale = 10 ** (digits - 1 - Math.floor(Math.log10(x)));
  return Math.ceil(x * scale) / scale;
}
