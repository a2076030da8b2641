/**
 * SVG path of an empirical CDF as steps: from the bottom left, up by 1/n at each value of the
 * ascending sample, mapped linearly from [lo, hi] to [0, width] and from [0, 1] to [height, 0].
 * An empty sample gives "" (nothing drawn); lo = hi puts every step in the middle. O(n).
 * @example ecdfPath(Float64Array.of(0, 1), 0, 1, 10, 10) // => "M0,10H0V5H10V0"
 */
export function ecdfPath(sorted: Float64Array, lo: number, hi: number, width: number, height: number): string {
  const n = sorted.length;
  if (n === 0) return "";
  const x = (v: number): number => (hi > lo ? ((v - lo) / (hi - lo)) * width : width / 2);
  const parts = [`M${x(sorted[0]!)},${height}`];
  for (let i = 0; i < n; ++i) parts.push(`H${x(sorted[i]!)}V${height - ((i + 1) / n) * height}`);
  return parts.join("");
}
