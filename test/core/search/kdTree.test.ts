import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { euclidean, type NumericTable } from "../../../src/core/index.ts";
import { kdTree } from "../../../src/core/search/kdTree.ts";
import { createRowIndex, maybeRowIndex } from "../../../src/core/search/rowIndex.ts";
import { tableArbitrary } from "./support/searchTables.ts";

describe("kdTree", () => {
  it("the JSDoc example: 4 rows with leaves of 2 split the root into nodes 1 and 2", () => {
    const tree = kdTree(Float64Array.of(0, 1, 2, 3), 1, 4, 2);
    expect(tree.firstChild[0]).toBe(1);
    expect(Array.from(tree.start)).toEqual([0, 0, 2]); // worked by hand: median split at position 2
    expect(Array.from(tree.end)).toEqual([4, 2, 4]);
  });

  it("leaves partition the positions, rowAt is a permutation with inverse positionOf, coords hold its rows, and every box contains its node's rows", () => {
    fc.assert(
      fc.property(tableArbitrary, fc.constantFrom(1, 2, 3, 7, 32), (table, leafSize) => {
        const { values, columns: d, rows: n } = table;
        const tree = kdTree(values, d, n, leafSize);
        const seen = new Uint8Array(n);
        for (let node = 0; node < tree.start.length; ++node) {
          for (let p = tree.start[node]!; p < tree.end[node]!; ++p) {
            for (let k = 0; k < d; ++k) {
              expect(tree.coords[p * d + k]).toBe(values[tree.rowAt[p]! * d + k]);
              expect(tree.lo[node * d + k]!).toBeLessThanOrEqual(values[tree.rowAt[p]! * d + k]!);
              expect(tree.hi[node * d + k]!).toBeGreaterThanOrEqual(values[tree.rowAt[p]! * d + k]!);
            }
            if (tree.firstChild[node] === 0) seen[p]!++;
          }
        }
        expect(Array.from(seen)).toEqual(new Array(n).fill(1));
        for (let p = 0; p < n; ++p) expect(tree.positionOf[tree.rowAt[p]!]).toBe(p);
      }),
    );
  });

  it("equal rows stay in one leaf however many, and no rows give one empty leaf", () => {
    expect(kdTree(new Float64Array(200).fill(0.3), 2, 100, 4).start.length).toBe(1);
    const empty = kdTree(new Float64Array(0), 3, 0);
    expect([empty.start.length, empty.end[0]]).toEqual([1, 0]);
  });

  it("throws for a leaf size below 1", () => {
    expect(() => kdTree(Float64Array.of(0), 1, 1, 0)).toThrow("invalid leaf size: 0");
  });
});

describe("row index reuse", () => {
  it("maybeRowIndex returns the index given for the same table and metric, and throws for another table", () => {
    const table: NumericTable = { rows: 2, columns: 1, names: ["x"], values: Float64Array.of(0, 1) };
    const index = createRowIndex(table, euclidean);
    expect(maybeRowIndex(table, euclidean, index)).toBe(index);
    expect(() => maybeRowIndex({ ...table }, euclidean, index)).toThrow("row index built for another table or metric: euclidean");
  });
});
