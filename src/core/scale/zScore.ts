import type { StepHook } from "../control.ts";
import type { NumericTable } from "../table/types.ts";
import { columnTransform, type ScaledTable } from "./columnTransform.ts";


/**
 * Z-score scaling per column: z = (x − mean) / s, with s the sample standard deviation
 * (divides by n − 1, the usual choice of statistics libraries; e.g. R's sd()), mean and s by
 * Welford's one-pass update (B. P. Welford, Technometrics 4(3):419–420, 1962).
 * A constant column (s = 0) becomes all 0 and is reported; so is every column of a one-row
 * table (s is undefined there). O(n·d); returns a new table.
 * @example zScore({ rows: 3, columns: 1, names: ["x"], values: Float64Array.of(1, 2, 3) }).table.values // => Float64Array [-1, 0, 1]
 */
export function zScore(input: NumericTable, into?: Float64Array, onStep?: StepHook): ScaledTable {
  return columnTransform(input, into, (values, j, d, n) => {
    let mean = 0;
    let m2 = 0;
    for (let i = 0; i < n; ++i) {
      const x = values[i * d + j]!;
      const delta = x - mean;
      mean += delta / (i + 1);
      m2 += delta * (x - mean);
    }
    return { center: mean, spread: n > 1 ? Math.sqrt(m2 / (n - 1)) : 0 };
  }, onStep);
}
