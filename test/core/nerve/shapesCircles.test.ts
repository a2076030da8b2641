import { nerveTriangles } from "../../../src/core/nerve/nerveTriangles.ts";
import { rowsToNodes } from "../../../src/core/lists/compressedLists.ts";
// Sampled circles: N evenly spaced points on a unit circle, unscaled, Euclidean, greedy in file
// order (point k at angle 2πk/N is row k), built with buildCover (scale "none").
//
// Derivation. The chord between points m steps apart is c(m) = 2 sin(πm/N), increasing for
// m = 0..N/2. For c(k) ≤ r < c(k + 1) with k + 1 ≤ N/2, exactly the points at most k steps away
// are within r, so every ball is an arc of 2k + 1 consecutive points.
//  - Landmarks: 0, k + 1, 2(k + 1), …, (L − 1)(k + 1) with L = ⌊N/(k + 1)⌋. The point m(k + 1) is
//    k + 1 steps past the previous landmark and N − m(k + 1) steps before point 0 (going on round
//    the circle), so it is a landmark iff N − m(k + 1) ≥ k + 1. Points in between are within k steps
//    of the landmark before them; after the last landmark p the gap to point 0 is
//    g = N − p = (k + 1) + (N mod (k + 1)) ≤ 2k + 1, so every point there is within k steps of p or of 0.
//  - Overlaps: consecutive landmarks (k + 1 apart) share the k points between them. The last and
//    the first are g apart and share 2k + 1 − g points: at least one iff g ≤ 2k iff N mod (k + 1) ≠ k.
//    Landmarks two or more places apart along the cycle are at least 2k + 2 steps apart: their arcs
//    are disjoint. So, for L ≥ 4, the graph is the cycle of L nodes when N mod (k + 1) ≠ k, and a
//    path of L nodes when N mod (k + 1) = k (the sample is covered, but the last and first balls
//    share no row: a property of this sample and radius, not of the circle).
//  - No triangles for L ≥ 4: a row in three balls needs three pairwise adjacent nodes, and a cycle
//    or path of four or more nodes has none. More generally no spurious loop can arise on a sampled
//    curve: balls are arcs of consecutive samples; arcs that do not together wrap the whole circle
//    are integer intervals after cutting the circle at an uncovered point, and pairwise-overlapping
//    integer intervals share a common integer (Helly's theorem in one dimension), i.e. a common
//    row, so every triangle of the graph is filled; only a chain of arcs all the way round the
//    circle leaves an unfilled loop, the circle's own.
// Hence b0 = 1, b1 = 1 = cycleRank, L nodes, whenever L = ⌊N/(k + 1)⌋ ≥ 4 and N mod (k + 1) ≠ k.
// For even N and k = 1 (s = c(1) ≤ r < c(2)) this is the cycle of N/2 nodes.
//
// Floating point: r is drawn from [c(k) + δ, c(k + 1) − δ] with δ = 1% of c(k + 1) − c(k)
// (≥ 7e-4 for N ≤ 60 and k ≤ N/4), far above the ~1e-15 error of the computed chords.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { buildCover, type CoverResult } from "../../../src/core/index.ts";
import { circlePoints, chord } from "../support/circlePoints.ts";
import { independentNerve } from "../support/gf2Betti.ts";
import { allLists } from "../support/bruteForce.ts";
import { parsedTable } from "../support/parsedTable.ts";

function build(points: number[][], radius: number): CoverResult {
  return buildCover(parsedTable(["x", "y"], points), { features: ["x", "y"], scale: "none", metric: "euclidean", radius, landmarks: "greedy-file-order", seed: 1 });
}

/** A radius strictly inside [c(k), c(k + 1)): c(k) + t · (c(k + 1) − c(k)) for t in [0.01, 0.99]. */
const radiusBetween = (k: number, n: number, t: number): number => chord(k, n) + t * (chord(k + 1, n) - chord(k, n));
const fraction = fc.integer({ min: 1, max: 99 }).map((p) => p / 100);

const summary = (result: CoverResult) => ({
  nodes: result.landmarks.length,
  edges: result.edges.source.length,
  b0: result.betti!.b0,
  b1: result.betti!.b1,
  triangles: nerveTriangles(rowsToNodes(result.members, result.rowsRead), result.landmarks.length).length / 3,
  cycleRank: result.cycleRank,
});

// (N, k) with L = ⌊N/(k + 1)⌋ ≥ 4, split by whether the last and first balls overlap.
const steps = fc.record({ n: fc.integer({ min: 12, max: 60 }), k: fc.integer({ min: 1, max: 5 }) }).filter(({ n, k }) => Math.floor(n / (k + 1)) >= 4);
const closing = steps.filter(({ n, k }) => n % (k + 1) !== k);
const opening = steps.filter(({ n, k }) => n % (k + 1) === k);

