import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { chebyshev, euclidean, manhattan, type NumericTable } from "../../../src/core/index.ts";
import { greedyNet } from "../support/nets.ts";
import { createNetTree } from "../../../src/core/landmark/netTree.ts";
import { treeNet } from "../../../src/core/landmark/treeNet.ts";

// 1..80 rows of 1..4 columns of halves −3..3: exact squared sums, so ties d = r are common.
const table: fc.Arbitrary<NumericTable> = fc.record({ rows: fc.integer({ min: 1, max: 80 }), columns: fc.integer({ min: 1, max: 4 }) }).chain(({ rows, columns }) =>
  fc.array(fc.integer({ min: -6, max: 6 }), { minLength: rows * columns, maxLength: rows * columns }).map((cells) => ({ rows, columns, names: Array.from({ length: columns }, (_, j) => `c${j}`), values: Float64Array.from(cells, (k) => k / 2) })),
);

describe("greedy nets grown through a net tree", () => {
  it("equal greedyNet's landmarks at every level of a descending radius list, for each true metric", () => {
    fc.assert(
      fc.property(table, fc.array(fc.integer({ min: 1, max: 16 }).map((k) => k / 4), { minLength: 1, maxLength: 6 }), fc.constantFrom(euclidean, manhattan, chebyshev), (t, radii, metric) => {
        const tree = createNetTree(t, metric);
        const order = Uint32Array.from({ length: t.rows }, (_, i) => i);
        for (const radius of [...radii].sort((a, b) => b - a)) {
          const level = treeNet(tree, radius, order);
          expect(tree.levels[level]!.rows).toEqual(Array.from(greedyNet(t, metric, radius, order)));
        }
      }),
      { numRuns: 200 },
    );
  });

  it("stops once a net would exceed its cap, removing the level: 0, 1, 2, 3 at r = 0.5 needs 4 landmarks", () => {
    const line: NumericTable = { rows: 4, columns: 1, names: ["x"], values: Float64Array.of(0, 1, 2, 3) };
    const tree = createNetTree(line, euclidean);
    expect(treeNet(tree, 0.5, Uint32Array.of(0, 1, 2, 3), {}, 3)).toBe(-1); // worked by hand: every point is its own landmark
    expect(tree.levels.length).toBe(0);
    expect(tree.levels[treeNet(tree, 1, Uint32Array.of(0, 1, 2, 3))]!.rows).toEqual([0, 2]); // worked by hand, as greedyNet's example
  });

  it("refuses a metric without the triangle inequality", () => {
    expect(() => createNetTree({ rows: 0, columns: 1, names: ["x"], values: new Float64Array(0) }, { ...euclidean, name: "cosine", isTrueMetric: false })).toThrow("a net tree needs the triangle inequality, which cosine distance lacks");
  });
});
