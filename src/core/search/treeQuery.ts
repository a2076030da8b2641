import type { Norm } from "./searchSpace.ts";

/**
 * What one query against the k-d tree reads: the tree's arrays, the centre and the threshold.
 * Borrowed for the duration of the query: nothing is copied, and the caller may move
 * `centreBase` (to the next landmark of a group) or `limit` (a tighter bound) between calls.
 */
export interface TreeQuery {
  readonly norm: Norm;
  readonly dims: number;
  /** Points in tree order, row-major (KdTree.coords). */
  readonly coords: Float64Array;
  /** Boxes of the nodes, `dims` values per node (KdTree.lo, KdTree.hi). */
  readonly lo: Float64Array;
  readonly hi: Float64Array;
  /** The centre is centre[centreBase .. centreBase + dims). */
  readonly centre: Float64Array;
  centreBase: number;
  /** Threshold in the norm's own units (SearchSpace.threshold). */
  limit: number;
}
