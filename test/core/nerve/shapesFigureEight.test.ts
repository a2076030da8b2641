// A figure-eight: the lattice points on the boundaries of two 4 × 4 squares that share one corner,
// [0, 4]² and [4, 8]², 16 + 16 − 1 = 31 points. Unscaled, Euclidean, greedy in file order, with the
// 7 corners first in the file: (0, 0), (4, 0), (4, 4), (0, 4), (8, 4), (8, 8), (4, 8); the other 24
// points follow in any order. All squared distances are integers, so ties d = r are exact.
//
// Derivation for 2 ≤ r < 4. Corners are pairwise at least 4 apart, so all 7 are landmarks; every
// other point lies on a side of length 4, within 2 of the nearer end of that side: covered. V = 7.
// A point (t, 0) on a side is t and 4 − t from the side's ends and at least 4 from every other
// corner (e.g. to (4, 4): √((4 − t)² + 16) ≥ 4 > r); the same holds on every side by symmetry. So
// each row is in at most 2 balls (no triangles), and two balls share a row iff their corners are
// the ends of one side (the midpoint is 2 from both). Edges: the 8 sides. Two 4-cycles sharing
// node (4, 4): b0 = 1, b1 = 8 − 7 + 1 − 0 = 2 = cycleRank.
//
// For 1 ≤ r < 2 the side midpoints are 2 from both ends, so they become landmarks too (they are
// pairwise at least √8 > r apart, and the quarter points are within 1 of a corner listed earlier).
// Each midpoint's ball shares a quarter point with each end's ball, and no row lies within r < 2 of
// three landmarks (e.g. (3, 4): 1 from (4, 4) and from (2, 4), √5 from (4, 2)). Two 8-cycles sharing
// (4, 4): V = 15, E = 16, b1 = 2. So b1 = 2 on all of [1, 4).
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { buildCover } from "../../../src/core/index.ts";
import { allLists } from "../support/bruteForce.ts";
import { independentNerve } from "../support/gf2Betti.ts";
import { parsedTable } from "../support/parsedTable.ts";

const corners = [[0, 0], [4, 0], [4, 4], [0, 4], [8, 4], [8, 8], [4, 8]];

function squareBoundary(x0: number, y0: number): number[][] {
  const points: number[][] = [];
  for (let t = 0; t < 4; ++t) points.push([x0 + t, y0], [x0 + 4, y0 + t], [x0 + 4 - t, y0 + 4], [x0, y0 + 4 - t]);
  return points;
}

const key = (p: readonly number[]): string => p.join(",");
const cornerKeys = new Set(corners.map(key));
const rest = [...new Map([...squareBoundary(0, 0), ...squareBoundary(4, 4)].map((p) => [key(p), p] as const)).values()].filter((p) => !cornerKeys.has(key(p)));

const build = (others: number[][], radius: number) =>
  buildCover(parsedTable(["x", "y"], [...corners, ...others]), { features: ["x", "y"], scale: "none", metric: "euclidean", radius, landmarks: "greedy-file-order", seed: 1 });

// Radii k/8 in [1, 4), with the exact ties r = 1, 2, 3 among them.
const radius = fc.integer({ min: 8, max: 31 }).map((k) => k / 8);
const anyOrder = fc.shuffledSubarray(rest, { minLength: rest.length, maxLength: rest.length });

describe("a figure-eight: two square outlines sharing a corner", () => {
  it("the sample has 31 points: 7 corners and 24 others", () => {
    expect(corners.length + rest.length).toBe(31); // worked by hand: 16 + 16 − 1
  });

  it("for 2 ≤ r < 4: the 7 corners are the nodes, the 8 sides the edges, b0 = 1, b1 = 2 = cycleRank, in any order of the other points", () => {
    fc.assert(
      fc.property(radius.filter((r) => r >= 2), anyOrder, (r, others) => {
        const result = build(others, r);
        expect(Array.from(result.landmarks)).toEqual([0, 1, 2, 3, 4, 5, 6]); // worked by hand
        const sides = [[0, 1], [0, 3], [1, 2], [2, 3], [2, 4], [2, 6], [4, 5], [5, 6]]; // corner rows joined by a side, sorted
        expect(Array.from(result.edges.source, (a, e) => [a, result.edges.target[e]])).toEqual(sides); // worked by hand
        expect(result.betti).toEqual({ b0: 1, b1: 2 }); // worked by hand
        expect(result.cycleRank).toBe(2); // worked by hand: 8 − 7 + 1
      }),
    );
  });

  it("for 1 ≤ r < 2: the 7 corners and 8 side midpoints are the nodes, 16 edges, b1 = 2 = cycleRank", () => {
    fc.assert(
      fc.property(radius.filter((r) => r < 2), anyOrder, (r, others) => {
        const result = build(others, r);
        expect(result.landmarks.length).toBe(15); // worked by hand
        expect(result.edges.source.length).toBe(16); // worked by hand
        expect(result.betti).toEqual({ b0: 1, b1: 2 }); // worked by hand
        expect(result.cycleRank).toBe(2); // worked by hand: 16 − 15 + 1
      }),
    );
  });

  it("b1 agrees with the independent GF(2) computation at every radius tried", () => {
    fc.assert(
      fc.property(radius, anyOrder, (r, others) => {
        const result = build(others, r);
        const independent = independentNerve(allLists(result.members));
        expect(result.betti!.b1).toBe(independent.b1);
        expect(independent.b1).toBe(2); // worked by hand, see the header
      }),
    );
  });
});
