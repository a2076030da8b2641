import { rowsToNodes, type CompressedLists } from "../lists/compressedLists.ts";

export interface EdgeList {
  /** 0-based node numbers with source < target, sorted by (source, target). */
  readonly source: Uint32Array;
  readonly target: Uint32Array;
  /** Number of rows the two balls share (at least 1). */
  readonly shared: Uint32Array;
}

export const denseLimit = 2048; // up to this many nodes, counts go to an L × L matrix (≤ 16 MB)

/**
 * Edges of the nerve's 1-skeleton: nodes a < b are joined iff their balls share a row, weighted
 * by the number of shared rows, counted from each row's ascending list of nodes: every pair
 * a < b on a row adds one. Up to 2,048 nodes the counts go to a dense L × L matrix read in
 * (a, b) order; beyond, node by node with one counter per b (using `members`, node → rows, the
 * transpose of `rowNodes`), the touched b sorted. Either way the edges come out sorted by (a, b).
 * Cost: O(Σ_rows c²) for c balls per row, plus O(L²) (dense) or O(E log E) (sparse).
 * @example overlapEdges(rowsToNodes({ offsets: Uint32Array.of(0, 2, 4), items: Uint32Array.of(0, 1, 1, 2) }, 3), 2) // => source [0], target [1], shared [1]
 */
export function overlapEdges(rowNodes: CompressedLists, nodes: number, members?: CompressedLists): EdgeList {
  return overlapEdgesPart(rowNodes, nodes, 0, nodes, members);
}

/**
 * The edges of overlapEdges whose lower node a lies in [from, to), in the same order: the edges of
 * the parts of a split of 0..nodes, concatenated in order, are overlapEdges' edges (the test
 * "range split = whole" checks it), so parts can be counted on other threads. A dense part keeps
 * a (to − from) × L matrix. Cost: the rows' pairs whose lower node is in the range, plus the
 * rows' lists scanned once (dense) or the range's members (sparse).
 */
export function overlapEdgesPart(rowNodes: CompressedLists, nodes: number, from: number, to: number, members?: CompressedLists): EdgeList {
  if (!(0 <= from && from <= to && to <= nodes)) throw new Error(`invalid node range: ${from}..${to} of ${nodes}`);
  if (nodes <= denseLimit) return denseEdges(rowNodes, nodes, from, to);
  return sparseEdges(rowNodes, nodes, members ?? rowsToNodes(rowNodes, nodes), from, to);
}

function denseEdges(rowNodes: CompressedLists, nodes: number, from: number, to: number): EdgeList {
  const counts = new Uint32Array((to - from) * nodes);
  const { offsets, items } = rowNodes;
  const rows = offsets.length - 1;
  let edges = 0;
  for (let i = 0; i < rows; ++i) {
    const end = offsets[i + 1]!;
    for (let s = offsets[i]!; s < end; ++s) {
      const a = items[s]!;
      if (a < from) continue;
      if (a >= to) break;
      const base = (a - from) * nodes;
      for (let t = s + 1; t < end; ++t) if (counts[base + items[t]!]!++ === 0) edges++;
    }
  }
  const source = new Uint32Array(edges);
  const target = new Uint32Array(edges);
  const shared = new Uint32Array(edges);
  let e = 0;
  for (let a = from; a < to; ++a) {
    for (let b = a + 1; b < nodes; ++b) {
      const count = counts[(a - from) * nodes + b]!;
      if (count === 0) continue;
      source[e] = a;
      target[e] = b;
      shared[e++] = count;
    }
  }
  return { source, target, shared };
}

function sparseEdges(rowNodes: CompressedLists, nodes: number, members: CompressedLists, from: number, to: number): EdgeList {
  const counts = new Uint32Array(nodes);
  const touched = new Uint32Array(nodes);
  const source: number[] = [];
  const target: number[] = [];
  const shared: number[] = [];
  const { offsets, items } = rowNodes;
  for (let a = from; a < to; ++a) {
    let m = 0;
    for (let t = members.offsets[a]!; t < members.offsets[a + 1]!; ++t) {
      const i = members.items[t]!;
      const end = offsets[i + 1]!;
      for (let s = firstAbove(items, offsets[i]!, end, a); s < end; ++s) {
        const b = items[s]!;
        if (counts[b]!++ === 0) touched[m++] = b;
      }
    }
    const row = touched.subarray(0, m).sort();
    for (let e = 0; e < m; ++e) {
      const b = row[e]!;
      source.push(a);
      target.push(b);
      shared.push(counts[b]!);
      counts[b] = 0;
    }
  }
  return { source: Uint32Array.from(source), target: Uint32Array.from(target), shared: Uint32Array.from(shared) };
}

/** First position in the ascending items[from..to) holding a value greater than `value` (binary search). */
function firstAbove(items: Uint32Array, from: number, to: number, value: number): number {
  let lo = from;
  let hi = to;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (items[mid]! <= value) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}
