import type { StepHook } from "../control.ts";
import type { NumericTable } from "../table/types.ts";

export interface ScaledTable {
  readonly table: NumericTable;
  /** Names of columns that were constant (zero spread); they are set to 0. */
  readonly constantColumns: readonly string[];
}

/**
 * Applies x ← (x − center) / spread per column, where `fit` gives (center, spread) from column j
 * of the row-major values, read in row order (no copy of the column is made here). A column whose spread is not positive is constant for this scaling: it
 * becomes all 0 and is named in `constantColumns`. Writes into `into` (default a new array; it may
 * be `input.values` itself: each column is fitted before it is overwritten); `onStep` is called
 * between columns (a chance to cancel by throwing). O(n·d) plus `fit`.
 */
export type ColumnFit = (values: Float64Array, j: number, d: number, n: number) => { center: number; spread: number };

export function columnTransform(input: NumericTable, into: Float64Array | undefined, fit: ColumnFit, onStep?: StepHook): ScaledTable {
  const { rows: n, columns: d, values } = input;
  const out = into ?? new Float64Array(values.length);
  if (out.length !== values.length) throw new Error(`scaling target holds ${out.length} values, not ${values.length}`);
  const constantColumns: string[] = [];
  for (let j = 0; j < d; ++j) {
    if (j > 0) onStep?.();
    const { center, spread } = fit(values, j, d, n);
    if (!(spread > 0)) {
      constantColumns.push(input.names[j]!);
      for (let i = 0; i < n; ++i) out[i * d + j] = 0;
      continue;
    }
    for (let i = 0; i < n; ++i) out[i * d + j] = (values[i * d + j]! - center) / spread;
  }
  return { table: { ...input, values: out }, constantColumns };
}
