import { ballRows } from "../search/ballRows.ts";
import type { RowIndex } from "../search/rowIndex.ts";
import { checkStop, type RunControl } from "../control.ts";

/**
 * Number of landmarks of the greedy ε-net in file order (greedyNet's rule: a row becomes a
 * landmark when no earlier landmark is within r by the reference predicate; each landmark's
 * ball, from the index, marks the rows it covers), counting only up to `cap`: returns cap + 1 as
 * soon as there would be more. At most cap + 1 ball queries, so a probe never costs more than
 * its budget. Source: S. Har-Peled, Geometric Approximation Algorithms, AMS 2011, §4.2.
 * @example cappedGreedyCount(createRowIndex(line 0, 1, 2, 3, euclidean), 1, 1) // => 2 (landmarks 0 and 2 already exceed the cap)
 */
export function cappedGreedyCount(index: RowIndex, radius: number, cap: number, control: RunControl = {}): number {
  const n = index.table.rows;
  const covered = new Uint8Array(n);
  let count = 0;
  for (let i = 0; i < n; ++i) {
    if ((i & 1023) === 0) checkStop(control, "the sweep");
    if (covered[i]) continue;
    if (count === cap) return cap + 1;
    count++;
    const ball = ballRows(index, i, radius);
    for (let t = 0; t < ball.length; ++t) covered[ball[t]!] = 1;
  }
  return count;
}
