import type { CompressedLists } from "../lists/compressedLists.ts";
import { categoryCounts, majorityLevel } from "../table/categoryCounts.ts";
import type { Categories } from "../table/types.ts";

/**
 * Per node, the majority level of a categorical column among its members (ties to the level
 * seen first in the file; -1 when no member has a level). O(m + V·levels).
 */
export function nodeMajority(categories: Categories, members: CompressedLists): Int32Array {
  const nodes = members.offsets.length - 1;
  const out = new Int32Array(nodes);
  for (let k = 0; k < nodes; ++k) out[k] = majorityLevel(categoryCounts(categories, members.items.subarray(members.offsets[k]!, members.offsets[k + 1]!)));
  return out;
}

/** Per node, the share of members (with a level) whose level is `level`; NaN when none has a level. O(m). */
export function nodeLevelShare(categories: Categories, members: CompressedLists, level: number): Float64Array {
  const nodes = members.offsets.length - 1;
  const out = new Float64Array(nodes);
  for (let k = 0; k < nodes; ++k) {
    const counts = categoryCounts(categories, members.items.subarray(members.offsets[k]!, members.offsets[k + 1]!));
    let total = 0;
    for (const c of counts) total += c;
    out[k] = total === 0 ? NaN : counts[level]! / total;
  }
  return out;
}
