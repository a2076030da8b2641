import type { ScaleName } from "../cover/params.ts";
import type { NumericTable } from "../table/types.ts";
import { minMax } from "./minMax.ts";
import { robust } from "./robust.ts";
import { zScore, type ScaledTable } from "./zScore.ts";

/**
 * Scales every column once, before any distance, then multiplies column j by its weight w_j
 * (x_j ← w_j · x_j; a missing weight is 1). "none" reports no constant columns.
 */
export function scaleTable(input: NumericTable, scale: ScaleName, weights: Readonly<Record<string, number>> = {}): ScaledTable {
  for (const [name, w] of Object.entries(weights)) {
    if (!input.names.includes(name)) throw new Error(`weight for a column that is not a feature: ${name}`);
    if (!(w >= 0) || !Number.isFinite(w)) throw new Error(`invalid weight for ${name}: ${w}`);
  }
  const scaled = scale === "zscore" ? zScore(input) : scale === "minmax" ? minMax(input) : scale === "robust" ? robust(input) : { table: input, constantColumns: [] };
  const factors = input.names.map((name) => weights[name] ?? 1);
  if (factors.every((w) => w === 1)) return scaled;
  const { rows: n, columns: d } = input;
  const values = Float64Array.from(scaled.table.values);
  for (let i = 0; i < n; ++i) for (let j = 0; j < d; ++j) values[i * d + j]! *= factors[j]!;
  return { table: { ...scaled.table, values }, constantColumns: scaled.constantColumns };
}
