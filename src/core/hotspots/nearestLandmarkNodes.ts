import type { CoverGeometry } from "./coverGeometry.ts";

/**
 * Nearest-landmark assignment: each row goes to the node whose landmark is nearest under the
 * build's metric, ties to the lower node number, so that counts add over nodes. Only the nodes
 * whose balls hold the row are searched: the nearest landmark is always among them, since the
 * landmarks form an r-net and every row lies within r of some landmark. O(m·d) for m memberships
 * and d columns. A row held by no ball (impossible in a build) gets node 0xffffffff.
 * @example nearestLandmarkNodes(geometry of rows 0, 1, 3 on a line, landmarks rows 0 and 3, r = 2) // => Uint32Array [0, 0, 1]
 */
export function nearestLandmarkNodes({ table, metric, landmarkPositions, rowNodes }: CoverGeometry): Uint32Array {
  const n = table.rows;
  const d = table.columns;
  const values = table.values;
  const nodeOf = new Uint32Array(n).fill(0xffffffff);
  for (let p = 0; p < n; ++p) {
    let best = Infinity;
    for (let t = rowNodes.offsets[p]!; t < rowNodes.offsets[p + 1]!; ++t) {
      const node = rowNodes.items[t]!;
      const distance = metric.distance(values, d, p, landmarkPositions[node]!);
      // nodes ascend, so a strict < keeps the lower node on a tie
      if (distance < best) {
        best = distance;
        nodeOf[p] = node;
      }
    }
  }
  return nodeOf;
}
