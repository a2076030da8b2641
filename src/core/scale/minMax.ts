import type { StepHook } from "../control.ts";
import type { NumericTable } from "../table/types.ts";
import { columnTransform } from "./columnTransform.ts";
import type { ScaledTable } from "./columnTransform.ts";

/**
 * Min–max scaling to [0, 1] per column: x' = (x − min) / (max − min).
 * Source: common practice (e.g. J. Han, M. Kamber and J. Pei, Data Mining, 3rd ed., 2011, §3.5.2).
 * A constant column (max = min) becomes 0 and is reported. O(n·d).
 * @example minMax({ rows: 3, columns: 1, names: ["x"], values: Float64Array.of(2, 4, 6) }).table.values // => Float64Array [0, 0.5, 1]
 */
export function minMax(input: NumericTable, into?: Float64Array, onStep?: StepHook): ScaledTable {
  return columnTransform(input, into, (values, j, d, n) => {
    let lo = Infinity;
    let hi = -Infinity;
    for (let i = 0; i < n; ++i) {
      const x = values[i * d + j]!;
      lo = Math.min(lo, x);
      hi = Math.max(hi, x);
    }
    return { center: lo, spread: hi - lo };
  }, onStep);
}
