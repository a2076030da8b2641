import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { overlapEdges, rowsToNodes } from "../../../src/core/index.ts";
import { plainEdges } from "./support/plainSearch.ts";

/** Balls over `rows` rows: each a sorted set of distinct rows. */
const ballsArbitrary = fc
  .record({ rows: fc.integer({ min: 1, max: 40 }), nodes: fc.integer({ min: 0, max: 30 }) })
  .chain(({ rows, nodes }) => fc.tuple(fc.constant(rows), fc.array(fc.uniqueArray(fc.integer({ min: 0, max: rows - 1 }), { maxLength: rows }), { minLength: nodes, maxLength: nodes })));

describe("overlapEdges by dense counters", () => {
  it("gives the plain pairwise count, sorted by (source, target), with and without the members argument", () => {
    fc.assert(
      fc.property(ballsArbitrary, ([rows, raw]) => {
        const balls = raw.map((ball) => [...ball].sort((a, b) => a - b));
        const offsets = Uint32Array.from([0, ...balls.map((_, k) => balls.slice(0, k + 1).reduce((s, b) => s + b.length, 0))]);
        const members = { offsets, items: Uint32Array.from(balls.flat()) };
        const rowNodes = rowsToNodes(members, rows);
        const plain = (e: { source: Uint32Array; target: Uint32Array; shared: Uint32Array }) => ({ source: Array.from(e.source), target: Array.from(e.target), shared: Array.from(e.shared) });
        expect(plain(overlapEdges(rowNodes, balls.length))).toEqual(plainEdges(balls));
        expect(plain(overlapEdges(rowNodes, balls.length, members))).toEqual(plainEdges(balls));
      }),
      { numRuns: 300 },
    );
  });

  it("past 2,048 nodes (counted node by node instead of in a matrix) gives the same edges as counting pairs row by row", () => {
    fc.assert(
      fc.property(fc.integer({ min: 2049, max: 2300 }), fc.array(fc.uniqueArray(fc.integer({ min: 0, max: 2299 }), { maxLength: 12 }), { minLength: 1, maxLength: 30 }), (nodes, rowLists) => {
        const lists = rowLists.map((list) => list.filter((k) => k < nodes).sort((a, b) => a - b));
        const rowNodes = { offsets: Uint32Array.from([0, ...lists.map((_, i) => lists.slice(0, i + 1).reduce((s, l) => s + l.length, 0))]), items: Uint32Array.from(lists.flat()) };
        const counts = new Map<number, number>();
        for (const list of lists) for (let s = 0; s < list.length; ++s) for (let t = s + 1; t < list.length; ++t) counts.set(list[s]! * nodes + list[t]!, (counts.get(list[s]! * nodes + list[t]!) ?? 0) + 1);
        const keys = [...counts.keys()].sort((a, b) => a - b);
        const edges = overlapEdges(rowNodes, nodes);
        expect([Array.from(edges.source), Array.from(edges.target), Array.from(edges.shared)]).toEqual([keys.map((k) => Math.floor(k / nodes)), keys.map((k) => k % nodes), keys.map((k) => counts.get(k)!)]);
      }),
      { numRuns: 50 },
    );
  });

  it("the JSDoc example: balls {0, 1} and {1, 2} share one row", () => {
    const edges = overlapEdges(rowsToNodes({ offsets: Uint32Array.of(0, 2, 4), items: Uint32Array.of(0, 1, 1, 2) }, 3), 2);
    expect([Array.from(edges.source), Array.from(edges.target), Array.from(edges.shared)]).toEqual([[0], [1], [1]]); // worked by hand
  });
});
