// nerveLoops (fan triangles, discrete Morse matching, reduction of the Morse boundary) must give
// nerveBetti's b0 and b1, which lists every triangle and reduces the full boundary matrix.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { components, nerveBetti, nerveTriangles, overlapEdges, type CompressedLists } from "../../../src/core/index.ts";
import { nerveLoops, nerveLoopsWithSlots } from "../../../src/core/nerve/nerveLoops.ts";
import { rankOfSortedColumns } from "../../../src/core/nerve/sortedColumnRank.ts";
import { gf2Rank } from "../support/gf2Betti.ts";

/** Row → nodes lists (each row's nodes sorted, duplicates dropped) from plain arrays. */
const rowLists = (rows: readonly (readonly number[])[]): CompressedLists => {
  const sorted = rows.map((r) => [...new Set(r)].sort((a, b) => a - b));
  const offsets = Uint32Array.from([0, ...sorted.map((r) => r.length)].map((_, i, all) => all.slice(0, i + 1).reduce((a, b) => a + b, 0)));
  return { offsets, items: Uint32Array.from(sorted.flat()) };
};

function both(rows: readonly (readonly number[])[], nodes: number) {
  const rowNodes = rowLists(rows);
  const edges = overlapEdges(rowNodes, nodes);
  const { count } = components(nodes, edges.source, edges.target);
  const full = nerveBetti(nodes, edges, count, nerveTriangles(rowNodes, nodes));
  return {
    fast: nerveLoops(rowNodes, nodes, edges, count),
    packed: nerveLoopsWithSlots(rowNodes, nodes, edges, count, {}, "packed"),
    byEdge: nerveLoopsWithSlots(rowNodes, nodes, edges, count, {}, "edges"),
    full: { b0: full.b0, b1: full.b1 },
  };
}

/** Random covers: `nodes` balls, rows each in 1..maxBalls of them. */
const covers = (maxNodes: number, maxBalls: number, maxRows: number) =>
  fc.integer({ min: 1, max: maxNodes }).chain((nodes) => fc.tuple(fc.constant(nodes), fc.array(fc.array(fc.integer({ min: 0, max: nodes - 1 }), { minLength: 1, maxLength: maxBalls }), { minLength: 0, maxLength: maxRows })));

