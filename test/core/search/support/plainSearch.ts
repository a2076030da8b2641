import type { Metric, NumericTable } from "../../../../src/core/index.ts";
import { bruteBalls, bruteGreedyNet, bruteMaximinNet } from "../../support/bruteForce.ts";

/**
 * The plain computations every fast path must reproduce: the reference routines of
 * test/core/support/bruteForce.ts with one reference-predicate call per pair.
 */

/** Rows i with metric.within(values, d, centre, i, r), ascending: bruteBalls with the predicate. */
export function plainBall(table: NumericTable, metric: Metric, centre: number, radius: number): number[] {
  return bruteBalls(table.rows, [centre], predicate(table, metric, radius))[0]!;
}

/** Greedy net: a row in `order` is a landmark iff no earlier landmark l has within(l, row): bruteGreedyNet with the predicate. */
export function plainGreedy(table: NumericTable, metric: Metric, radius: number, order: ArrayLike<number>): number[] {
  return bruteGreedyNet(order, predicate(table, metric, radius));
}

/** Farthest-point net as maximinBalls computes it: cover by the predicate, rank by the metric's distances, ties to the lowest row (bruteMaximinNet). */
export function plainMaximin(table: NumericTable, metric: Metric, radius: number, start: number): number[] {
  return bruteMaximinNet(table.rows, start, predicate(table, metric, radius), (l, i) => metric.distance(table.values, table.columns, l, i));
}

const predicate =
  (table: NumericTable, metric: Metric, radius: number) =>
  (landmark: number, row: number): boolean =>
    metric.within(table.values, table.columns, landmark, row, radius);

/** Edges a < b with the number of rows both balls hold, sorted by (a, b): the brute-force count shared with the other core tests. */
export { bruteEdges as plainEdges } from "../../support/bruteForce.ts";
