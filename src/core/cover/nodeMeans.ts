import type { CompressedLists } from "../lists/compressedLists.ts";

/** Rows per block of the blocked pass: 2^15 Float64 values, 256 KiB, stay in a core's cache while every node takes its rows of the block. */
const blockRows = 1 << 15; // our choice, no source

/**
 * Mean of a column over each node's members, skipping missing values (NaN).
 * A node with no present value gets NaN. O(m) for m memberships.
 * Each node adds its values in the order of its list. When every list is ascending (as the
 * build's are), the rows are visited block by block (`blockRows`) with one cursor per node, so the
 * column is read nearly in order instead of at random (several times faster once the column
 * outgrows the cache: 10,000,000 rows); the sums, and so the means, are the same bit for bit.
 * @example nodeMeans(Float64Array.of(1, 3, NaN), { offsets: Uint32Array.of(0, 2, 3), items: Uint32Array.of(0, 1, 2) }) // => Float64Array [2, NaN]
 */
export function nodeMeans(column: Float64Array, members: CompressedLists): Float64Array {
  const nodes = members.offsets.length - 1;
  const { offsets, items } = members;
  const sums = new Float64Array(nodes);
  const counts = new Float64Array(nodes);
  if (column.length > blockRows && ascendingLists(members)) {
    const cursor = offsets.slice(0, nodes);
    for (let end = blockRows; end - blockRows < column.length; end += blockRows) {
      for (let k = 0; k < nodes; ++k) {
        let t = cursor[k]!;
        const last = offsets[k + 1]!;
        let sum = sums[k]!;
        let count = counts[k]!;
        for (; t < last && items[t]! < end; ++t) {
          const x = column[items[t]!]!;
          if (Number.isNaN(x)) continue;
          sum += x;
          count++;
        }
        cursor[k] = t;
        sums[k] = sum;
        counts[k] = count;
      }
    }
  } else {
    for (let k = 0; k < nodes; ++k) {
      for (let t = offsets[k]!; t < offsets[k + 1]!; ++t) {
        const x = column[items[t]!]!;
        if (Number.isNaN(x)) continue;
        sums[k] = sums[k]! + x;
        counts[k] = counts[k]! + 1;
      }
    }
  }
  const means = new Float64Array(nodes);
  for (let k = 0; k < nodes; ++k) means[k] = counts[k] === 0 ? NaN : sums[k]! / counts[k]!;
  return means;
}

function ascendingLists(members: CompressedLists): boolean {
  const { offsets, items } = members;
  for (let k = 0; k + 1 < offsets.length; ++k) {
    for (let t = offsets[k]! + 1; t < offsets[k + 1]!; ++t) if (items[t]! <= items[t - 1]!) return false;
  }
  return true;
}

/** Rows of node k (0-based), as a view into the membership lists. */
export function nodeMembers(members: CompressedLists, node: number): Uint32Array {
  return members.items.subarray(members.offsets[node]!, members.offsets[node + 1]!);
}