describe("one sampled circle", () => {
  it("N even ≥ 12 and c(1) ≤ r < c(2): a cycle of N/2 nodes, b0 = 1, b1 = 1 = cycleRank, no triangles", () => {
    fc.assert(
      fc.property(fc.integer({ min: 6, max: 30 }), fraction, (half, t) => {
        const n = 2 * half;
        const result = build(circlePoints(n), radiusBetween(1, n, t));
        expect(summary(result)).toEqual({ nodes: half, edges: half, b0: 1, b1: 1, triangles: 0, cycleRank: 1 }); // worked by hand, see the header
      }),
    );
  });

  it("c(k) ≤ r < c(k + 1) with L = ⌊N/(k + 1)⌋ ≥ 4 and N mod (k + 1) ≠ k: L nodes in one cycle, b0 = 1, b1 = 1 = cycleRank", () => {
    fc.assert(
      fc.property(closing, fraction, ({ n, k }, t) => {
        const result = build(circlePoints(n), radiusBetween(k, n, t));
        const nodes = Math.floor(n / (k + 1));
        expect(Array.from(result.landmarks)).toEqual(Array.from({ length: nodes }, (_, m) => m * (k + 1))); // worked by hand
        expect(summary(result)).toEqual({ nodes, edges: nodes, b0: 1, b1: 1, triangles: 0, cycleRank: 1 }); // worked by hand
      }),
    );
  });

  it("when N mod (k + 1) = k the last and first balls share no row: a path, b1 = 0 (a property of the sample)", () => {
    fc.assert(
      fc.property(opening, fraction, ({ n, k }, t) => {
        const result = build(circlePoints(n), radiusBetween(k, n, t));
        const nodes = Math.floor(n / (k + 1));
        expect(summary(result)).toEqual({ nodes, edges: nodes - 1, b0: 1, b1: 0, triangles: 0, cycleRank: 0 }); // worked by hand
      }),
    );
  });

  it("N = 13, c(1) ≤ r < c(2): landmarks 0, 2, …, 10; balls {9, 10, 11} and {0, 1, 12} leave the circle open", () => {
    const result = build(circlePoints(13), radiusBetween(1, 13, 0.5));
    expect(Array.from(result.landmarks)).toEqual([0, 2, 4, 6, 8, 10]); // worked by hand: 13 mod 2 = 1 = k
    expect(allLists(result.members)[0]).toEqual([0, 1, 12]); // worked by hand
    expect(allLists(result.members)[5]).toEqual([9, 10, 11]); // worked by hand
    expect(result.betti!.b1).toBe(0); // worked by hand: a path of 6 nodes
  });

  it("N = 24: b1 = 1 for every r in [c(1), c(4)) ≈ [0.261, 1), b1 = 0 on [c(4), c(5)) ≈ [1, 1.218), b1 = 1 on [c(5), c(6)) ≈ [1.218, 1.414)", () => {
    // 24 mod 2 = 24 mod 3 = 24 mod 4 = 0 (k = 1, 2, 3: cycles of 12, 8, 6); 24 mod 5 = 4 = k (k = 4: a path
    // of 4); 24 mod 6 = 0 (k = 5: a cycle of 4). c(4) = 2 sin(π/6) = 1, c(6) = 2 sin(π/4) = √2 (worked by hand).
    const b1At = (k: number, t: number): number => build(circlePoints(24), radiusBetween(k, 24, t)).betti!.b1;
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 5 }), fraction, (k, t) => {
        expect(b1At(k, t)).toBe(k === 4 ? 0 : 1); // worked by hand
      }),
    );
    expect([1, 2, 3, 5].map((k) => build(circlePoints(24), radiusBetween(k, 24, 0.5)).landmarks.length)).toEqual([12, 8, 6, 4]); // worked by hand: ⌊24/(k + 1)⌋
  });

  it("the radii used lie between the chords with a margin of at least 7e-4", () => {
    fc.assert(
      fc.property(steps, fraction, ({ n, k }, t) => {
        const r = radiusBetween(k, n, t);
        expect(r - chord(k, n)).toBeGreaterThan(7e-4); // worked by hand: the smallest gap, N = 60 and k = 1, is c(2) − c(1) ≈ 0.104, 1% of it 1.04e-3
        expect(chord(k + 1, n) - r).toBeGreaterThan(7e-4); // worked by hand, as above
      }),
    );
  });
});

describe("two sampled circles far apart", () => {
  // Centres (0, 0) and (10, 0): every point of one is at least 10 − 2 = 8 from every point of the
  // other, and r < c(k + 1) ≤ 2, so no ball reaches across. The first circle's rows come first in the
  // file; on the second circle no earlier landmark is within r, so greedy repeats the same pattern
  // there, with landmark rows shifted by N. Two disjoint cycles: b0 = 2, b1 = 2 = cycleRank.
  it("c(k) ≤ r < c(k + 1) with L ≥ 4 and N mod (k + 1) ≠ k: 2L nodes, b0 = 2, b1 = 2 = cycleRank", () => {
    fc.assert(
      fc.property(closing, fraction, ({ n, k }, t) => {
        const result = build([...circlePoints(n), ...circlePoints(n, 10, 0)], radiusBetween(k, n, t));
        const nodes = Math.floor(n / (k + 1));
        expect(summary(result)).toEqual({ nodes: 2 * nodes, edges: 2 * nodes, b0: 2, b1: 2, triangles: 0, cycleRank: 2 }); // worked by hand
        expect(result.componentCount).toBe(2); // worked by hand
        expect(Array.from(result.component)).toEqual([...new Array<number>(nodes).fill(0), ...new Array<number>(nodes).fill(1)]); // worked by hand
      }),
    );
  });

  it("N = 12 on each, c(1) ≤ r < c(2): two 6-cycles whose b1 agrees with the independent GF(2) computation", () => {
    const result = build([...circlePoints(12), ...circlePoints(12, 10, 0)], radiusBetween(1, 12, 0.5));
    const independent = independentNerve(allLists(result.members));
    expect(independent.b1).toBe(2); // worked by hand
    expect(result.betti).toEqual({ b0: independent.b0, b1: independent.b1 });
  });
});
