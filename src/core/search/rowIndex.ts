import type { StepHook } from "../control.ts";
import type { Metric } from "../metric/types.ts";
import type { NumericTable } from "../table/types.ts";
import { defaultLeafSize, kdTree, type KdTree } from "./kdTree.ts";
import { searchSpace, type SearchSpace } from "./searchSpace.ts";

/**
 * A candidate index over the rows of a table under a metric: a k-d tree in the metric's
 * search space (searchSpace.ts), or none when no space applies (every pair is then tested).
 * It only proposes candidates; ballRows decides each one with the metric's reference predicate.
 * Built once per table and metric and reused by the net, the balls and the sweep helpers.
 */
export interface RowIndex {
  readonly table: NumericTable;
  readonly metric: Metric;
  readonly space: SearchSpace | null;
  readonly tree: KdTree | null;
  /** Scratch: the query centre in space coordinates, and candidate or result rows (length n). */
  readonly centre: Float64Array;
  readonly found: Uint32Array;
  /** Node stack for traversals. */
  readonly stack: Uint32Array;
  /** Counters: queries answered and rows whose norm value was computed, for cost estimates. */
  readonly stats: { queries: number; scanned: number };
  /**
   * "probe" until judged: "flat" once the first 8 queries each scanned over 3/4 of the rows (the
   * boxes prune too little to pay for their bounds; ballRows then scans all positions), "tree"
   * as soon as one query scans less. Judged afresh for each new radius (see judgeRadius).
   */
  mode: "probe" | "tree" | "flat";
  /** Radius the mode was judged at, and queries judged at it so far. */
  modeRadius: number;
  probes: number;
}

export interface RowIndexOptions {
  /** Rows per k-d tree leaf (default 32). */
  leafSize?: number;
  /** Called now and then while the tree is built (kdTree's onStep), e.g. to check for cancellation. */
  onStep?: StepHook;
}

/**
 * Builds the candidate index of a table under a metric. O(n log n · d) time, O(n·d) memory
 * (a copy of the rows in tree order; cosine and correlation add their unit rows).
 * @example createRowIndex(table, euclidean).tree !== null // => true
 */
export function createRowIndex(table: NumericTable, metric: Metric, options: RowIndexOptions = {}): RowIndex {
  const space = searchSpace(table, metric);
  const tree = space && kdTree(space.points, space.dims, table.rows, options.leafSize ?? defaultLeafSize, options.onStep ? { onStep: options.onStep } : {});
  return rowIndexOf(table, metric, space, tree);
}

/** An index over given parts (a space and a tree over its points, or neither), with fresh scratch and counters. */
export function rowIndexOf(table: NumericTable, metric: Metric, space: SearchSpace | null, tree: KdTree | null): RowIndex {
  return {
    table,
    metric,
    space,
    tree,
    centre: new Float64Array(table.columns),
    found: new Uint32Array(table.rows),
    stack: new Uint32Array(128), // ≥ depth + 2 of a median-split tree over < 2³² rows
    stats: { queries: 0, scanned: 0 },
    mode: "probe",
    modeRadius: NaN,
    probes: 0,
  };
}

/** The index for this table and metric: `given` when it was built for them, else a new one. */
export function maybeRowIndex(table: NumericTable, metric: Metric, given: RowIndex | undefined): RowIndex {
  if (!given) return createRowIndex(table, metric);
  if (given.table !== table || given.metric !== metric) throw new Error(`row index built for another table or metric: ${given.metric.name}`);
  return given;
}

/**
 * The reference predicate for a centre row and a tree position: metric.within(centre, row at
 * the position, r). In an exact space (the tree's coordinates are the table's rows, copied bit
 * for bit) it is evaluated on that copy, whose rows at the two positions hold the same values,
 * so the decision is the same and the leaf just scanned is still in the cache.
 */
export function isInBall(index: RowIndex, centre: number, position: number, radius: number): boolean {
  const { table, metric, space, tree } = index;
  if (space?.exact && tree) return metric.within(tree.coords, table.columns, tree.positionOf[centre]!, position, radius);
  return metric.within(table.values, table.columns, centre, tree ? tree.rowAt[position]! : position, radius);
}

/** Starts judging the index's mode afresh when the radius changes (pruning depends on it). Only speed depends on the mode. */
export function judgeRadius(index: RowIndex, radius: number): void {
  if (index.modeRadius === radius) return;
  index.modeRadius = radius;
  index.mode = "probe";
  index.probes = 0;
}
