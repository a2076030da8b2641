import type { CoverGraph } from "../cover/coverGraph.ts";
import { components } from "../nerve/components.ts";
import { overlapEdges } from "../nerve/overlapEdges.ts";
import type { RunControl } from "../control.ts";
import { nerveLoops, type LoopCounts } from "../nerve/nerveLoops.ts";
import type { Balls } from "../landmark/netWithBalls.ts";
import type { PreparedRows } from "../search/prepareRows.ts";

/** The graph of one sweep radius: the same graph fields as a single build (CoverGraph). */
export interface SweepCover extends CoverGraph {
  readonly radius: number;
  /** b0 and b1 of the nerve's 2-skeleton (b0 = componentCount). */
  readonly betti: LoopCounts;
}

/**
 * Finishes a cover from its landmarks and balls (rows of the prepared table): overlap edges,
 * components and the nerve's b0 and b1 by the same graph functions as buildCover (b1 by
 * nerveLoops, equal to nerveBetti's), rows mapped back to parsed-table rows.
 * O(m + Σ_rows c²) for m memberships and c balls per row.
 */
export function coverFromBalls(prepared: PreparedRows, radius: number, balls: Balls, control: RunControl = {}): SweepCover {
  const { landmarks, members, rowNodes } = balls;
  const nodes = landmarks.length;
  const edges = overlapEdges(rowNodes, nodes);
  const { component, count } = components(nodes, edges.source, edges.target);
  const betti = nerveLoops(rowNodes, nodes, edges, count, control);
  const toParsedRow = (i: number): number => prepared.usedRows[i]!;
  return {
    radius,
    landmarks: landmarks.map(toParsedRow),
    members: { offsets: members.offsets, items: members.items.map(toParsedRow) },
    edges,
    component,
    componentCount: count,
    cycleRank: edges.source.length - nodes + count,
    betti,
  };
}
