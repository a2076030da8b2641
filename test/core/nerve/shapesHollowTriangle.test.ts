// Three balls that overlap in pairs with no row in all three: b1 = 1, although the points lie in
// a triangle, a contractible region, and the three discs themselves do share a region around the
// centroid. The loop is a property of the sample: no sampled row falls where all three balls meet.
// (It needs two dimensions: on a line, balls of one radius around a < b < c give A ∩ C =
// [c − r, a + r] ⊂ [b − r, b + r] = B, so a row shared by the outer two is in the middle one too.)
//
// Points, in file order: L0 = (0, 0), L1 = (12, 0), L2 = (6, 12) and the side midpoints
// M01 = (6, 0), M02 = (3, 6), M12 = (9, 6). Euclidean, unscaled; squared distances (worked by hand):
//   L0–L1 144, L0–L2 = L1–L2 180; L0–M01 = L1–M01 36; L0–M02 = L2–M02 = L1–M12 = L2–M12 45;
//   L2–M01 144; L1–M02 = L0–M12 117.
// For √45 ≤ r < √117 (≈ 6.71 to 10.82): the L's are pairwise more than r apart (≥ 12), so all three
// are landmarks; each midpoint is within r of the two ends of its side (√36, √45 ≤ r) and not of the
// opposite corner (√117, 12 > r). Balls {L0, M01, M02}, {L1, M01, M12}, {L2, M02, M12}: each pair
// shares one midpoint, no row is in all three. Graph: a triangle; b1 = 3 − 3 + 1 − 0 = 1 = cycleRank.
// Adding the centroid (6, 4), 52, 52 and 64 from the landmarks in squared distance, fills the
// loop for r ≥ 8 (see shapesFilledLoops.test.ts).
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { buildCover } from "../../../src/core/index.ts";
import { allLists } from "../support/bruteForce.ts";
import { independentNerve } from "../support/gf2Betti.ts";
import { parsedTable } from "../support/parsedTable.ts";

const points = [[0, 0], [12, 0], [6, 12], [6, 0], [3, 6], [9, 6]];

// Radii k/4 in [√45, √117): 6.75 .. 10.75.
const radius = fc.integer({ min: 27, max: 43 }).map((k) => k / 4);

describe("three balls overlapping in pairs only", () => {
  it("for √45 ≤ r < √117: balls {0, 3, 4}, {1, 3, 5}, {2, 4, 5}, three edges, no triangle, b1 = 1 = cycleRank", () => {
    fc.assert(
      fc.property(radius, (r) => {
        const result = buildCover(parsedTable(["x", "y"], points), { features: ["x", "y"], scale: "none", metric: "euclidean", radius: r, landmarks: "greedy-file-order", seed: 1 });
        expect(Array.from(result.landmarks)).toEqual([0, 1, 2]); // worked by hand
        expect(allLists(result.members)).toEqual([[0, 3, 4], [1, 3, 5], [2, 4, 5]]); // worked by hand
        expect(Array.from(result.edges.shared)).toEqual([1, 1, 1]); // worked by hand
        expect(result.betti).toEqual({ b0: 1, b1: 1 }); // worked by hand
        expect(result.cycleRank).toBe(1); // worked by hand
        expect(independentNerve(allLists(result.members)).b1).toBe(1); // worked by hand, as above
      }),
    );
  });

  it("at r = fl(√45) every midpoint is still covered; just below √45 (r = 6.7) M02 becomes a landmark and covers M12", () => {
    const at = (r: number) => buildCover(parsedTable(["x", "y"], points), { features: ["x", "y"], scale: "none", metric: "euclidean", radius: r, landmarks: "greedy-file-order", seed: 1 });
    expect(Math.sqrt(45) * Math.sqrt(45)).toBeGreaterThanOrEqual(45); // r² as the predicate computes it: 45.00000000000001, so the tie is inside
    expect(at(Math.sqrt(45)).landmarks.length).toBe(3); // worked by hand
    // 6.7² = 44.89 < 45: M02 = (3, 6) is within r of no corner → landmark; M12 = (9, 6) is 6 from M02 → covered.
    expect(Array.from(at(6.7).landmarks)).toEqual([0, 1, 2, 4]); // worked by hand
  });
});
