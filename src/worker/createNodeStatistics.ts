import { columnSummary, standardisedDifference, type ColumnSummary, type ParsedTable } from "../core/index.ts";
import type { NodeColumnStats } from "./protocol.ts";

/**
 * Statistics of a node's member rows per numeric column, each beside its standardised difference
 * from all rows: (node mean − mean of all rows) / sd of all rows (sd with n − 1).
 * The whole-column summary, which sorts the column (O(n log n)), is computed once per column on
 * first use and kept for the table's lifetime (one Float64Array copy of a column while it sorts);
 * a node then costs O(m log m) per column for its m rows. Runs in the worker, off the page's thread.
 * A name that is not a numeric column of the table throws.
 * @example createNodeStatistics(parseCsvText("x\n1\n2\n3\n"))(Uint32Array.of(2), ["x"])[0].standardisedDifference // => 1
 */
export function createNodeStatistics(table: ParsedTable): (rows: Uint32Array, columns: readonly string[]) => NodeColumnStats[] {
  const whole = new Map<string, ColumnSummary>();
  let all: Uint32Array | null = null;
  return (rows, columns) =>
    columns.map((name) => {
      const column = table.columns.find((c) => c.name === name);
      if (!column || column.kind !== "numeric") throw new Error(`unknown numeric column: ${name}`);
      let overall = whole.get(name);
      if (!overall) {
        all ??= Uint32Array.from({ length: table.rows }, (_, i) => i);
        overall = columnSummary(column.numbers, all);
        whole.set(name, overall);
      }
      const summary = columnSummary(column.numbers, rows);
      return { name, summary, standardisedDifference: standardisedDifference(summary.mean, overall.mean, overall.sd) };
    });
}
