import { maybeMetric } from "../metric/metrics.ts";
import type { MetricName } from "../metric/types.ts";
import { rowIndexOf, type RowIndex } from "./rowIndex.ts";
import type { KdTree } from "./kdTree.ts";
import type { Norm } from "./searchSpace.ts";

/** Copies a typed array into memory another thread reads without a copy (a SharedArrayBuffer); identity where nothing is shared. */
export type ShareArray = <T extends Float64Array | Uint32Array>(array: T) => T;

/**
 * A row index at one radius as plain typed arrays and values, which can be posted to another
 * thread (structured clone; arrays on SharedArrayBuffers are then shared, not copied) and made
 * into an index there again by indexFromParts. The arrays are borrowed, never written, by both
 * threads: the search only reads the table, the space and the tree.
 */
export interface IndexParts {
  readonly metric: MetricName;
  readonly rows: number;
  readonly columns: number;
  readonly values: Float64Array;
  readonly radius: number;
  /** The search space's points (the table's values when `same`), its norm, and its threshold at `radius`. */
  readonly space: { readonly points: Float64Array; readonly dims: number; readonly norm: Norm; readonly exact: boolean; readonly limit: number } | null;
  /** The tree's arrays (KdTree's; its dims are the search space's). */
  readonly tree: Omit<KdTree, "dims"> | null;
  /** The index's judgement at `radius` (RowIndex.mode): only speed depends on it. */
  readonly mode: RowIndex["mode"];
}

/**
 * The parts of `index` at `radius`, each array passed through `share` once (an array that two
 * parts hold, such as a tree-order index's points and coordinates, stays one array). With a
 * sharing `share` the table, the space's points and the tree are copied once each; the caller
 * then lets the original index go and searches through indexFromParts(parts) too, so that one
 * copy of the table remains. O(n·d) for the copies.
 * @example indexFromParts(indexParts(index, 1, (a) => a)).tree === null // => false when the index has a tree
 */
export function indexParts(index: RowIndex, radius: number, share: ShareArray): IndexParts {
  const seen = new Map<Float64Array | Uint32Array, Float64Array | Uint32Array>();
  const once = <T extends Float64Array | Uint32Array>(array: T): T => {
    if (!seen.has(array)) seen.set(array, share(array));
    return seen.get(array) as T;
  };
  const { table, space, tree } = index;
  return {
    metric: index.metric.name,
    rows: table.rows,
    columns: table.columns,
    values: once(table.values),
    radius,
    space: space && { points: once(space.points), dims: space.dims, norm: space.norm, exact: space.exact, limit: space.threshold(radius) },
    tree: tree && {
      rowAt: once(tree.rowAt),
      positionOf: once(tree.positionOf),
      coords: once(tree.coords),
      start: once(tree.start),
      end: once(tree.end),
      firstChild: once(tree.firstChild),
      lo: once(tree.lo),
      hi: once(tree.hi),
    },
    mode: index.modeRadius === radius ? index.mode : "probe",
  };
}

/** The index that `parts` describe, with its own scratch and counters; its space answers the threshold at the parts' radius only. */
export function indexFromParts(parts: IndexParts): RowIndex {
  const { rows, columns, values, radius, space, tree } = parts;
  const table = { rows, columns, names: [], values };
  const threshold = (r: number): number => {
    if (r !== radius) throw new Error(`index parts made for radius ${radius}, asked at ${r}`);
    return space!.limit;
  };
  const index = rowIndexOf(table, maybeMetric(parts.metric), space && { points: space.points, dims: space.dims, norm: space.norm, exact: space.exact, threshold }, tree && { dims: space!.dims, ...tree });
  index.modeRadius = radius;
  index.mode = parts.mode;
  return index;
}
