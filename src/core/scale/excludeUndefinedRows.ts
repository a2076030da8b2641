import type { Metric } from "../metric/types.ts";
import type { NumericTable } from "../table/types.ts";

export interface DefinedRows {
  readonly table: NumericTable;
  /** Parsed-table row of each row of `table`. */
  readonly usedRows: Uint32Array;
  /** Parsed-table rows left out because the metric is undefined on them. */
  readonly undefinedRows: Uint32Array;
}

/** Leaves out rows on which the metric is undefined (after scaling), keeping their row numbers. O(n·d). */
export function excludeUndefinedRows(table: NumericTable, metric: Metric, usedRows: Uint32Array): DefinedRows {
  const test = metric.isUndefinedRow;
  if (!test) return { table, usedRows, undefinedRows: new Uint32Array(0) };
  const { rows: n, columns: d, values } = table;
  const keep: number[] = [];
  const left: number[] = [];
  for (let i = 0; i < n; ++i) (test(values, d, i) ? left : keep).push(i);
  if (left.length === 0) return { table, usedRows, undefinedRows: new Uint32Array(0) };
  const kept = new Float64Array(keep.length * d);
  keep.forEach((i, k) => kept.set(values.subarray(i * d, i * d + d), k * d));
  return {
    table: { ...table, rows: keep.length, values: kept },
    usedRows: Uint32Array.from(keep, (i) => usedRows[i]!),
    undefinedRows: Uint32Array.from(left, (i) => usedRows[i]!),
  };
}
