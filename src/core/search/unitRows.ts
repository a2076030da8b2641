import type { NumericTable } from "../table/types.ts";

/**
 * Unit rows: u = x / ‖x‖, after centring each row on its mean when `centre` is set (correlation
 * distance is the cosine distance of the row-centred rows). The centred values are computed
 * exactly as the correlation predicate computes them (mean summed in column order, divided by
 * d, then xₖ − mean). To keep ‖x‖² away from overflow and underflow, the row is first divided
 * by its largest |xₖ| (the cosine does not change), so ‖û − u‖ ≤ γ_{d+4}, γₘ = m·2⁻⁵³/(1 − m·2⁻⁵³)
 * (N. J. Higham, Accuracy and Stability of Numerical Algorithms, 2nd ed., SIAM 2002, §3.1).
 * A zero row (distance undefined: the predicate rejects all its pairs) becomes NaN, which no
 * threshold test passes. Returns null when a centred value is not finite (the sum behind the
 * mean overflowed), so that no index is built. O(n·d).
 * @example unitRows({ rows: 1, columns: 2, names: ["a", "b"], values: Float64Array.of(3, 4) }, false) // => Float64Array [0.6, 0.8]
 */
export function unitRows(table: NumericTable, centre: boolean): Float64Array | null {
  const { rows: n, columns: d, values } = table;
  const out = new Float64Array(n * d);
  for (let i = 0; i < n; ++i) {
    const a = i * d;
    let mean = 0;
    if (centre) {
      for (let k = a; k < a + d; ++k) mean += values[k]!;
      mean /= d;
    }
    let largest = 0;
    for (let k = a; k < a + d; ++k) {
      out[k] = centre ? values[k]! - mean : values[k]!;
      largest = Math.max(largest, Math.abs(out[k]!));
    }
    if (!Number.isFinite(largest)) return null;
    if (largest === 0) {
      out.fill(NaN, a, a + d);
      continue;
    }
    let squares = 0;
    for (let k = a; k < a + d; ++k) {
      out[k] = out[k]! / largest;
      squares += out[k]! * out[k]!;
    }
    const norm = Math.sqrt(squares);
    for (let k = a; k < a + d; ++k) out[k] = out[k]! / norm;
  }
  return out;
}
