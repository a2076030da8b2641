import type { CompressedLists } from "../lists/compressedLists.ts";
import type { EdgeList } from "./overlapEdges.ts";

/**
 * Node ranges for counting edges in `parts` pieces (overlapEdgesPart) of about equal work: a
 * row holding c nodes gives its s-th node (0-based) c − 1 − s pairs to count, and the cuts split
 * the running total of those pairs, node by node, into equal shares. Returns parts + 1
 * ascending bounds from 0 to `nodes` (a range may be empty). Also the total, to decide whether
 * splitting pays. O(m + nodes) for m memberships.
 * @example edgeCuts({ offsets: Uint32Array.of(0, 3), items: Uint32Array.of(0, 1, 2) }, 3, 2).bounds // => [0, 1, 3]
 */
export function edgeCuts(rowNodes: CompressedLists, nodes: number, parts: number): { readonly bounds: number[]; readonly pairs: number } {
  if (!(Number.isInteger(parts) && parts >= 1)) throw new Error(`invalid part count: ${parts}`);
  const { offsets, items } = rowNodes;
  const work = new Float64Array(nodes);
  for (let i = 0; i + 1 < offsets.length; ++i) {
    const end = offsets[i + 1]!;
    for (let s = offsets[i]!; s < end; ++s) work[items[s]!]! += end - 1 - s;
  }
  let pairs = 0;
  for (let a = 0; a < nodes; ++a) pairs += work[a]!;
  const bounds = [0];
  let done = 0;
  for (let a = 0; a < nodes && bounds.length < parts; ++a) {
    done += work[a]!;
    // close the current range after node a once it holds its share of the pairs
    while (bounds.length < parts && done >= (pairs * bounds.length) / parts) bounds.push(a + 1);
  }
  while (bounds.length < parts) bounds.push(nodes);
  bounds.push(nodes);
  return { bounds, pairs };
}

/** Edge lists of consecutive node ranges, one after another: the whole range's list. O(E). */
export function joinEdgeLists(lists: readonly EdgeList[]): EdgeList {
  if (lists.length === 1) return lists[0]!;
  const total = lists.reduce((sum, list) => sum + list.source.length, 0);
  const source = new Uint32Array(total);
  const target = new Uint32Array(total);
  const shared = new Uint32Array(total);
  let at = 0;
  for (const list of lists) {
    source.set(list.source, at);
    target.set(list.target, at);
    shared.set(list.shared, at);
    at += list.source.length;
  }
  return { source, target, shared };
}
