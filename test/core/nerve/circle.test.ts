// N evenly spaced points on the unit circle, point k at angle 2πk/N, N even and at least 6,
// unscaled, greedy net in file order.
//
// The chord between points m steps apart is c(m) = 2 sin(πm/N), increasing for m = 0..N/2.
// With s = c(1) ≤ r < c(2) exactly the points one step apart are within r.
// Net: point 0 is a landmark; point 1 is one step from 0, covered; point 2 is two steps from 0,
// so farther than r → landmark; point 3 is one step from 2, covered; and so on: every even point
// 2k is two or more steps from all earlier even landmarks and becomes one, every odd point is one
// step from the even point before it. The last point N − 1 is odd (N even) and one step from point 0.
// Landmarks: 0, 2, …, N − 2 in that order, so node k has landmark 2k and there are N/2 nodes.
// Ball of node k: the points at most one step from 2k, {2k − 1, 2k, 2k + 1} (indices mod N).
// Nodes k and k + 1 (mod N/2) share exactly point 2k + 1; nodes two or more apart share nothing,
// since their balls' points are at least one step apart. So the graph is a cycle of N/2 nodes,
// each edge of weight 1 (for N = 6 the cycle of 3 nodes is a triangle) and one component.
//
// Floating point: r is taken as the midpoint (c(1) + c(2)) / 2, so every computed squared chord
// is far (≥ ~1e-3 for N ≤ 120) from r², and no rounding can move a point across the boundary.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { ballMembership, components, euclidean, overlapEdges, rowsToNodes, type NumericTable } from "../../../src/core/index.ts";
import { greedyNet } from "../support/nets.ts";
import { allLists } from "../support/bruteForce.ts";

const circle = (n: number): NumericTable => {
  const values = new Float64Array(2 * n);
  for (let k = 0; k < n; ++k) {
    values[2 * k] = Math.cos((2 * Math.PI * k) / n);
    values[2 * k + 1] = Math.sin((2 * Math.PI * k) / n);
  }
  return { rows: n, columns: 2, names: ["x", "y"], values };
};

const evenN = fc.integer({ min: 3, max: 60 }).map((half) => 2 * half);
const midRadius = (n: number): number => (2 * Math.sin(Math.PI / n) + 2 * Math.sin((2 * Math.PI) / n)) / 2; // simple formula: midpoint of the chords c(1), c(2)

function build(n: number) {
  const table = circle(n);
  const radius = midRadius(n);
  const landmarks = greedyNet(table, euclidean, radius, Uint32Array.from({ length: n }, (_, i) => i));
  const members = ballMembership(table, euclidean, radius, landmarks);
  const edges = overlapEdges(rowsToNodes(members, n), landmarks.length);
  return { landmarks, members, edges };
}

describe("N points on a circle with c(1) ≤ r < c(2)", () => {
  it("the landmarks are the even-indexed points 0, 2, …, N − 2", () => {
    fc.assert(
      fc.property(evenN, (n) => {
        expect(Array.from(build(n).landmarks)).toEqual(Array.from({ length: n / 2 }, (_, k) => 2 * k)); // worked by hand
      }),
    );
  });

  it("node k's ball is {2k − 1, 2k, 2k + 1} (mod N), ascending", () => {
    fc.assert(
      fc.property(evenN, (n) => {
        const expected = Array.from({ length: n / 2 }, (_, k) => [(2 * k - 1 + n) % n, 2 * k, 2 * k + 1].sort((a, b) => a - b)); // worked by hand
        expect(allLists(build(n).members)).toEqual(expected);
      }),
    );
  });

  it("the graph is exactly a cycle of N/2 nodes, neighbours sharing exactly 1 row, in one component", () => {
    fc.assert(
      fc.property(evenN, (n) => {
        const half = n / 2;
        const { edges } = build(n);
        // Cycle edges k–(k + 1) and 0–(N/2 − 1), written a < b and sorted by (a, b).
        const pairs = [...Array.from({ length: half - 1 }, (_, k) => [k, k + 1]), [0, half - 1]].sort((p, q) => p[0]! - q[0]! || p[1]! - q[1]!); // worked by hand
        expect(Array.from(edges.source)).toEqual(pairs.map((p) => p[0]));
        expect(Array.from(edges.target)).toEqual(pairs.map((p) => p[1]));
        expect(Array.from(edges.shared)).toEqual(pairs.map(() => 1)); // worked by hand
        const parts = components(half, edges.source, edges.target);
        expect(parts.count).toBe(1);
      }),
    );
  });

  it("the chosen radius lies strictly between the one-step and two-step chords, far from both", () => {
    fc.assert(
      fc.property(evenN, (n) => {
        const table = circle(n);
        const r = midRadius(n);
        const one = euclidean.distance(table.values, 2, 0, 1);
        const two = euclidean.distance(table.values, 2, 0, 2);
        expect(r - one).toBeGreaterThan(1e-3);
        expect(two - r).toBeGreaterThan(1e-3);
      }),
    );
  });

  it("N = 6 gives the triangle 0–1, 0–2, 1–2 with balls {0, 1, 5}, {1, 2, 3}, {3, 4, 5}", () => {
    const { landmarks, members, edges } = build(6);
    expect(Array.from(landmarks)).toEqual([0, 2, 4]); // worked by hand
    expect(allLists(members)).toEqual([[0, 1, 5], [1, 2, 3], [3, 4, 5]]); // worked by hand
    expect([Array.from(edges.source), Array.from(edges.target), Array.from(edges.shared)]).toEqual([[0, 0, 1], [1, 2, 2], [1, 1, 1]]); // worked by hand
  });
});
