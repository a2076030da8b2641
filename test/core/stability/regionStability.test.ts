import { describe, expect, it } from "vitest";
import { assertClose } from "../../assertClose.ts";
import { regionStability } from "../../../src/core/stability/regionStability.ts";
import { pointsTable } from "../sweep/support.ts";

// Cluster A = 0..9 and cluster B = 15..24 on a line (gap 6, diameter 24), unscaled, greedy in
// file order. For 1 ≤ r < 6 each cluster is one connected group of balls and no ball crosses the
// gap (test/core/sweep/twoClusters.test.ts), so selecting A's rows matches A's balls exactly.
const table = pointsTable(["x"], [...Array.from({ length: 10 }, (_, i) => [i]), ...Array.from({ length: 10 }, (_, i) => [15 + i])]);
const params = { features: ["x"], scale: "none", metric: "euclidean", landmarks: "greedy-file-order", seed: 1 } as const;
const clusterA = Array.from({ length: 10 }, (_, i) => i);

describe("region stability across radii", () => {
  it("selecting cluster A gives J = 1 wherever the clusters are apart, and 10/20 once one ball holds every row", () => {
    const { sweep, region } = regionStability(table, params, clusterA, { radii: [1, 2.5, 5.5, 30] });
    expect(Array.from(sweep.figures.radius)).toEqual([1, 2.5, 5.5, 30]);
    assertClose(region.jaccard, [1, 1, 1, 0.5]); // worked by hand: at r = 30 one node holds all 20 rows, 10 of them selected
    expect(Array.from(region.nodes[3]!)).toEqual([0]);
    expect(region.selectedRows).toBe(10);
  });

  it("at r = 2.5 the matched nodes are A's four balls, in the order 1, 2, 0, 3", () => {
    // file order at r = 2.5: A's landmarks 0, 3, 6, 9 (nodes 0..3) with balls {0..2}, {1..5}, {4..8}, {7..9}.
    // Start: node 1 (5 selected rows; node 2 also 5, node 1 is lower). Then node 2 (J 8/10) beats
    // node 0 (6/10); then nodes 0 and 3 both give 9/10, the lower first; then node 3: J = 1 (worked by hand).
    const { region } = regionStability(table, params, clusterA, { radii: [2.5] });
    expect(Array.from(region.nodes[0]!)).toEqual([1, 2, 0, 3]);
  });

  it("a selection of rows outside the build is an error", () => {
    expect(() => regionStability(table, params, [25], { radii: [1] })).toThrow("invalid selection row: 25");
  });
});
