import { checkStop, type RunControl } from "../control.ts";
import type { CompressedLists } from "../lists/compressedLists.ts";
import { appendList, createListBuilder, finishLists } from "../lists/listBuilder.ts";
import type { Metric } from "../metric/types.ts";
import type { NumericTable } from "../table/types.ts";
import { ballRows } from "./ballRows.ts";
import { blockMembership } from "./blockMembership.ts";
import { maybeRowIndex, type RowIndex } from "./rowIndex.ts";

/** Progress is the share of landmarks done, reported every 64 landmarks. */
export interface BallMembershipOptions extends RunControl {
  /** A candidate index built for this table and metric (createRowIndex), reused across calls. */
  readonly index?: RowIndex;
}

/**
 * Closed balls around landmarks: row i is a member of node k iff d(landmark_k, i) ≤ r
 * (reference predicate). Members of each node are listed in ascending row order.
 * O(n·L) distance tests at worst; a candidate index (search/blockMembership.ts, reusable through
 * `options.index`) skips rows it proves the predicate rejects.
 * @example ballMembership(line0to3, euclidean, 1, Uint32Array.of(0, 2)) // => offsets [0, 2, 5], items [0, 1, 1, 2, 3]
 */
export function ballMembership(
  table: NumericTable,
  metric: Metric,
  radius: number,
  landmarks: Uint32Array,
  options: BallMembershipOptions = {},
): CompressedLists {
  const { onProgress } = options;
  const builder = createListBuilder(table.rows);
  if (landmarks.length === 0) return finishLists(builder);
  const index = maybeRowIndex(table, metric, options.index);
  if (index.tree) return blockMembership(index, radius, landmarks, options);
  for (let k = 0; k < landmarks.length; ++k) {
    appendList(builder, ballRows(index, landmarks[k]!, radius));
    if ((k & 63) === 63) {
      checkStop(options, "the balls");
      onProgress?.((k + 1) / landmarks.length);
    }
  }
  return finishLists(builder);
}

