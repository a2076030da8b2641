import type { StepHook } from "../control.ts";
import type { ScaleName } from "../params.ts";
import type { NumericTable } from "../table/types.ts";
import { minMax } from "./minMax.ts";
import { robust } from "./robust.ts";
import type { ScaledTable } from "./columnTransform.ts";
import { zScore } from "./zScore.ts";

/**
 * Scales every column once, before any distance, then multiplies column j by its weight w_j
 * (x_j ← w_j · x_j; a missing weight is 1). "none" reports no constant columns.
 * With `overwrite` the result is written over `input.values` (for a table the caller owns and
 * no longer needs unscaled: it saves a copy of the table); otherwise `input` is left as it was.
 * `onStep` is called between columns (a chance to cancel by throwing).
 */
export function scaleTable(input: NumericTable, scale: ScaleName, weights: Readonly<Record<string, number>> = {}, options: { readonly overwrite?: boolean; readonly onStep?: StepHook } = {}): ScaledTable {
  const { overwrite = false, onStep } = options;
  for (const [name, w] of Object.entries(weights)) {
    if (!input.names.includes(name)) throw new Error(`weight for a column that is not a feature: ${name}`);
    if (!(w >= 0) || !Number.isFinite(w)) throw new Error(`invalid weight for ${name}: ${w}`);
  }
  const into = overwrite ? input.values : undefined;
  const scaled = scale === "zscore" ? zScore(input, into, onStep) : scale === "minmax" ? minMax(input, into, onStep) : scale === "robust" ? robust(input, into, onStep) : { table: input, constantColumns: [] };
  const factors = input.names.map((name) => weights[name] ?? 1);
  if (factors.every((w) => w === 1)) return scaled;
  const { rows: n, columns: d } = input;
  const values = overwrite || scaled.table !== input ? scaled.table.values : Float64Array.from(input.values);
  for (let i = 0; i < n; ++i) for (let j = 0; j < d; ++j) values[i * d + j]! *= factors[j]!;
  return { table: { ...scaled.table, values }, constantColumns: scaled.constantColumns };
}
