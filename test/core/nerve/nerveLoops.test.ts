// nerveLoops (spanning forest, fan triangles, peeling) must give nerveBetti's b0 and b1, which
// lists every triangle and reduces the full boundary matrix.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { components, nerveBetti, nerveTriangles, overlapEdges, type CompressedLists } from "../../../src/core/index.ts";
import { forEachFanTriangle } from "../../../src/core/nerve/fanTriangles.ts";
import { nerveLoops } from "../../../src/core/nerve/nerveLoops.ts";
import { gf2Rank } from "../support/gf2Betti.ts";
import { peeledRank } from "../../../src/core/nerve/peeledRank.ts";

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
  return { fast: nerveLoops(rowNodes, nodes, edges, count), full: { b0: full.b0, b1: full.b1 } };
}

/** Rank over GF(2) of the matrix whose columns list their 1-rows: gf2Rank, the tests' one GF(2) rank (independent of peeledRank). */
const gaussRank = (columns: readonly (readonly number[])[]): number => gf2Rank(Math.max(0, ...columns.flat().map((row) => row + 1)), columns.length, columns);

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

  it("equals nerveBetti's b0 and b1 on random covers (rows in 1..6 of up to 12 balls)", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 12 }).chain((nodes) => fc.tuple(fc.constant(nodes), fc.array(fc.array(fc.integer({ min: 0, max: nodes - 1 }), { minLength: 1, maxLength: 6 }), { minLength: 0, maxLength: 40 }))), ([nodes, rows]) => {
        const { fast, full } = both(rows, nodes);
        expect(fast).toEqual(full);
      }),
      { numRuns: 500 },
    );
  });

  it("peeledRank equals Gaussian elimination on random columns of up to three rows", () => {
    fc.assert(
      fc.property(fc.array(fc.uniqueArray(fc.integer({ min: 0, max: 14 }), { minLength: 1, maxLength: 3 }), { maxLength: 40 }), (columns) => {
        const flat = Int32Array.from(columns.flatMap((c) => [...c, ...Array.from({ length: 3 - c.length }, () => -1)]));
        expect(peeledRank(flat, 15)).toBe(gaussRank(columns));
      }),
      { numRuns: 500 },
    );
  });

  it("peeledRank of the columns {0, 1}, {1, 2}, {0, 2} is 2 (they sum to zero)", () => {
    expect(peeledRank(Int32Array.of(0, 1, -1, 1, 2, -1, 0, 2, -1), 3)).toBe(2); // worked by hand
  });

  it("a row in balls 0..3 gives the three fan triangles from node 0, once each however many rows repeat it", () => {
    const seen: number[][] = [];
    const count = forEachFanTriangle(rowLists([[0, 1, 2, 3], [0, 1, 2, 3]]), (a, b, c) => seen.push([a, b, c]));
    expect(count).toBe(3); // C(3, 2), worked by hand
    expect(seen).toEqual([[0, 1, 2], [0, 1, 3], [0, 2, 3]]); // worked by hand
  });
});
