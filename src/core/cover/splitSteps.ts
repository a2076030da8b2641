import { partOf, type RunControl } from "../control.ts";
import type { CompressedLists } from "../lists/compressedLists.ts";
import { closeLists, reserveLists, type ListBuilder } from "../lists/listBuilder.ts";
import { edgeCuts, joinEdgeLists } from "../nerve/edgeParts.ts";
import { denseLimit, overlapEdges, overlapEdgesPart, type EdgeList } from "../nerve/overlapEdges.ts";
import { blockMembershipInto } from "../search/blockMembership.ts";
import { indexFromParts, indexParts, type ShareArray } from "../search/indexParts.ts";
import type { RowIndex } from "../search/rowIndex.ts";
import type { CoverTask, PartOutput, PartRange } from "./coverParts.ts";

/** A step's parts for other threads: the task, their ranges, and the part the build's own thread runs meanwhile. */
export interface PartRequest {
  readonly task: CoverTask;
  readonly remote: readonly PartRange[];
  readonly local: () => void;
}

/** How the split steps split: parts, the least work worth it, and where arrays are shared. */
export interface Split {
  readonly parts: number;
  readonly minWork: number;
  readonly share: ShareArray | null;
}

/** True for a SharedArrayBuffer (which is no ArrayBuffer). */
export function isShared(buffer: ArrayBufferLike): boolean {
  return typeof SharedArrayBuffer !== "undefined" && buffer instanceof SharedArrayBuffer;
}

/**
 * The balls of `landmarks` appended to `into`, in parts of whole 64-landmark groups when the work
 * is worth it: this thread appends the first part's lists as it finds them, then the others'
 * outputs in order. Splitting shares the index once (indexParts) and searches the shared copy
 * here too, which it returns, so that the unshared table can go. Landmarks are in tree order.
 */
export function* ballsInParts(into: ListBuilder, index: RowIndex, radius: number, landmarks: Uint32Array, control: RunControl, split: Split): Generator<PartRequest, RowIndex, PartOutput[]> {
  const groups = Math.ceil(landmarks.length / 64);
  const parts = landmarks.length * index.table.rows >= split.minWork ? Math.min(split.parts, groups) : 1;
  if (parts <= 1) {
    blockMembershipInto(into, index, radius, landmarks, control);
    return index;
  }
  const shared = indexParts(index, radius, split.share ?? ((array) => array));
  const searched = split.share ? indexFromParts(shared) : index;
  const per = Math.ceil(groups / parts) * 64;
  const bounds = Array.from({ length: parts + 1 }, (_, k) => Math.min(k * per, landmarks.length));
  const remote = bounds.slice(1, -1).map((from, k) => ({ from, to: bounds[k + 2]! }));
  const outputs = yield {
    task: { kind: "balls", index: shared, landmarks },
    remote,
    local: () => blockMembershipInto(into, searched, radius, landmarks.subarray(0, bounds[1]), partOf(control, 0, bounds[1]! / landmarks.length)),
  };
  for (const output of outputs as CompressedLists[]) {
    reserveLists(into, output.items.length).set(output.items);
    closeLists(into, output.offsets.subarray(1));
  }
  return searched;
}

/**
 * overlapEdges in parts of about equal pair counts (edgeCuts) when there are enough pairs: this
 * thread counts the first range while the others count theirs; the lists join in range order.
 */
export function* countEdges(rowNodes: CompressedLists, nodes: number, members: CompressedLists, split: Split): Generator<PartRequest, EdgeList, PartOutput[]> {
  if (split.parts <= 1) return overlapEdges(rowNodes, nodes, members);
  const { bounds, pairs } = edgeCuts(rowNodes, nodes, split.parts);
  if (pairs < split.minWork) return overlapEdges(rowNodes, nodes, members);
  const remote = bounds.slice(1, -1).map((from, k) => ({ from, to: bounds[k + 2]! }));
  let mine: EdgeList | null = null;
  const outputs = yield {
    task: { kind: "edges", rowNodes, nodes, members: nodes > denseLimit ? members : null },
    remote,
    local: () => (mine = overlapEdgesPart(rowNodes, nodes, 0, bounds[1]!, members)),
  };
  return joinEdgeLists([mine!, ...(outputs as EdgeList[])]);
}
