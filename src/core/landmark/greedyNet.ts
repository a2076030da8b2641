import type { RunControl } from "../control.ts";
import type { Metric } from "../metric/types.ts";
import { maybeRowIndex, type RowIndex } from "../search/rowIndex.ts";
import type { NumericTable } from "../table/types.ts";
import { greedyBalls } from "./greedyBalls.ts";

export interface NetOptions extends RunControl {
  /** A candidate index built for this table and metric (createRowIndex), reused across calls. */
  index?: RowIndex;
}

/**
 * Greedy ε-net of a table: greedyBalls (the one greedy loop) on the table's index, without the
 * balls. Visit rows in `order` (visitOrder.ts gives a rule's order); a row becomes a landmark
 * when no landmark chosen so far lies within r of it (reference predicate d ≤ r). The result is
 * an r-net: every row is within r of a landmark, and landmarks are pairwise more than r apart.
 * Source: the greedy net construction, e.g. S. Har-Peled, Geometric Approximation Algorithms,
 * AMS 2011, §4.2. O(n·L) distance tests for L landmarks at worst.
 * Returns landmark rows (0-based, in the order chosen); an empty table gives none.
 * @example greedyNet({ rows: 3, columns: 1, names: ["x"], values: Float64Array.of(0, 1, 2) }, euclidean, 1, Uint32Array.of(0, 1, 2)) // => Uint32Array [0, 2]
 */
export function greedyNet(table: NumericTable, metric: Metric, radius: number, order: ArrayLike<number>, options: NetOptions = {}): Uint32Array {
  if (!(radius > 0) || !Number.isFinite(radius)) throw new Error(`invalid radius: ${radius}`);
  const { index, ...control } = options;
  return greedyBalls(maybeRowIndex(table, metric, index), radius, order, { ...control, balls: false }).landmarks;
}
