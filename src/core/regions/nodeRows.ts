import type { CompressedLists } from "../graph/ballMembership.ts";

/**
 * The rows of a set of nodes: the union of their members, each row once, ascending. This is how
 * "keep as region" turns a selection of nodes into a region (a set of rows that survives a rebuild).
 * Nodes are 0-based; a node outside [0, node count) throws. O(total members + n log n) for the sort.
 * @example nodeRows({ offsets: Uint32Array.of(0, 2, 4), items: Uint32Array.of(0, 3, 3, 5) }, [1, 0]) // => Uint32Array [0, 3, 5]
 */
export function nodeRows(members: CompressedLists, nodes: ArrayLike<number>): Uint32Array {
  const count = members.offsets.length - 1;
  const rows = new Set<number>();
  for (let k = 0; k < nodes.length; ++k) {
    const node = nodes[k]!;
    if (!(Number.isInteger(node) && node >= 0 && node < count)) throw new Error(`node out of range: ${node} (0-based; there are ${count} nodes)`);
    for (let t = members.offsets[node]!; t < members.offsets[node + 1]!; ++t) rows.add(members.items[t]!);
  }
  return Uint32Array.from(rows).sort();
}
