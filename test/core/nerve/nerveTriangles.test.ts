import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { createRowIndex, landmarkBalls, ballMembership, metrics, nerveTriangles, rowsToNodes, type CompressedLists, type Metric } from "../../../src/core/index.ts";
import { allLists } from "../support/bruteForce.ts";
import { definedRows, radiusFor } from "../support/definedTable.ts";
import { gridTable } from "../support/gridTable.ts";

const lists = (rows: number[][]): CompressedLists => {
  const offsets = new Uint32Array(rows.length + 1);
  rows.forEach((row, i) => (offsets[i + 1] = offsets[i]! + row.length));
  return { offsets, items: Uint32Array.from(rows.flat()) };
};

const triples = (flat: Uint32Array): number[][] => Array.from({ length: flat.length / 3 }, (_, t) => Array.from(flat.subarray(3 * t, 3 * t + 3)));

describe("nerveTriangles", () => {
  it("a row in nodes 0, 1, 2, 3 gives the four triples 012, 013, 023, 123, sorted", () => {
    expect(triples(nerveTriangles(lists([[0, 1, 2, 3]]), 4))).toEqual([[0, 1, 2], [0, 1, 3], [0, 2, 3], [1, 2, 3]]); // worked by hand: C(4, 3)
  });

  it("a triple shared by several rows is listed once, and rows in fewer than three nodes add none", () => {
    expect(triples(nerveTriangles(lists([[1, 2, 4], [0], [1, 2, 4], [0, 3], [0, 2, 3]]), 5))).toEqual([[0, 2, 3], [1, 2, 4]]); // worked by hand
  });

  it("no rows give no triangles", () => {
    expect(nerveTriangles(lists([]), 0).length).toBe(0); // worked by hand
  });

  it("lists exactly the node triples whose balls share a row, on random tables under every metric and rule", () => {
    const cases = fc
      .constantFrom(...(Object.values(metrics) as Metric[]))
      .chain((metric) =>
        fc.record({ metric: fc.constant(metric), table: gridTable.map((t) => definedRows(t, metric)), radius: radiusFor(metric), rule: fc.constantFrom("greedy-file-order" as const, "greedy-shuffled" as const, "maximin" as const), seed: fc.integer({ min: -99, max: 99 }) }),
      );
    fc.assert(
      fc.property(cases, ({ metric, table, radius, rule, seed }) => {
        const landmarks = landmarkBalls(createRowIndex(table, metric), radius, rule, seed).landmarks;
        const members = ballMembership(table, metric, radius, landmarks);
        const balls = allLists(members).map((ball) => new Set(ball));
        const expected: number[][] = [];
        for (let a = 0; a < balls.length; ++a)
          for (let b = a + 1; b < balls.length; ++b)
            for (let c = b + 1; c < balls.length; ++c) if ([...balls[a]!].some((row) => balls[b]!.has(row) && balls[c]!.has(row))) expected.push([a, b, c]);
        expect(triples(nerveTriangles(rowsToNodes(members, table.rows), landmarks.length))).toEqual(expected);
      }),
    );
  });
});
