import type { CompressedLists } from "../lists/compressedLists.ts";

/**
 * Per node, the share of its member rows that are in a set of rows (a region):
 *   share_k = |members_k ∩ rows| / |members_k|
 * Degenerate input: a node with no members gets NaN; rows ≥ `rowsRead` are ignored.
 * O(rowsRead) memory (one byte a row) and O(members + |rows|) time.
 * @example nodeRowShare({ offsets: Uint32Array.of(0, 2, 5), items: Uint32Array.of(0, 1, 1, 2, 3) }, Uint32Array.of(1, 2), 4) // => Float64Array [0.5, 0.6666666666666666]
 */
export function nodeRowShare(members: CompressedLists, rows: ArrayLike<number>, rowsRead: number): Float64Array {
  const inside = new Uint8Array(rowsRead);
  for (let k = 0; k < rows.length; ++k) if (rows[k]! < rowsRead) inside[rows[k]!] = 1;
  const nodes = members.offsets.length - 1;
  const out = new Float64Array(nodes);
  for (let k = 0; k < nodes; ++k) {
    const start = members.offsets[k]!;
    const end = members.offsets[k + 1]!;
    let count = 0;
    for (let t = start; t < end; ++t) count += inside[members.items[t]!]!;
    out[k] = end > start ? count / (end - start) : NaN;
  }
  return out;
}
