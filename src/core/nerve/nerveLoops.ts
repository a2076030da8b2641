import type { CompressedLists } from "../lists/compressedLists.ts";
import type { EdgeList } from "./overlapEdges.ts";
import { checkStop, type RunControl } from "../control.ts";
import { forEachFanTriangle } from "./fanTriangles.ts";
import { peeledRank } from "./peeledRank.ts";
import { spanningForest } from "./spanningForest.ts";

/** b0 and b1 over GF(2) of the 2-skeleton of the sampled nerve. */
export interface LoopCounts {
  readonly b0: number;
  readonly b1: number;
}

/**
 * b0 and b1 over GF(2) of the sampled nerve's 2-skeleton, equal to nerveBetti's, computed faster:
 *   b1 = dim Z1 − rank ∂2,  dim Z1 = E − V + b0.
 * Z1 has the fundamental cycles of a spanning forest as a basis, and a cycle's coordinates in it
 * are its non-forest edges, so rank ∂2 is the rank of the triangles' non-forest edge sets (at
 * most three each), and the fan triangles (fanTriangles.ts) span the same space as all of them.
 * That rank is found by peeling, then lowest-pivot reduction (peeledRank.ts). Source for the
 * homology: H. Edelsbrunner and J. Harer, Computational Topology, AMS 2010, §IV.1–2.
 * Cost: O(Σ_rows c²) for c balls per row, plus O(E log E) for the edge look-ups and the
 * (usually tiny) reduction left after peeling.
 * @example nerveLoops(rows in balls {0, 1}, {1, 2}, {0, 2}, 3, edges of the triangle, 1) // => { b0: 1, b1: 1 } (no row in all three balls)
 */
export function nerveLoops(rowNodes: CompressedLists, nodes: number, edges: EdgeList, b0: number, control: RunControl = {}): LoopCounts {
  const edgeCount = edges.source.length;
  const first = new Uint32Array(nodes + 1);
  for (let e = 0; e < edgeCount; ++e) first[edges.source[e]! + 1]!++;
  for (let k = 0; k < nodes; ++k) first[k + 1]! += first[k]!;
  const edgeOf = (a: number, b: number): number => {
    let lo = first[a]!;
    let hi = first[a + 1]!;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if (edges.target[mid]! < b) lo = mid + 1;
      else hi = mid;
    }
    if (lo === first[a + 1]! || edges.target[lo] !== b) throw new Error(`triangle side without an edge: ${a + 1}-${b + 1}`);
    return lo;
  };
  const isTree = spanningForest(nodes, edges);
  let columns = new Int32Array(3 * 1024); // three slots per triangle, −1 for a forest edge
  let used = 0;
  forEachFanTriangle(rowNodes, (a, b, c) => {
    if (3 * used + 3 > columns.length) {
      const grown = new Int32Array(2 * columns.length);
      grown.set(columns);
      columns = grown;
    }
    const ab = edgeOf(a, b);
    const ac = edgeOf(a, c);
    const bc = edgeOf(b, c);
    columns[3 * used] = isTree[ab] ? -1 : ab;
    columns[3 * used + 1] = isTree[ac] ? -1 : ac;
    columns[3 * used + 2] = isTree[bc] ? -1 : bc;
    used++;
  }, () => checkStop(control, "the sweep"));
  return { b0, b1: edgeCount - nodes + b0 - peeledRank(columns.subarray(0, 3 * used), edgeCount) };
}
