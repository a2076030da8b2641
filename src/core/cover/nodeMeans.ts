import type { CompressedLists } from "../lists/compressedLists.ts";

/**
 * Mean of a column over each node's members, skipping missing values (NaN).
 * A node with no present value gets NaN. O(m) for m memberships.
 * @example nodeMeans(Float64Array.of(1, 3, NaN), { offsets: Uint32Array.of(0, 2, 3), items: Uint32Array.of(0, 1, 2) }) // => Float64Array [2, NaN]
 */
export function nodeMeans(column: Float64Array, members: CompressedLists): Float64Array {
  const nodes = members.offsets.length - 1;
  const means = new Float64Array(nodes);
  for (let k = 0; k < nodes; ++k) {
    let sum = 0;
    let count = 0;
    for (let t = members.offsets[k]!; t < members.offsets[k + 1]!; ++t) {
      const x = column[members.items[t]!]!;
      if (Number.isNaN(x)) continue;
      sum += x;
      count++;
    }
    means[k] = count === 0 ? NaN : sum / count;
  }
  return means;
}

/** Rows of node k (0-based), as a view into the membership lists. */
export function nodeMembers(members: CompressedLists, node: number): Uint32Array {
  return members.items.subarray(members.offsets[node]!, members.offsets[node + 1]!);
}
