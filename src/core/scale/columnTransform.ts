import type { NumericTable } from "../table/types.ts";
import type { ScaledTable } from "./zScore.ts";

/**
 * Applies x ← (x − center) / spread per column, where `fit` gives (center, spread) from the
 * column's values. A column whose spread is not positive is constant for this scaling: it
 * becomes all 0 and is named in `constantColumns`. O(n·d) plus the cost of `fit`.
 */
export function columnTransform(input: NumericTable, fit: (column: Float64Array) => { center: number; spread: number }): ScaledTable {
  const { rows: n, columns: d, values } = input;
  const out = new Float64Array(values.length);
  const constantColumns: string[] = [];
  const column = new Float64Array(n);
  for (let j = 0; j < d; ++j) {
    for (let i = 0; i < n; ++i) column[i] = values[i * d + j]!;
    const { center, spread } = fit(column);
    if (!(spread > 0)) {
      constantColumns.push(input.names[j]!);
      continue; // stays 0
    }
    for (let i = 0; i < n; ++i) out[i * d + j] = (column[i]! - center) / spread;
  }
  return { table: { ...input, values: out }, constantColumns };
}
