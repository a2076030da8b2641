import { randomSource, shuffledOrder } from "../../core/random.ts";

const initialRadius = 10; // d3-force 3.0, simulation.js: the spiral's first radius
const initialAngle = Math.PI * (3 - Math.sqrt(5)); // d3-force 3.0, simulation.js: the golden angle

/**
 * Starting positions for layout `seed`: the phyllotaxis spiral d3-force uses for nodes without a
 * position, spot i at radius 10·√(0.5 + i) and angle i·π(3 − √5) (H. Vogel, "A better way to
 * construct the sunflower head", Math. Biosci. 44:179–189, 1979; as in d3-force 3.0). Layout 1
 * puts node i on spot i, the tidy start d3-force itself would give; layout s > 1 deals the spots
 * out in a Fisher–Yates order from the seeded generator (core/random.ts), so every seed starts
 * from the same compact disc with the nodes in another order, and the same seed gives the same start.
 * Returns x₀, y₀, x₁, y₁, … O(n).
 * Degenerate input: n = 0 gives an empty array; a seed that is not a positive integer throws.
 * @example spiralPlacement(1, 1) // => Float64Array [7.0710678118654755, 0] (radius 10·√0.5, angle 0)
 */
export function spiralPlacement(n: number, seed: number): Float64Array {
  if (!(Number.isInteger(seed) && seed >= 1)) throw new Error(`invalid layout seed: ${seed}`);
  const order = seed === 1 ? null : shuffledOrder(n, randomSource(seed));
  const xy = new Float64Array(2 * n);
  for (let i = 0; i < n; ++i) {
    const node = order ? order[i]! : i;
    const radius = initialRadius * Math.sqrt(0.5 + i);
    const angle = i * initialAngle;
    xy[2 * node] = radius * Math.cos(angle);
    xy[2 * node + 1] = radius * Math.sin(angle);
  }
  return xy;
}
