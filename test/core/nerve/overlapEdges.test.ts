import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { ballMembership, euclidean, overlapEdges, randomSource, rowsToNodes, shuffledOrder } from "../../../src/core/index.ts";
import { greedyNet } from "../support/nets.ts";
import { allLists, bruteEdges } from "../support/bruteForce.ts";
import { gridRadius, gridTable, landmarkRule } from "../support/gridTable.ts";

const orderFor = (rows: number, { rule, seed }: { rule: "greedy-file-order" | "greedy-shuffled"; seed: number }): Uint32Array =>
  rule === "greedy-shuffled" ? shuffledOrder(rows, randomSource(seed)) : Uint32Array.from({ length: rows }, (_, i) => i);

const plain = (edges: { source: Uint32Array; target: Uint32Array; shared: Uint32Array }) => ({
  source: Array.from(edges.source),
  target: Array.from(edges.target),
  shared: Array.from(edges.shared),
});

describe("overlapEdges", () => {
  it("three balls {0, 1, 2}, {1, 2, 3}, {3, 4} give edges 0–1 sharing 2 and 1–2 sharing 1", () => {
    const members = { offsets: Uint32Array.of(0, 3, 6, 8), items: Uint32Array.of(0, 1, 2, 1, 2, 3, 3, 4) };
    expect(plain(overlapEdges(rowsToNodes(members, 5), 3))).toEqual({ source: [0, 1], target: [1, 2], shared: [2, 1] }); // worked by hand
  });

  it("a row in three balls adds one to each of the three pairs", () => {
    const members = { offsets: Uint32Array.of(0, 1, 2, 3), items: Uint32Array.of(0, 0, 0) };
    expect(plain(overlapEdges(rowsToNodes(members, 1), 3))).toEqual({ source: [0, 0, 1], target: [1, 2, 2], shared: [1, 1, 1] }); // worked by hand
  });

  it("disjoint balls give no edges, and so do no nodes", () => {
    const members = { offsets: Uint32Array.of(0, 1, 2), items: Uint32Array.of(0, 1) };
    expect(plain(overlapEdges(rowsToNodes(members, 2), 2))).toEqual({ source: [], target: [], shared: [] });
    expect(plain(overlapEdges(rowsToNodes({ offsets: Uint32Array.of(0), items: new Uint32Array(0) }, 3), 0))).toEqual({ source: [], target: [], shared: [] });
  });

  it("sorts edges by (source, target) also when nodes are numbered past 9 (numeric, not text, order)", () => {
    // Row 0 lies in nodes 2 and 10; row 1 in nodes 0 and 11; row 2 in nodes 2 and 3; row 3 in nodes 10 and 11.
    // Pair keys a·12 + b are 11, 27, 34 and 131: a text sort would put 131 second.
    const nodeRows = [[1], [], [0, 2], [2], [], [], [], [], [], [], [0, 3], [1, 3]];
    const offsets = Uint32Array.from([0, ...nodeRows.map((_, k) => nodeRows.slice(0, k + 1).flat().length)]);
    const members = { offsets, items: Uint32Array.from(nodeRows.flat()) };
    expect(plain(overlapEdges(rowsToNodes(members, 4), 12))).toEqual({ source: [0, 2, 2, 10], target: [11, 3, 10, 11], shared: [1, 1, 1, 1] }); // worked by hand
  });

  it("each edge weight is the number of rows two balls share, and every sharing pair has an edge (both rules)", () => {
    fc.assert(
      fc.property(gridTable, gridRadius, landmarkRule, (table, radius, rule) => {
        const landmarks = greedyNet(table, euclidean, radius, orderFor(table.rows, rule));
        const members = ballMembership(table, euclidean, radius, landmarks);
        const edges = overlapEdges(rowsToNodes(members, table.rows), landmarks.length);
        expect(plain(edges)).toEqual(bruteEdges(allLists(members)));
      }),
    );
  });
});
