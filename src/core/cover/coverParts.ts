import type { RunControl } from "../control.ts";
import type { CompressedLists } from "../lists/compressedLists.ts";
import { createListBuilder, finishLists } from "../lists/listBuilder.ts";
import { overlapEdgesPart, type EdgeList } from "../nerve/overlapEdges.ts";
import { blockMembershipInto } from "../search/blockMembership.ts";
import { indexFromParts, type IndexParts } from "../search/indexParts.ts";

/**
 * The steps of a build that split into independent parts, as data another thread can be sent:
 * - "balls": the balls of landmarks[from..to) (blockMembership), node → rows in tree order;
 * - "edges": the edges whose lower node lies in [from, to) (overlapEdgesPart).
 * Both take every array read-only, so parts can run at once on one shared copy.
 */
export type CoverTask =
  | { readonly kind: "balls"; readonly index: IndexParts; readonly landmarks: Uint32Array }
  | { readonly kind: "edges"; readonly rowNodes: CompressedLists; readonly nodes: number; readonly members: CompressedLists | null };

/** A half-open range [from, to) of a task's landmarks or nodes. */
export interface PartRange {
  readonly from: number;
  readonly to: number;
}

/** A part's result: lists for "balls" (CompressedLists), an edge list for "edges". */
export type PartOutput = CompressedLists | EdgeList;

/** What a helper thread is sent, and what it answers (an error as its message). */
export interface PartMessage {
  readonly id: number;
  readonly task: CoverTask;
  readonly range: PartRange;
}
export type PartAnswer = { readonly id: number; readonly output: PartOutput } | { readonly id: number; readonly error: string };

/**
 * Runs one part of a task in this thread: the kernel every thread runs, so that one thread, or
 * many, give the same lists (the parts of a split, concatenated in order, are the whole; tested).
 * Memory: a "balls" part builds its own index scratch (n row numbers) and its lists unpacked.
 * @example runCoverPart({ kind: "edges", rowNodes, nodes: 3, members: null }, { from: 0, to: 3 }) // => overlapEdges(rowNodes, 3)
 */
export function runCoverPart(task: CoverTask, range: PartRange, control: RunControl = {}): PartOutput {
  const { from, to } = range;
  if (task.kind === "edges") return overlapEdgesPart(task.rowNodes, task.nodes, from, to, task.members ?? undefined);
  const index = indexFromParts(task.index);
  const builder = createListBuilder(index.table.rows);
  blockMembershipInto(builder, index, task.index.radius, task.landmarks.subarray(from, to), control);
  return finishLists(builder);
}

/** A helper thread's answer to a message; a failure becomes its message, for the caller to throw. */
export function answerPart(message: PartMessage): PartAnswer {
  try {
    return { id: message.id, output: runCoverPart(message.task, message.range) };
  } catch (error) {
    return { id: message.id, error: error instanceof Error ? error.message : String(error) };
  }
}

/** The buffers of an answer that can be moved rather than copied back (shared ones are neither). */
export function answerTransferables(answer: PartAnswer): ArrayBuffer[] {
  if (!("output" in answer)) return [];
  const buffers = Object.values(answer.output).map((array: Uint32Array) => array.buffer);
  return [...new Set(buffers.filter((buffer): buffer is ArrayBuffer => buffer instanceof ArrayBuffer))];
}
