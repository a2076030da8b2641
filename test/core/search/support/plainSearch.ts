import type { Metric, NumericTable } from "../../../../src/core/index.ts";

/**
 * The plain computations every fast path must reproduce, written from the definitions with one
 * reference-predicate call per pair (the code Shoal ran before the candidate indexes).
 */

/** Rows i with metric.within(values, d, centre, i, r), ascending. */
export function plainBall(table: NumericTable, metric: Metric, centre: number, radius: number): number[] {
  const rows: number[] = [];
  for (let i = 0; i < table.rows; ++i) if (metric.within(table.values, table.columns, centre, i, radius)) rows.push(i);
  return rows;
}

/** Greedy net: a row in `order` is a landmark iff no earlier landmark l has within(l, row). */
export function plainGreedy(table: NumericTable, metric: Metric, radius: number, order: ArrayLike<number>): number[] {
  const landmarks: number[] = [];
  for (let k = 0; k < order.length; ++k) {
    const i = order[k]!;
    if (!landmarks.some((l) => metric.within(table.values, table.columns, l, i, radius))) landmarks.push(i);
  }
  return landmarks;
}

/** Farthest-point net as maximinNet computed it: cover by the predicate, rank by Math.min of distances, ties to the lowest row. */
export function plainMaximin(table: NumericTable, metric: Metric, radius: number, start: number): number[] {
  const { values, columns: d, rows: n } = table;
  const nearest = new Float64Array(n).fill(Infinity);
  const covered = new Uint8Array(n);
  const landmarks: number[] = [];
  let next = start;
  while (next >= 0) {
    landmarks.push(next);
    for (let i = 0; i < n; ++i) {
      if (covered[i]) continue;
      if (metric.within(values, d, next, i, radius)) covered[i] = 1;
      else nearest[i] = Math.min(nearest[i]!, metric.distance(values, d, next, i));
    }
    next = -1;
    let farthest = -Infinity;
    for (let i = 0; i < n; ++i) {
      if (!covered[i] && nearest[i]! > farthest) {
        farthest = nearest[i]!;
        next = i;
      }
    }
  }
  return landmarks;
}

/** Edges a < b with the number of rows both balls hold, sorted by (a, b): the brute-force count shared with the other core tests. */
export { bruteEdges as plainEdges } from "../../support/bruteForce.ts";
