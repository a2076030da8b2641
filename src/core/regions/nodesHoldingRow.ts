import { nodeMembers } from "../cover/nodeMeans.ts";
import type { CompressedLists } from "../lists/compressedLists.ts";

/**
 * Nodes whose balls hold `row` (a parsed-table row), ascending ("find a row"). O(total members).
 * @example nodesHoldingRow({ offsets: Uint32Array.of(0, 2, 4), items: Uint32Array.of(0, 3, 3, 5) }, 3) // => [0, 1]
 */
export function nodesHoldingRow(members: CompressedLists, row: number): number[] {
  const out: number[] = [];
  for (let k = 0; k + 1 < members.offsets.length; ++k) if (nodeMembers(members, k).includes(row)) out.push(k);
  return out;
}
