// The fast greedy variants against the one greedy loop (greedyBalls with one ball query per
// landmark, firstHit: false) on tables of a few thousand rows: the first-hit net (which
// greedyBalls switches to when ball queries prune badly) and the net tree's levels.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { createRowIndex, euclidean, manhattan, randomSource, visitOrder, type NumericTable } from "../../../src/core/index.ts";
import { greedyBalls } from "../../../src/core/landmark/greedyBalls.ts";
import { firstHitNet } from "../../../src/core/landmark/firstHitNet.ts";
import { createNetTree } from "../../../src/core/landmark/netTree.ts";
import { treeNet } from "../../../src/core/landmark/treeNet.ts";

/** rows × columns of quarters in −2..2 from a seeded generator: ties d = r are common. */
function quarters(rows: number, columns: number, seed: number): NumericTable {
  const random = randomSource(seed);
  const values = Float64Array.from({ length: rows * columns }, () => Math.round(16 * (random() - 0.5)) / 4);
  return { rows, columns, names: Array.from({ length: columns }, (_, j) => `c${j}`), values };
}

const sizes = fc.record({ rows: fc.integer({ min: 2000, max: 4000 }), columns: fc.integer({ min: 2, max: 12 }), seed: fc.integer({ min: 1, max: 1e6 }), shuffled: fc.boolean() });

describe("fast greedy variants equal the one greedy loop on 2,000 to 4,000 rows", () => {
  it("firstHitNet from the first row gives greedyBalls' landmarks, for Euclidean and Manhattan", () => {
    fc.assert(
      fc.property(sizes, ({ rows, columns, seed, shuffled }) => {
        const table = quarters(rows, columns, seed);
        const order = visitOrder(shuffled ? "greedy-shuffled" : "greedy-file-order", seed, rows);
        for (const metric of [euclidean, manhattan]) {
          const radius = columns / 2;
          const plain = greedyBalls(createRowIndex(table, metric), radius, order, { balls: false, firstHit: false }).landmarks;
          expect(Array.from(firstHitNet(createRowIndex(table, metric), radius, order))).toEqual(Array.from(plain));
        }
      }),
      { numRuns: 4 },
    );
  });

  it("treeNet's level gives greedyBalls' landmarks at two radii, a coarse one first", () => {
    fc.assert(
      fc.property(sizes, ({ rows, columns, seed, shuffled }) => {
        const table = quarters(rows, columns, seed);
        const order = visitOrder(shuffled ? "greedy-shuffled" : "greedy-file-order", seed, rows);
        const tree = createNetTree(table, euclidean);
        for (const radius of [columns, columns / 3]) {
          const level = treeNet(tree, radius, order);
          const plain = greedyBalls(createRowIndex(table, euclidean), radius, order, { balls: false, firstHit: false }).landmarks;
          expect(tree.levels[level]!.rows).toEqual(Array.from(plain));
        }
      }),
      { numRuns: 4 },
    );
  });
});

describe("visitOrder", () => {
  it("file order is 0, 1, 2; maximin starts at floor(u · n) and lists the rest in file order; a shuffle is a permutation", () => {
    expect(Array.from(visitOrder("greedy-file-order", 1, 3))).toEqual([0, 1, 2]); // worked by hand
    const start = Math.floor(randomSource(7)() * 10);
    expect(Array.from(visitOrder("maximin", 7, 10))).toEqual([start, ...Array.from({ length: 10 }, (_, i) => i).filter((i) => i !== start)]); // definition
    expect(Array.from(visitOrder("greedy-shuffled", 7, 10)).sort((a, b) => a - b)).toEqual(Array.from({ length: 10 }, (_, i) => i)); // definition
    expect(visitOrder("maximin", 7, 0).length).toBe(0); // worked by hand: no rows
  });
});
