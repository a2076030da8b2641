import type { Metric } from "../metric/types.ts";
import type { NumericTable } from "../table/types.ts";

/**
 * Maximin (farthest-point) r-net: start at `start`; repeatedly add the row farthest from all
 * landmarks so far (largest distance to its nearest landmark; ties to the lowest row), until
 * every row is within r of a landmark. "Within" is decided by the metric's reference predicate,
 * distances only rank the candidates, so the result is an r-net under the predicate: every row
 * covered, and each new landmark was covered by none before it (landmarks pairwise > r apart).
 * Source: T. F. Gonzalez, Theor. Comput. Sci. 38:293–306, 1985. O(n·L) distance evaluations.
 * @example maximinNet(line0to4, euclidean, 1, 0) // => Uint32Array [0, 4, 2]
 */
export function maximinNet(
  table: NumericTable,
  metric: Metric,
  radius: number,
  start: number,
  onProgress?: (covered: number, total: number) => void,
): Uint32Array {
  if (!(radius > 0) || !Number.isFinite(radius)) throw new Error(`invalid radius: ${radius}`);
  const { values, columns: d, rows: n } = table;
  if (n === 0) return new Uint32Array(0);
  if (!(start >= 0 && start < n)) throw new Error(`invalid start row: ${start}`);
  const nearest = new Float64Array(n).fill(Infinity);
  const covered = new Uint8Array(n);
  let coveredCount = 0;
  const landmarks: number[] = [];
  let next = start;
  while (next >= 0) {
    landmarks.push(next);
    for (let i = 0; i < n; ++i) {
      if (covered[i]) continue;
      if (metric.within(values, d, next, i, radius)) {
        covered[i] = 1;
        coveredCount++;
      } else {
        nearest[i] = Math.min(nearest[i]!, metric.distance(values, d, next, i));
      }
    }
    next = -1;
    let farthest = -Infinity;
    for (let i = 0; i < n; ++i) {
      if (!covered[i] && nearest[i]! > farthest) {
        farthest = nearest[i]!;
        next = i;
      }
    }
    onProgress?.(coveredCount, n);
  }
  return Uint32Array.from(landmarks);
}
