import type { StepHook } from "../control.ts";
import { quantileSorted } from "../stats/quantileSorted.ts";
import type { NumericTable } from "../table/types.ts";
import { columnTransform } from "./columnTransform.ts";
import type { ScaledTable } from "./columnTransform.ts";

/**
 * Robust scaling per column: x' = (x − median) / IQR, IQR = Q(0.75) − Q(0.25), with quantiles of
 * Hyndman–Fan type 7 (R's default; R. J. Hyndman and Y. Fan, Am. Stat. 50(4):361–365, 1996).
 * A column with zero IQR becomes 0 and is reported (even if its extremes differ). O(n log n · d).
 * @example robust({ rows: 5, columns: 1, names: ["x"], values: Float64Array.of(1, 2, 3, 4, 100) }).table.values // => Float64Array [-1, -0.5, 0, 0.5, 48.5]
 */
export function robust(input: NumericTable, into?: Float64Array, onStep?: StepHook): ScaledTable {
  return columnTransform(input, into, (values, j, d, n) => {
    const sorted = Float64Array.from({ length: n }, (_, i) => values[i * d + j]!).sort();
    return { center: quantileSorted(sorted, 0.5), spread: quantileSorted(sorted, 0.75) - quantileSorted(sorted, 0.25) };
  }, onStep);
}