describe("nerveLoops", () => {
  it("three balls overlapping in pairs with no common row: b0 = 1, b1 = 1 (a hollow triangle)", () => {
    expect(both([[0, 1], [1, 2], [0, 2]], 3).fast).toEqual({ b0: 1, b1: 1 }); // worked by hand: E − V + b0 − 0 = 3 − 3 + 1
  });

  it("the same three balls with one row in all three: b1 = 0 (the triangle is filled)", () => {
    expect(both([[0, 1], [1, 2], [0, 2], [0, 1, 2]], 3).fast).toEqual({ b0: 1, b1: 0 }); // worked by hand: rank ∂2 = 1
  });

  it("the hollow octahedron (8 triangles, every edge in two) has b1 = 0, and two disjoint hollow triangles have b0 = 2, b1 = 2", () => {
    // octahedron vertices 0/1, 2/3, 4/5 opposite; its 8 faces as rows: a 2-sphere, H1 = 0 (worked by hand: E − V + 1 = 12 − 6 + 1 = 7 = rank ∂2, since 8 faces sum to zero)
    const faces = [0, 1].flatMap((a) => [2, 3].flatMap((b) => [4, 5].map((c) => [a, b, c])));
    expect(both(faces, 6).fast).toEqual({ b0: 1, b1: 0 });
    expect(both([[0, 1], [1, 2], [0, 2], [3, 4], [4, 5], [3, 5]], 6).fast).toEqual({ b0: 2, b1: 2 }); // worked by hand
  });

  it("the path 0–2–1 (node 1's only neighbour is above it: two critical nodes, one component) has b0 = 1, b1 = 0", () => {
    // worked by hand: c0 = 2 (nodes 0 and 1 have no lower neighbour); edge 0–2 goes with node 2 (its lowest neighbour);
    // edge 1–2 has no triangle and is not node 2's lowest: critical, c1 = 1; rank ∂2ᴹ = 0: b1 = c1 − (c0 − b0) = 1 − (2 − 1) = 0
    expect(both([[0, 2], [1, 2]], 3).fast).toEqual({ b0: 1, b1: 0 });
  });

  it("a square 0–1–2–3 with one diagonal row {0, 1, 2} filled and the other half hollow has b1 = 1", () => {
    // rows {0,1,2} (a filled triangle), {2,3}, {0,3}: edges 01, 02, 12, 23, 03; triangle 012 only: b1 = 5 − 4 + 1 − 1 = 1 (worked by hand)
    expect(both([[0, 1, 2], [2, 3], [0, 3]], 4).fast).toEqual({ b0: 1, b1: 1 });
  });

  it("equals nerveBetti's b0 and b1 on random covers (rows in 1..6 of up to 12 balls), with either kind of slot", () => {
    fc.assert(
      fc.property(covers(12, 6, 40), ([nodes, rows]) => {
        const { fast, packed, byEdge, full } = both(rows, nodes);
        expect(fast).toEqual(full);
        expect(packed).toEqual(full);
        expect(byEdge).toEqual(full);
      }),
      { numRuns: 500 },
    );
  });

  it("equals nerveBetti's b0 and b1 on larger random covers (rows in 1..9 of up to 40 balls), where flows hold several edges", () => {
    fc.assert(
      fc.property(covers(40, 9, 120), ([nodes, rows]) => {
        const { packed, byEdge, full } = both(rows, nodes);
        expect(packed).toEqual(full);
        expect(byEdge).toEqual(full);
      }),
      { numRuns: 150 },
    );
  });

  it("does not depend on the order of the rows (b1 of a cover is a property of its sets)", () => {
    fc.assert(
      fc.property(covers(20, 6, 60), fc.integer(), ([nodes, rows], seed) => {
        const shuffled = [...rows].sort((x, y) => ((x.length * 31 + (x[0] ?? 0) + seed) % 7) - ((y.length * 31 + (y[0] ?? 0) + seed) % 7));
        expect(both(shuffled, nodes).fast).toEqual(both(rows, nodes).fast);
      }),
      { numRuns: 100 },
    );
  });

  it("stops with Cancelled when asked to", () => {
    const rows = Array.from({ length: 200 }, (_, i) => [i % 70, (i * 7) % 70, (i * 13) % 70]);
    const rowNodes = rowLists(rows);
    const edges = overlapEdges(rowNodes, 70);
    expect(() => nerveLoops(rowNodes, 70, edges, 1, { shouldStop: () => true })).toThrow(/cancel/i);
  });
});

describe("rankOfSortedColumns", () => {
  it("equals Gaussian elimination (the tests' gf2Rank) on random sparse columns", () => {
    fc.assert(
      fc.property(fc.array(fc.uniqueArray(fc.integer({ min: 0, max: 19 }), { minLength: 1, maxLength: 6 }), { maxLength: 50 }), (columns) => {
        const sorted = columns.map((c) => [...c].sort((a, b) => a - b));
        const items = Int32Array.from(sorted.flat());
        let end = 0;
        const ends = Int32Array.from(sorted, (c) => (end += c.length));
        expect(rankOfSortedColumns(items, ends, 20)).toBe(gf2Rank(20, sorted.length, sorted));
      }),
      { numRuns: 500 },
    );
  });

  it("the columns {0, 1}, {1, 2}, {0, 2} have rank 2 (they sum to zero)", () => {
    expect(rankOfSortedColumns(Int32Array.of(0, 1, 1, 2, 0, 2), Int32Array.of(2, 4, 6), 3)).toBe(2); // worked by hand
  });
});
