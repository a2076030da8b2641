import type { CompressedLists } from "./ballMembership.ts";

export interface EdgeList {
  /** 0-based node numbers with source < target, sorted by (source, target). */
  readonly source: Uint32Array;
  readonly target: Uint32Array;
  /** Number of rows the two balls share (at least 1). */
  readonly shared: Uint32Array;
}

/**
 * Edges of the nerve's 1-skeleton: nodes a < b are joined iff their balls share a row, weighted
 * by the number of shared rows. Counted from each row's list of nodes, so the cost is
 * O(Σ_rows c²) for c balls per row, never O(L²).
 */
export function overlapEdges(rowNodes: CompressedLists, nodes: number): EdgeList {
  const counts = new Map<number, number>();
  const rows = rowNodes.offsets.length - 1;
  for (let i = 0; i < rows; ++i) {
    const start = rowNodes.offsets[i]!;
    const end = rowNodes.offsets[i + 1]!;
    for (let s = start; s < end; ++s) {
      const a = rowNodes.items[s]!;
      for (let t = s + 1; t < end; ++t) {
        const key = a * nodes + rowNodes.items[t]!; // a < b since each row's nodes ascend
        counts.set(key, (counts.get(key) ?? 0) + 1);
      }
    }
  }
  const keys = Float64Array.from(counts.keys()).sort();
  const source = new Uint32Array(keys.length);
  const target = new Uint32Array(keys.length);
  const shared = new Uint32Array(keys.length);
  for (let e = 0; e < keys.length; ++e) {
    const key = keys[e]!;
    source[e] = Math.floor(key / nodes);
    target[e] = key % nodes;
    shared[e] = counts.get(key)!;
  }
  return { source, target, shared };
}
