import type { LandmarkRule } from "../params.ts";
import { randomSource, shuffledOrder } from "../random.ts";

/**
 * The order in which a landmark rule visits the n rows, the one place a seed becomes an order:
 * "greedy-file-order" visits 0, 1, …, n − 1; "greedy-shuffled" the Fisher–Yates shuffle of that
 * order by the seeded generator (random.ts); "maximin" starts at row floor(u · n) for the seed's
 * first draw u and then lists the other rows in file order (a maximin net reads only its start).
 * Returns a new array the caller owns. O(n). Empty for n = 0.
 * @example visitOrder("greedy-file-order", 1, 3) // => Uint32Array [0, 1, 2]
 */
export function visitOrder(rule: LandmarkRule, seed: number, n: number): Uint32Array {
  if (rule === "greedy-shuffled") return shuffledOrder(n, randomSource(seed));
  const order = Uint32Array.from({ length: n }, (_, i) => i);
  if (rule === "maximin" && n > 0) {
    const start = Math.floor(randomSource(seed)() * n);
    order.copyWithin(1, 0, start);
    order[0] = start;
  }
  return order;
}
