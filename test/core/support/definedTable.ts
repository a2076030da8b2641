import fc from "fast-check";
import type { Metric, NumericTable } from "../../../src/core/index.ts";
import { gridRadius } from "./gridTable.ts";

/** The rows of `table` on which `metric` is defined, by the metric's own isUndefinedRow (all rows when it has none). */
export function definedRows(table: NumericTable, metric: Metric): NumericTable {
  const test = metric.isUndefinedRow;
  if (!test) return table;
  const d = table.columns;
  const keep = Array.from({ length: table.rows }, (_, i) => i).filter((i) => !test(table.values, d, i));
  const values = new Float64Array(keep.length * d);
  keep.forEach((i, k) => values.set(table.values.subarray(i * d, i * d + d), k * d));
  return { ...table, rows: keep.length, values };
}

/**
 * Radii suited to a metric: the half grid 0.5..4 for the true metrics; for cosine and correlation,
 * whose distances lie in [0, 2], a few values from tight to everything, with 1 (orthogonal rows,
 * d = 1 exactly) and 0.5 as likely ties.
 */
export const radiusFor = (metric: Metric): fc.Arbitrary<number> =>
  metric.isTrueMetric ? gridRadius : fc.constantFrom(0.01, 0.1, 0.25, 0.5, 1, 1.5, 2);
