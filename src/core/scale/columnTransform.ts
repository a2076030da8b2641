import type { NumericTable } from "../table/types.ts";
import type { ScaledTable } from "./zScore.ts";

/**
 * Applies x ← (x − center) / spread per column, where `fit` gives (center, spread) from the
 * column's values. A column whose spread is not positive is constant for this scaling: it
 * becomes all 0 and is named in `constantColumns`. Writes into `into` (default a new array; it may
 * be `input.values` itself: each column is copied out before it is overwritten); `onStep` is called
 * between columns (a chance to cancel by throwing). O(n·d) plus `fit`.
 */
export function columnTransform(input: NumericTable, into: Float64Array | undefined, fit: (column: Float64Array) => { center: number; spread: number }, onStep?: () => void): ScaledTable {
  const { rows: n, columns: d, values } = input;
  const out = into ?? new Float64Array(values.length);
  if (out.length !== values.length) throw new Error(`scaling target holds ${out.length} values, not ${values.length}`);
  const constantColumns: string[] = [];
  const column = new Float64Array(n);
  for (let j = 0; j < d; ++j) {
    if (j > 0) onStep?.();
    for (let i = 0; i < n; ++i) column[i] = values[i * d + j]!;
    const { center, spread } = fit(column);
    if (!(spread > 0)) {
      constantColumns.push(input.names[j]!);
      for (let i = 0; i < n; ++i) out[i * d + j] = 0;
      continue;
    }
    for (let i = 0; i < n; ++i) out[i * d + j] = (column[i]! - center) / spread;
  }
  return { table: { ...input, values: out }, constantColumns };
}
