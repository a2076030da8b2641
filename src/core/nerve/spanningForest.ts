import type { EdgeList } from "./overlapEdges.ts";

/**
 * Breadth-first spanning forest of a graph (one tree per connected component, each grown from
 * its lowest node; neighbours in edge order): isTree[e] = 1 for the V − C forest edges.
 * Every other edge closes exactly one cycle with the forest, and those fundamental cycles are a
 * basis of the cycle space over GF(2) (N. Deo, Graph Theory with Applications to Engineering and
 * Computer Science, Prentice-Hall 1974, §4.4). O(V + E).
 * @example spanningForest(3, triangle 0–1, 0–2, 1–2) // => Uint8Array [1, 1, 0]
 */
export function spanningForest(nodes: number, edges: EdgeList): Uint8Array {
  const count = edges.source.length;
  const start = new Uint32Array(nodes + 1);
  for (let e = 0; e < count; ++e) {
    start[edges.source[e]! + 1]!++;
    start[edges.target[e]! + 1]!++;
  }
  for (let k = 0; k < nodes; ++k) start[k + 1]! += start[k]!;
  const cursor = start.slice(0, nodes);
  const incident = new Uint32Array(2 * count);
  for (let e = 0; e < count; ++e) {
    incident[cursor[edges.source[e]!]!++] = e;
    incident[cursor[edges.target[e]!]!++] = e;
  }
  const isTree = new Uint8Array(count);
  const seen = new Uint8Array(nodes);
  const queue = new Uint32Array(nodes);
  for (let root = 0; root < nodes; ++root) {
    if (seen[root]) continue;
    seen[root] = 1;
    let head = 0;
    let tail = 0;
    queue[tail++] = root;
    while (head < tail) {
      const k = queue[head++]!;
      for (let t = start[k]!; t < start[k + 1]!; ++t) {
        const e = incident[t]!;
        const other = edges.source[e] === k ? edges.target[e]! : edges.source[e]!;
        if (seen[other]) continue;
        seen[other] = 1;
        isTree[e] = 1;
        queue[tail++] = other;
      }
    }
  }
  return isTree;
}
