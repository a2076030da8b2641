// Invariance to row order: permuting the rows of the table while holding the landmarks fixed
// (the same data points, under their new row numbers) must give the same graph.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { ballMembership, components, euclidean, overlapEdges, randomSource, rowsToNodes, shuffledOrder, type NumericTable } from "../../../src/core/index.ts";
import { greedyNet } from "../support/nets.ts";
import { allLists } from "../support/bruteForce.ts";
import { gridRadius, gridTable, landmarkRule } from "../support/gridTable.ts";

const orderFor = (rows: number, { rule, seed }: { rule: "greedy-file-order" | "greedy-shuffled"; seed: number }): Uint32Array =>
  rule === "greedy-shuffled" ? shuffledOrder(rows, randomSource(seed)) : Uint32Array.from({ length: rows }, (_, i) => i);

/** A table with its rows permuted: new row p is old row `permutation[p]`. */
const permuted = (table: NumericTable, permutation: readonly number[]): NumericTable => {
  const d = table.columns;
  const values = new Float64Array(table.values.length);
  permutation.forEach((old, p) => values.set(table.values.subarray(old * d, old * d + d), p * d));
  return { ...table, values };
};

const tableWithPermutation = gridTable.chain((table) =>
  fc.shuffledSubarray(Array.from({ length: table.rows }, (_, i) => i), { minLength: table.rows, maxLength: table.rows }).map((permutation) => ({ table, permutation })),
);

describe("row permutation with landmarks held fixed", () => {
  it("gives the same balls (mapped back), the same edges with the same weights and the same components", () => {
    fc.assert(
      fc.property(tableWithPermutation, gridRadius, landmarkRule, ({ table, permutation }, radius, rule) => {
        const inverse = new Array<number>(table.rows);
        permutation.forEach((old, p) => (inverse[old] = p));

        const landmarks = greedyNet(table, euclidean, radius, orderFor(table.rows, rule));
        const members = ballMembership(table, euclidean, radius, landmarks);
        const edges = overlapEdges(rowsToNodes(members, table.rows), landmarks.length);
        const parts = components(landmarks.length, edges.source, edges.target);

        const moved = permuted(table, permutation);
        const movedLandmarks = Uint32Array.from(landmarks, (l) => inverse[l]!);
        const movedMembers = ballMembership(moved, euclidean, radius, movedLandmarks);
        const movedEdges = overlapEdges(rowsToNodes(movedMembers, moved.rows), movedLandmarks.length);
        const movedParts = components(movedLandmarks.length, movedEdges.source, movedEdges.target);

        const mappedBack = allLists(movedMembers).map((rows) => rows.map((p) => permutation[p]!).sort((a, b) => a - b));
        expect(mappedBack).toEqual(allLists(members));
        expect([Array.from(movedEdges.source), Array.from(movedEdges.target), Array.from(movedEdges.shared)]).toEqual([
          Array.from(edges.source), Array.from(edges.target), Array.from(edges.shared),
        ]);
        expect(Array.from(movedParts.component)).toEqual(Array.from(parts.component));
        expect(movedParts.count).toBe(parts.count);
      }),
    );
  });

  it("chooses the same points as landmarks when the visiting order is carried along", () => {
    fc.assert(
      fc.property(tableWithPermutation, gridRadius, landmarkRule, ({ table, permutation }, radius, rule) => {
        const inverse = new Array<number>(table.rows);
        permutation.forEach((old, p) => (inverse[old] = p));
        const order = orderFor(table.rows, rule);
        const landmarks = greedyNet(table, euclidean, radius, order);
        const movedLandmarks = greedyNet(permuted(table, permutation), euclidean, radius, Uint32Array.from(order, (i) => inverse[i]!));
        expect(Array.from(movedLandmarks, (p) => permutation[p]!)).toEqual(Array.from(landmarks));
      }),
    );
  });
});
