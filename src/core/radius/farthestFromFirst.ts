import type { Metric } from "../metric/types.ts";
import type { NumericTable } from "../table/types.ts";

/**
 * The largest distance from the first row to any row: the scale every radius rule starts from
 * (under a true metric, twice it is at least the diameter). The one rule for degenerate input of
 * the radius rules: fewer than two rows, or no row apart from the first, leave no radius that
 * separates anything, and this throws saying so. O(n·d).
 * @example farthestFromFirst(line 0, 1, 3, euclidean) // => 3
 */
export function farthestFromFirst(table: NumericTable, metric: Metric): number {
  let far = 0;
  for (let i = 1; i < table.rows; ++i) far = Math.max(far, metric.distance(table.values, table.columns, 0, i));
  if (!(far > 0)) throw new Error(`no radius separates these rows: fewer than two distinct rows (${table.rows} row${table.rows === 1 ? "" : "s"} used)`);
  return far;
}
