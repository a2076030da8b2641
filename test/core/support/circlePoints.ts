/**
 * N evenly spaced points on a circle of radius 1 about (cx, cy), point k at angle 2πk/N + phase,
 * as [x, y] pairs in order of k.
 */
export function circlePoints(n: number, cx = 0, cy = 0, phase = 0): number[][] {
  return Array.from({ length: n }, (_, k) => [cx + Math.cos((2 * Math.PI * k) / n + phase), cy + Math.sin((2 * Math.PI * k) / n + phase)]);
}

/** Chord between two of N evenly spaced points on the unit circle that are m steps apart: 2 sin(πm/N) (worked by hand: isosceles triangle with apex angle 2πm/N). */
export const chord = (m: number, n: number): number => 2 * Math.sin((Math.PI * m) / n);
