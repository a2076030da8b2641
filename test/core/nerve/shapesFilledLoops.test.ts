// Loops of the graph that the nerve fills: b1 < cycleRank when three balls share rows.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { ballMembership, chebyshev, components, euclidean, nerveBetti, nerveTriangles, overlapEdges, rowsToNodes, type Metric, type NumericTable } from "../../../src/core/index.ts";
import { greedyNet } from "../support/nets.ts";
import { allLists } from "../support/bruteForce.ts";
import { independentNerve } from "../support/gf2Betti.ts";

function nerve(table: NumericTable, metric: Metric, radius: number) {
  const landmarks = greedyNet(table, metric, radius, Uint32Array.from({ length: table.rows }, (_, i) => i));
  const members = ballMembership(table, metric, radius, landmarks);
  const rowNodes = rowsToNodes(members, table.rows);
  const edges = overlapEdges(rowNodes, landmarks.length);
  const { count } = components(landmarks.length, edges.source, edges.target);
  const betti = nerveBetti(landmarks.length, edges, count, nerveTriangles(rowNodes, landmarks.length));
  return { landmarks, members, edges, betti, cycleRank: edges.source.length - landmarks.length + count };
}

const table = (points: readonly (readonly number[])[]): NumericTable => ({ rows: points.length, columns: 2, names: ["x", "y"], values: Float64Array.from(points.flat()) });

describe("a dense 5 × 5 grid under chebyshev with 1 ≤ r < 2", () => {
  // Points (x, y) for y = 0..4, x = 0..4, row-major (row 5y + x), unscaled; Chebyshev distances are
  // integers, so 1 ≤ r < 2 decides as r = 1. Greedy in file order: (0, 0) is a landmark, (1, 0) is
  // within 1 of it, (2, 0) is 2 away → landmark, …; a point of row y = 1 is within 1 of a landmark of
  // row y = 0; (0, 2) is 2 from every landmark so far → landmark; and so on: the landmarks are the 9
  // points with both coordinates even. Balls are the 3 × 3 blocks around them (clipped).
  // Edges: landmarks one step of 2 apart horizontally, vertically or diagonally share the points
  // between them (a king's move on the 3 × 3 landmark grid): 6 + 6 + 8 = 20; landmarks 4 apart share nothing.
  // Triangles: a point with both coordinates odd lies in the 4 balls at the corners of its cell,
  // giving C(4, 3) = 4 triangles per cell and 16 in all; every other point lies in at most 2 balls.
  // cycleRank = 20 − 9 + 1 = 12. b1 = 0: the square faces of the landmark grid span its cycle space
  // over GF(2), each diagonal splits a face into two triangles, and each face's four triangles are all
  // present, so every cycle is a sum of triangle boundaries: rank ∂2 = 12.
  const grid = table(Array.from({ length: 25 }, (_, i) => [i % 5, Math.floor(i / 5)]));

  it("has landmarks at the 9 even points, 20 edges, 16 triangles, cycleRank 12 but b1 = 0", () => {
    for (const r of [1, 1.5, 1.999]) {
      const { landmarks, edges, betti, cycleRank } = nerve(grid, chebyshev, r);
      expect(Array.from(landmarks)).toEqual([0, 2, 4, 10, 12, 14, 20, 22, 24]); // worked by hand
      expect(edges.source.length).toBe(20); // worked by hand
      expect(cycleRank).toBe(12); // worked by hand
      expect(betti).toEqual({ b0: 1, b1: 0, triangles: 16, boundaryRank: 12 }); // worked by hand
    }
  });

  it("the independent GF(2) computation gives the same rank 12 and b1 = 0", () => {
    const independent = independentNerve(allLists(nerve(grid, chebyshev, 1).members));
    expect([independent.triangles.length, independent.boundaryRank, independent.b1]).toEqual([16, 12, 0]); // worked by hand, see above
  });
});

describe("three balls with a common row", () => {
  // Landmarks L0 = (0, 0), L1 = (12, 0), L2 = (6, 12) and side midpoints (6, 0), (3, 6), (9, 6),
  // then the centroid C = (6, 4), in that file order; Euclidean, unscaled, integer squared distances.
  // C is √52, √52 and 8 from the landmarks; for 8 ≤ r < √117 ≈ 10.82 (the limits are derived in
  // shapesHollowTriangle.test.ts; C lies in all three balls once r ≥ 8) the graph is a triangle
  // and C fills it: cycleRank = 3 − 3 + 1 = 1 but b1 = 0.
  const points = [[0, 0], [12, 0], [6, 12], [6, 0], [3, 6], [9, 6], [6, 4]];

  it("for 8 ≤ r < √117 the centroid is in all three balls: one triangle, cycleRank 1, b1 = 0", () => {
    fc.assert(
      fc.property(fc.integer({ min: 32, max: 43 }).map((k) => k / 4), (r) => {
        const { members, betti, cycleRank } = nerve(table(points), euclidean, r);
        expect(allLists(members).every((ball) => ball.includes(6))).toBe(true); // worked by hand
        expect(cycleRank).toBe(1); // worked by hand
        expect(betti).toEqual({ b0: 1, b1: 0, triangles: 1, boundaryRank: 1 }); // worked by hand
      }),
    );
  });
});
