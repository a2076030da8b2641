import type { CompressedLists } from "../lists/compressedLists.ts";
import type { EdgeList } from "../nerve/overlapEdges.ts";

/** The graph part of a cover, shared by a single build and each radius of a sweep (rows are parsed-table rows). */
export interface CoverGraph {
  /** Landmark of node k (0-based) as a parsed-table row, in the order chosen; node k is shown as k + 1. */
  readonly landmarks: Uint32Array;
  /** Members of node k as parsed-table rows, ascending. */
  readonly members: CompressedLists;
  readonly edges: EdgeList;
  readonly component: Uint32Array;
  readonly componentCount: number;
  /** E − V + C: independent cycles of the graph (counts every triangle of mutually overlapping balls). */
  readonly cycleRank: number;
}
