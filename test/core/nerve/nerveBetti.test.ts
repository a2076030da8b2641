// nerveBetti on hand-made complexes, and against an independent dense GF(2) elimination
// (test/core/support/gf2Betti.ts) on random complexes.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { nerveBetti, type EdgeList } from "../../../src/core/index.ts";
import { bfsComponents } from "../support/bruteForce.ts";
import { gf2Rank } from "../support/gf2Betti.ts";

/** Edges from pairs (any order), sorted a < b as overlapEdges returns them; weights 1. */
function edgeList(pairs: readonly (readonly [number, number])[]): EdgeList {
  const sorted = pairs.map(([a, b]): [number, number] => (a < b ? [a, b] : [b, a])).sort((p, q) => p[0] - q[0] || p[1] - q[1]);
  return { source: Uint32Array.from(sorted, (p) => p[0]), target: Uint32Array.from(sorted, (p) => p[1]), shared: new Uint32Array(sorted.length).fill(1) };
}

const flat = (triangles: readonly (readonly [number, number, number])[]): Uint32Array => Uint32Array.from(triangles.flat());

describe("nerveBetti by hand", () => {
  it("a hollow triangle (3 nodes, 3 edges, no triangle) has b0 = 1, b1 = 1", () => {
    expect(nerveBetti(3, edgeList([[0, 1], [0, 2], [1, 2]]), 1, flat([]))).toEqual({ b0: 1, b1: 1, triangles: 0, boundaryRank: 0 }); // worked by hand: 3 − 3 + 1 − 0
  });

  it("a filled triangle has b1 = 0 (the JSDoc example)", () => {
    expect(nerveBetti(3, edgeList([[0, 1], [0, 2], [1, 2]]), 1, flat([[0, 1, 2]]))).toEqual({ b0: 1, b1: 0, triangles: 1, boundaryRank: 1 }); // worked by hand: 3 − 3 + 1 − 1
  });

  it("the boundary of a tetrahedron (4 triangles) has rank ∂2 = 3 and b1 = 0: the fourth triangle is the GF(2) sum of the other three", () => {
    const edges = edgeList([[0, 1], [0, 2], [0, 3], [1, 2], [1, 3], [2, 3]]);
    expect(nerveBetti(4, edges, 1, flat([[0, 1, 2], [0, 1, 3], [0, 2, 3], [1, 2, 3]]))).toEqual({ b0: 1, b1: 0, triangles: 4, boundaryRank: 3 }); // worked by hand: 6 − 4 + 1 − 3
  });

  it("two hollow triangles sharing node 2 (a bow tie) have b1 = 2; filling one leaves b1 = 1", () => {
    const edges = edgeList([[0, 1], [0, 2], [1, 2], [2, 3], [2, 4], [3, 4]]);
    expect(nerveBetti(5, edges, 1, flat([])).b1).toBe(2); // worked by hand: 6 − 5 + 1
    expect(nerveBetti(5, edges, 1, flat([[2, 3, 4]])).b1).toBe(1); // worked by hand: 6 − 5 + 1 − 1
  });

  it("a square 0–1–2–3 with diagonal 0–2 and only triangle 0, 1, 2 filled has b1 = 1", () => {
    const edges = edgeList([[0, 1], [1, 2], [2, 3], [0, 3], [0, 2]]);
    expect(nerveBetti(4, edges, 1, flat([[0, 1, 2]]))).toEqual({ b0: 1, b1: 1, triangles: 1, boundaryRank: 1 }); // worked by hand: 5 − 4 + 1 − 1
  });

  it("no nodes, and isolated nodes only, give b1 = 0", () => {
    expect(nerveBetti(0, edgeList([]), 0, flat([]))).toEqual({ b0: 0, b1: 0, triangles: 0, boundaryRank: 0 }); // worked by hand: the empty complex
    expect(nerveBetti(3, edgeList([]), 3, flat([]))).toEqual({ b0: 3, b1: 0, triangles: 0, boundaryRank: 0 }); // worked by hand: 0 − 3 + 3
  });

  it("throws, naming 1-based nodes, for a triangle with a side that is not an edge", () => {
    expect(() => nerveBetti(3, edgeList([[0, 2], [1, 2]]), 1, flat([[0, 1, 2]]))).toThrow("triangle side without an edge: 1-2");
  });
});

