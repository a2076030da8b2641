import type { Metric } from "../metric/types.ts";
import { greedyBalls } from "./greedyBalls.ts";
import { maybeRowIndex, type RowIndex } from "../search/rowIndex.ts";
import type { NumericTable } from "../table/types.ts";

export interface NetOptions {
  /** A candidate index built for this table and metric (createRowIndex), reused across calls. */
  index?: RowIndex;
}

/**
 * Greedy ε-net: visit rows in `order`; a row becomes a landmark when no landmark chosen so far
 * lies within r of it (reference predicate d ≤ r). The result is an r-net: every row is within r
 * of a landmark (it was either covered or chosen), and landmarks are pairwise more than r apart
 * (each was farther than r from all earlier ones).
 * Source: the greedy net construction, e.g. S. Har-Peled, Geometric Approximation Algorithms,
 * AMS 2011, §4.2. O(n·L) distance tests for L landmarks at worst; a candidate index
 * (search/greedyBalls.ts) skips pairs it proves the predicate rejects.
 * Returns landmark rows (0-based, in the order chosen); an empty table gives none.
 * @example greedyNet({ rows: 3, columns: 1, names: ["x"], values: Float64Array.of(0, 1, 2) }, euclidean, 1, Uint32Array.of(0, 1, 2)) // => Uint32Array [0, 2]
 */
export function greedyNet(
  table: NumericTable,
  metric: Metric,
  radius: number,
  order: ArrayLike<number>,
  onProgress?: (done: number, total: number) => void,
  options: NetOptions = {},
): Uint32Array {
  if (!(radius > 0) || !Number.isFinite(radius)) throw new Error(`invalid radius: ${radius}`);
  const index = maybeRowIndex(table, metric, options.index);
  return greedyBalls(index, radius, order, { balls: false, ...(onProgress ? { onProgress } : {}) }).landmarks;
}
