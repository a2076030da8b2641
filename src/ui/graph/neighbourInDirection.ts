import type { Point } from "./pointInPolygon.ts";

/** Screen angle of each arrow key, in radians, measured with y growing downwards (ArrowUp is −y). */
export const arrowAngles: Readonly<Record<string, number>> = {
  ArrowRight: 0,
  ArrowDown: Math.PI / 2,
  ArrowLeft: Math.PI,
  ArrowUp: -Math.PI / 2,
};

// cos and sin of the arrow's angle, with values within 1e-12 of 0 or ±1 made exact, so that the four
// arrows point exactly along the axes and a neighbour square to an arrow gets a dot product of exactly 0
const exact = (v: number): number => (Math.abs(v) < 1e-12 ? 0 : Math.abs(Math.abs(v) - 1) < 1e-12 ? Math.sign(v) : v);

/**
 * The neighbour to move keyboard focus to: among `neighbours` of node `from`, the one whose
 * direction on screen is closest in angle to the arrow's. With d = p_n − p_from and the arrow's unit
 * vector u = (cos a, sin a), the angle θ between them has cos θ = (d · u) / |d|; the closest
 * direction is the largest cos θ. Only θ strictly below 90° counts (d · u > 0): a neighbour exactly
 * square to the arrow is not in its direction. Ties (equal cos θ) go to the lower node number.
 * A neighbour at the same point as `from`, or without a position, has no direction and is skipped.
 * Degenerate input: no neighbour within 90° (or none at all) gives null, and focus stays.
 * O(d) for d neighbours.
 * @example neighbourInDirection(0, [1, 2], [{ x: 0, y: 0 }, { x: 10, y: -1 }, { x: 0, y: -10 }], 0) // => 1
 */
export function neighbourInDirection(from: number, neighbours: ArrayLike<number>, positions: ArrayLike<Point | undefined>, arrowAngle: number): number | null {
  const origin = positions[from];
  if (!origin) return null;
  const ux = exact(Math.cos(arrowAngle));
  const uy = exact(Math.sin(arrowAngle));
  let best: number | null = null;
  let bestCosine = 0;
  for (let i = 0; i < neighbours.length; ++i) {
    const node = neighbours[i]!;
    const p = positions[node];
    if (!p || node === from) continue;
    const dx = p.x - origin.x;
    const dy = p.y - origin.y;
    const length = Math.hypot(dx, dy);
    if (!(length > 0)) continue;
    const dot = dx * ux + dy * uy;
    if (!(dot > 0)) continue;
    const cosine = dot / length;
    if (best === null || cosine > bestCosine || (cosine === bestCosine && node < best)) {
      best = node;
      bestCosine = cosine;
    }
  }
  return best;
}
