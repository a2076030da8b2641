// treeOrderIndex: the index in tree order must find the same balls (under the new row numbers)
// as the copying index on the original table, for every metric, including ties at d = r.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { euclidean, type NumericTable } from "../../../src/core/index.ts";
import { ballRows } from "../../../src/core/search/ballRows.ts";
import { kdTree } from "../../../src/core/search/kdTree.ts";
import { createRowIndex } from "../../../src/core/search/rowIndex.ts";
import { permuteRows, treeOrderIndex } from "../../../src/core/search/treeOrderIndex.ts";
import { plainBall } from "./support/plainSearch.ts";
import { searchCase, tableArbitrary } from "./support/searchTables.ts";

const copyOf = (table: NumericTable): NumericTable => ({ ...table, values: table.values.slice() });

describe("kdTree in place", () => {
  it("builds the same tree as the copying build and leaves the caller's array in tree order", () => {
    fc.assert(
      fc.property(tableArbitrary, fc.constantFrom(1, 2, 5, 32), (table, leafSize) => {
        const copied = kdTree(table.values, table.columns, table.rows, leafSize);
        const own = table.values.slice();
        const inPlace = kdTree(own, table.columns, table.rows, leafSize, { inPlace: true });
        for (const key of ["rowAt", "positionOf", "start", "end", "firstChild", "lo", "hi", "coords"] as const) expect(inPlace[key]).toEqual(copied[key]);
        expect(inPlace.coords.buffer).toBe(own.buffer);
      }),
    );
  });
});

describe("permuteRows", () => {
  it("puts the old row rowAt[p] in row p, for any permutation", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 40 }), fc.integer({ min: 1, max: 4 }), fc.nat(), (n, d, seed) => {
        const rowAt = Uint32Array.from({ length: n }, (_, i) => i);
        for (let i = n - 1; i > 0; --i) {
          const j = (seed * 7919 + i * 104729) % (i + 1); // a fixed shuffle per seed
          [rowAt[i], rowAt[j]] = [rowAt[j]!, rowAt[i]!];
        }
        const values = Float64Array.from({ length: n * d }, (_, t) => t);
        const before = values.slice();
        permuteRows(values, d, rowAt);
        for (let p = 0; p < n; ++p) for (let k = 0; k < d; ++k) expect(values[p * d + k]).toBe(before[rowAt[p]! * d + k]);
      }),
    );
  });
});

describe("treeOrderIndex", () => {
  it("every ball, renumbered back, equals the copying index's ball and the plain scan's, ties at d = r included", () => {
    fc.assert(
      fc.property(searchCase, ({ table, metric, radius, leafSize }) => {
        const original = copyOf(table);
        const { index, rowAt } = treeOrderIndex(copyOf(table), metric, { leafSize });
        const reference = createRowIndex(original, metric, { leafSize });
        for (let p = 0; p < table.rows; ++p) {
          const row = rowAt ? rowAt[p]! : p;
          const found = Array.from(ballRows(index, p, radius), (q) => (rowAt ? rowAt[q]! : q)).sort((a, b) => a - b);
          expect(found).toEqual(Array.from(ballRows(reference, row, radius)));
          expect(found).toEqual(plainBall(original, metric, row, radius));
        }
      }),
      { numRuns: 300 },
    );
  });

  it("renumbers nothing where no search space applies (a non-finite value)", () => {
    const table: NumericTable = { rows: 3, columns: 1, names: ["x"], values: Float64Array.of(2, Infinity, 0) };
    const { index, rowAt } = treeOrderIndex(table, euclidean);
    expect(rowAt).toBeNull();
    expect(index.tree).toBeNull();
    expect(Array.from(table.values)).toEqual([2, Infinity, 0]);
  });
});
