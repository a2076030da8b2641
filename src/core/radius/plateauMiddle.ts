import { plateaus, type Plateau } from "./plateaus.ts";

export const plateauFewestNodes = 5; // "at least five nodes" (issue 6)
export const plateauLargestShare = 0.5; // "no single node holds more than half the rows" (issue 6)

export const plateauMiddleRule =
  "the plateau middle is the radius in the middle of the widest stretch of swept radii over which the number of separate pieces (b0) and of loops (b1) stay the same. " +
  "Only radii where the graph has at least 5 nodes and no node holds more than half the rows count. " +
  "Widths are compared on a log scale, and on a tie the stretch of smaller radii wins"; // no final period: the readers add one

export interface PlateauMiddle {
  readonly radius: number;
  /** Index of the radius in the sweep (ascending). */
  readonly index: number;
  /** The eligible run it comes from. */
  readonly plateau: Plateau;
}

/**
 * Plateau middle (rule in `plateauMiddleRule`): among radii with nodes ≥ 5 and largest
 * node share ≤ 1/2, the plateaus of unchanged (b0, b1); the widest in log-radius wins (ties to
 * the lower one); its radius nearest the run's middle in log r (ties to the smaller). Null when
 * no radius qualifies. O(K).
 * @example plateauMiddle([1, 2, 4, 8], nodes [40, 20, 9, 4], shares [0.1, 0.2, 0.3, 0.6], b0 [1, 1, 1, 1], b1 [1, 1, 1, 0]) // => { radius: 2, index: 1 } (eligible run 0..2)
 */
export function plateauMiddle(
  radii: ArrayLike<number>,
  figures: { readonly nodes: ArrayLike<number>; readonly largestNodeShare: ArrayLike<number>; readonly b0: ArrayLike<number>; readonly b1: ArrayLike<number> },
): PlateauMiddle | null {
  const eligible = (k: number): boolean => figures.nodes[k]! >= plateauFewestNodes && figures.largestNodeShare[k]! <= plateauLargestShare;
  let best: Plateau | null = null;
  for (const run of plateaus(radii, figures.b0, figures.b1, eligible)) if (!best || run.logWidth > best.logWidth) best = run;
  if (!best) return null;
  const lower = best.first > 0 ? Math.sqrt(radii[best.first - 1]! * radii[best.first]!) : radii[best.first]!;
  const middle = Math.log(lower) + best.logWidth / 2;
  let index = best.first;
  for (let k = best.first + 1; k <= best.last; ++k) if (Math.abs(Math.log(radii[k]!) - middle) < Math.abs(Math.log(radii[index]!) - middle)) index = k;
  return { radius: radii[index]!, index, plateau: best };
}
