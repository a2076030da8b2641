import { checkStop, type RunControl } from "../control.ts";
import { addLevel, insertLandmark, searchLevel, type NetTree } from "./netTree.ts";

// A new level hangs under the finest level at least this many times its radius (cover trees use a
// fixed base, often 2: Beygelzimer, Kakade and Langford, ICML 2006). 3 needed the fewest distance
// evaluations per row on the bench tables (1.5, 2, 3, 4 and 8 tried).
export const parentSpacing = 3;

/**
 * Fast variant of greedyBalls (the one greedy loop) for the default range under a true metric,
 * held equal to it on tables of a few thousand rows by test/core/landmark/fastVariants.test.ts.
 * Greedy ε-net in `order` as a new level of the net tree: a row becomes a landmark when no
 * landmark chosen so far lies within r by the reference predicate (a first-hit search through
 * the tree), so the net is greedyBalls', landmark for landmark. The level hangs under the finest
 * level with radius ≥ 3r (else the coarsest). Stops and removes the level once it would hold
 * more than `cap` landmarks (then returns −1); else returns the level's index.
 * About O(n·s·d) for s candidates per search, against O(n·L·d) for a plain scan.
 * @example treeNet(createNetTree(line 0, 1, 2, 3, euclidean), 1, Uint32Array.of(0, 1, 2, 3)) // => level 0 with landmarks [0, 2]
 */
export function treeNet(tree: NetTree, radius: number, order: ArrayLike<number>, control: RunControl = {}, cap = Infinity): number {
  let finest = -1;
  let coarsest = -1;
  tree.levels.forEach((level, j) => {
    if (level.radius >= parentSpacing * radius && (finest < 0 || level.radius < tree.levels[finest]!.radius)) finest = j;
    if (coarsest < 0 || level.radius > tree.levels[coarsest]!.radius) coarsest = j;
  });
  const m = addLevel(tree, radius, finest >= 0 ? finest : coarsest);
  const level = tree.levels[m]!;
  for (let k = 0; k < order.length; ++k) {
    if ((k & 1023) === 0) checkStop(control, "the sweep");
    const x = order[k]!;
    if (searchLevel(tree, x, m, radius, true) > 0) continue;
    if (level.rows.length >= cap) {
      tree.levels.pop();
      return -1;
    }
    insertLandmark(tree, m, x);
  }
  return m;
}