// Random 2-dimensional simplicial complexes on 3..10 nodes: each node pair is an edge with a
// random probability of 30..100%, then each triangle whose three sides are edges is kept with a
// random probability of 0..100%. (Measured with fc.statistics while writing: about half the cases
// have triangles, an eighth have 15 or more.)
const complex = fc
  .record({ nodes: fc.integer({ min: 3, max: 10 }), edgeDensity: fc.integer({ min: 3, max: 10 }), triangleDensity: fc.integer({ min: 0, max: 10 }) })
  .chain(({ nodes, edgeDensity, triangleDensity }) => {
    const pairs: [number, number][] = [];
    for (let a = 0; a < nodes; ++a) for (let b = a + 1; b < nodes; ++b) pairs.push([a, b]);
    const tenths = (length: number) => fc.array(fc.integer({ min: 0, max: 9 }), { minLength: length, maxLength: length });
    return tenths(pairs.length).chain((draws) => {
      const edges = pairs.filter((_, e) => draws[e]! < edgeDensity);
      const has = new Set(edges.map(([a, b]) => `${a},${b}`));
      const candidates: [number, number, number][] = [];
      for (const [a, b] of edges) for (let c = b + 1; c < nodes; ++c) if (has.has(`${a},${c}`) && has.has(`${b},${c}`)) candidates.push([a, b, c]);
      return tenths(candidates.length).map((keep) => ({ nodes, edges, triangles: candidates.filter((_, t) => keep[t]! < triangleDensity) }));
    });
  });

describe("nerveBetti against an independent GF(2) computation", () => {
  it("rank ∂2 and b1 = E − V + b0 − rank ∂2 equal those of dense Gaussian elimination on random complexes", () => {
    fc.assert(
      fc.property(complex, ({ nodes, edges, triangles }) => {
        const list = edgeList(edges);
        const index = new Map(Array.from(list.source, (a, e) => [`${a},${list.target[e]}`, e] as const));
        const columns = triangles.map(([a, b, c]) => [index.get(`${a},${b}`)!, index.get(`${a},${c}`)!, index.get(`${b},${c}`)!]);
        const rank = gf2Rank(edges.length, triangles.length, columns); // independent: textbook elimination on bit rows
        const b0 = bfsComponents(nodes, list.source, list.target).count;
        const result = nerveBetti(nodes, list, b0, flat(triangles));
        expect(result).toEqual({ b0, b1: edges.length - nodes + b0 - rank, triangles: triangles.length, boundaryRank: rank });
        expect(result.b1).toBeGreaterThanOrEqual(0); // rank ∂2 ≤ dim ker ∂1, since ∂1 ∂2 = 0 (from memory)
      }),
    );
  });

  it("the rank does not depend on the order in which triangles are listed", () => {
    fc.assert(
      fc.property(complex, fc.integer(), ({ nodes, edges, triangles }, salt) => {
        const list = edgeList(edges);
        const b0 = bfsComponents(nodes, list.source, list.target).count;
        const reordered = triangles.map((t, k) => [t, (k * 7919 + salt) % 1009] as const).sort((p, q) => p[1] - q[1]).map((p) => p[0]);
        expect(nerveBetti(nodes, list, b0, flat(reordered))).toEqual(nerveBetti(nodes, list, b0, flat(triangles)));
      }),
    );
  });

  it("gf2Rank itself: the identity 3 × 3 has rank 3, two equal columns rank 1, the tetrahedron boundary rank 3", () => {
    expect(gf2Rank(3, 3, [[0], [1], [2]])).toBe(3); // worked by hand
    expect(gf2Rank(3, 2, [[0, 2], [0, 2]])).toBe(1); // worked by hand
    // edges 01, 02, 03, 12, 13, 23 = 0..5; triangles 012, 013, 023, 123
    expect(gf2Rank(6, 4, [[0, 1, 3], [0, 2, 4], [1, 2, 5], [3, 4, 5]])).toBe(3); // worked by hand
    expect(gf2Rank(2, 40, Array.from({ length: 40 }, (_, k) => (k === 39 ? [1] : [])))).toBe(1); // a pivot in the second word
  });
});
