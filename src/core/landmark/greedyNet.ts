import type { Metric } from "../metric/types.ts";
import type { NumericTable } from "../table/types.ts";

/**
 * Greedy ε-net: visit rows in `order`; a row becomes a landmark when no landmark chosen so far
 * lies within r of it (reference predicate d ≤ r). The result is an r-net: every row is within r
 * of a landmark (it was either covered or chosen), and landmarks are pairwise more than r apart
 * (each was farther than r from all earlier ones).
 * Source: the greedy net construction, e.g. S. Har-Peled, Geometric Approximation Algorithms,
 * AMS 2011, §4.2. O(n·L) distance tests for L landmarks.
 * Returns landmark rows (0-based, in the order chosen); an empty table gives none.
 * @example greedyNet({ rows: 3, columns: 1, names: ["x"], values: Float64Array.of(0, 1, 2) }, euclidean, 1, Uint32Array.of(0, 1, 2)) // => Uint32Array [0, 2]
 */
export function greedyNet(
  table: NumericTable,
  metric: Metric,
  radius: number,
  order: ArrayLike<number>,
  onProgress?: (done: number, total: number) => void,
): Uint32Array {
  if (!(radius > 0) || !Number.isFinite(radius)) throw new Error(`invalid radius: ${radius}`);
  const { values, columns: d } = table;
  const landmarks: number[] = [];
  for (let k = 0; k < order.length; ++k) {
    const i = order[k]!;
    let covered = false;
    for (let l = 0; l < landmarks.length; ++l) {
      if (metric.within(values, d, landmarks[l]!, i, radius)) {
        covered = true;
        break;
      }
    }
    if (!covered) landmarks.push(i);
    if (onProgress && (k & 4095) === 4095) onProgress(k + 1, order.length);
  }
  return Uint32Array.from(landmarks);
}
