import type { Metric } from "../metric/types.ts";
import { maximinBalls } from "./maximinBalls.ts";
import { maybeRowIndex } from "../search/rowIndex.ts";
import type { NumericTable } from "../table/types.ts";
import type { NetOptions } from "./greedyNet.ts";

/**
 * Maximin (farthest-point) r-net of a table: maximinBalls (the one maximin loop) on the table's
 * index, without the balls. Start at `start`; repeatedly add the row farthest from all
 * landmarks so far (largest distance to its nearest landmark; ties to the lowest row), until
 * every row is within r of a landmark. "Within" is decided by the metric's reference predicate,
 * distances only rank the candidates, so the result is an r-net under the predicate: every row
 * covered, and each new landmark was covered by none before it (landmarks pairwise > r apart).
 * Source: T. F. Gonzalez, Theor. Comput. Sci. 38:293–306, 1985. O(n·L) distance evaluations at
 * worst; a candidate index (search/maximinBalls.ts) skips rows it proves unaffected.
 * @example maximinNet(line0to4, euclidean, 1, 0) // => Uint32Array [0, 4, 2]
 */
export function maximinNet(
  table: NumericTable,
  metric: Metric,
  radius: number,
  start: number,
  options: NetOptions = {},
): Uint32Array {
  if (!(radius > 0) || !Number.isFinite(radius)) throw new Error(`invalid radius: ${radius}`);
  if (table.rows === 0) return new Uint32Array(0);
  if (!(start >= 0 && start < table.rows)) throw new Error(`invalid start row: ${start}`);
  const { index, ...control } = options;
  return maximinBalls(maybeRowIndex(table, metric, index), radius, start, { ...control, balls: false }).landmarks;
}
