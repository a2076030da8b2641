import type { CompressedLists } from "../lists/compressedLists.ts";
import type { EdgeList } from "../nerve/overlapEdges.ts";

export interface RegionMatch {
  /** Matched nodes (0-based) in the order they were added; empty when no ball holds a selected row. */
  readonly nodes: Uint32Array;
  /** Jaccard index |R ∩ S| / |R ∪ S| of the region's rows R and the selected rows S. */
  readonly jaccard: number;
  /** The region's rows R, ascending. */
  readonly rows: Uint32Array;
}

/**
 * Best-matching connected node set for a selection, greedily: start at the node whose ball holds
 * the most selected rows (ties to the lowest node); then, among the nodes joined by an edge to
 * the region, add the one that raises the Jaccard index J = |R ∩ S| / |R ∪ S| of rows the most
 * (ties to the lowest node), for as long as J strictly rises. Rows and nodes share one numbering:
 * `members` (node → rows), `rowNodes` (row → nodes) and the mask `selected` (row → 0/1).
 * Jaccard index: P. Jaccard, Bull. Soc. Vaudoise Sci. Nat. 37:547–579, 1901.
 * Cost: O(m + E + k·V) for m memberships and k nodes added: each row's entry into the region
 * updates the gains of its nodes once, and each step scans the nodes for the region's border.
 * @example matchRegion(path 0–1–2 with balls {0, 1}, {1, 2}, {2, 3}, rowNodes, edges, selected rows {0, 1, 2}) // => nodes [0, 1], jaccard 1
 */
export function matchRegion(members: CompressedLists, rowNodes: CompressedLists, edges: EdgeList, selected: Uint8Array): RegionMatch {
  const nodes = members.offsets.length - 1;
  const rows = rowNodes.offsets.length - 1;
  let selectedCount = 0;
  for (let i = 0; i < rows; ++i) selectedCount += selected[i]!;
  if (selectedCount === 0) throw new Error("region matching needs at least one selected row in the build");
  const fresh = new Float64Array(nodes); // rows of the ball not yet in the region
  const freshSelected = new Float64Array(nodes); // … of which selected
  let start = -1;
  for (let k = 0; k < nodes; ++k) {
    fresh[k] = members.offsets[k + 1]! - members.offsets[k]!;
    for (let t = members.offsets[k]!; t < members.offsets[k + 1]!; ++t) freshSelected[k]! += selected[members.items[t]!]!;
    if (freshSelected[k]! > 0 && (start < 0 || freshSelected[k]! > freshSelected[start]!)) start = k;
  }
  const inRegion = new Uint8Array(rows);
  const state = { size: 0, shared: 0 };
  const added: number[] = [];
  const border = new Uint8Array(nodes); // 1: on the border, 2: in the region
  const neighbours = adjacency(nodes, edges);
  const add = (k: number): void => {
    added.push(k);
    border[k] = 2;
    for (let t = members.offsets[k]!; t < members.offsets[k + 1]!; ++t) {
      const i = members.items[t]!;
      if (inRegion[i]) continue;
      inRegion[i] = 1;
      state.size++;
      state.shared += selected[i]!;
      for (let s = rowNodes.offsets[i]!; s < rowNodes.offsets[i + 1]!; ++s) {
        fresh[rowNodes.items[s]!]!--;
        freshSelected[rowNodes.items[s]!]! -= selected[i]!;
      }
    }
    for (let t = neighbours.offsets[k]!; t < neighbours.offsets[k + 1]!; ++t) if (border[neighbours.items[t]!] === 0) border[neighbours.items[t]!] = 1;
  };
  const jaccard = (size: number, shared: number): number => shared / (size + selectedCount - shared);
  if (start >= 0) add(start);
  for (;;) {
    let best = -1;
    let bestJaccard = jaccard(state.size, state.shared);
    for (let k = 0; k < nodes; ++k) {
      if (border[k] !== 1) continue;
      const candidate = jaccard(state.size + fresh[k]!, state.shared + freshSelected[k]!);
      if (!(candidate > bestJaccard)) continue;
      best = k;
      bestJaccard = candidate;
    }
    if (best < 0) break;
    add(best);
  }
  const regionRows: number[] = [];
  for (let i = 0; i < rows; ++i) if (inRegion[i]) regionRows.push(i);
  return { nodes: Uint32Array.from(added), jaccard: jaccard(state.size, state.shared), rows: Uint32Array.from(regionRows) };
}

/** Neighbours of each node as compressed lists, from an edge list. O(V + E). */
function adjacency(nodes: number, edges: EdgeList): CompressedLists {
  const offsets = new Uint32Array(nodes + 1);
  for (let e = 0; e < edges.source.length; ++e) {
    offsets[edges.source[e]! + 1]!++;
    offsets[edges.target[e]! + 1]!++;
  }
  for (let k = 0; k < nodes; ++k) offsets[k + 1]! += offsets[k]!;
  const cursor = offsets.slice(0, nodes);
  const items = new Uint32Array(2 * edges.source.length);
  for (let e = 0; e < edges.source.length; ++e) {
    items[cursor[edges.source[e]!]!++] = edges.target[e]!;
    items[cursor[edges.target[e]!]!++] = edges.source[e]!;
  }
  return { offsets, items };
}
