import { boxBound } from "./boxBound.ts";
import { scanLeaf } from "./leafScan.ts";
import type { TreeQuery } from "./treeQuery.ts";
import { isInBall, judgeRadius, type RowIndex } from "./rowIndex.ts";

/**
 * Closed ball by the reference predicate: every row i with metric.within(values, d, centre, i, r),
 * in ascending row order. The k-d tree skips nodes whose box bound exceeds the search space's
 * threshold and leaf rows whose own value does (both proofs that the predicate rejects them,
 * see boxBound.ts, leafScan.ts, angularThreshold.ts); every remaining candidate is decided by
 * the predicate itself. Without a tree every row is a candidate.
 * Returns a view into the index's scratch buffer, valid until the next query on the index.
 * Cost: O(visited nodes · d + candidates · d + h log h) for h rows found; O(n·d) at worst.
 * @example ballRows(createRowIndex(line0to3, euclidean), 2, 1) // => Uint32Array [1, 2, 3]
 */
export function ballRows(index: RowIndex, centre: number, radius: number): Uint32Array {
  const { table, metric, space, tree, found } = index;
  const { values, columns: d, rows: n } = table;
  let count = 0;
  if (!space || !tree) {
    for (let i = 0; i < n; ++i) if (metric.within(values, d, centre, i, radius)) found[count++] = i;
    index.stats.queries++;
    index.stats.scanned += n;
    return found.subarray(0, count);
  }
  judgeRadius(index, radius);
  const q = index.centre;
  for (let k = 0; k < d; ++k) q[k] = space.points[centre * d + k]!;
  const limit = space.threshold(radius);
  const { norm } = space;
  let scanned = n;
  const query: TreeQuery = { norm, dims: d, coords: tree.coords, lo: tree.lo, hi: tree.hi, centre: q, centreBase: 0, limit };
  if (index.mode === "flat") count = scanLeaf(query, 0, n, found, 0);
  else {
    scanned = 0;
    const stack = index.stack;
    let top = 0;
    stack[top++] = 0;
    while (top > 0) {
      const node = stack[--top]!;
      if (boxBound(query, node * d) > limit) continue;
      const child = tree.firstChild[node]!;
      if (child === 0) {
        count = scanLeaf(query, tree.start[node]!, tree.end[node]!, found, count);
        scanned += tree.end[node]! - tree.start[node]!;
      } else {
        stack[top++] = child + 1;
        stack[top++] = child;
      }
    }
    if (index.mode === "probe") index.mode = scanned <= 0.75 * n ? "tree" : ++index.probes >= 8 ? "flat" : "probe";
  }
  index.stats.queries++;
  index.stats.scanned += scanned;
  let kept = 0;
  for (let t = 0; t < count; ++t) {
    const p = found[t]!;
    if (isInBall(index, centre, p, radius)) found[kept++] = tree.rowAt[p]!;
  }
  return found.subarray(0, kept).sort();
}
