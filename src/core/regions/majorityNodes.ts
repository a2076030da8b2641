import { nodeRowShare } from "../cover/nodeRowShare.ts";
import type { CompressedLists } from "../lists/compressedLists.ts";

/**
 * Nodes most of whose rows lie in a region: share of rows in it (`nodeRowShare`) strictly above
 * one half, so exactly half is not most, ascending. A node with no rows (share NaN) is never one.
 * The comparison is exact: for c of s rows with 2c > s, c/s − 1/2 ≥ 1/(2s), far above the
 * rounding of c/s for any s below 2^52, and 2c = s gives exactly 0.5.
 * `rows` may be in any order; rows ≥ `rowsRead` are ignored. O(rowsRead + total members).
 * @example majorityNodes({ offsets: Uint32Array.of(0, 2, 5), items: Uint32Array.of(0, 1, 1, 2, 3) }, Uint32Array.of(2, 1), 4) // => [1]
 */
export function majorityNodes(members: CompressedLists, rows: ArrayLike<number>, rowsRead: number): number[] {
  const share = nodeRowShare(members, rows, rowsRead);
  const out: number[] = [];
  for (let k = 0; k < share.length; ++k) if (share[k]! > 0.5) out.push(k);
  return out;
}
