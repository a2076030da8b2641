import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { euclidean, type Metric, type NumericTable } from "../../../src/core/index.ts";
import { ballRows } from "../../../src/core/search/ballRows.ts";
import { createRowIndex } from "../../../src/core/search/rowIndex.ts";
import { plainBall } from "./support/plainSearch.ts";
import { searchCase } from "./support/searchTables.ts";

const line0to3: NumericTable = Object.freeze({ rows: 4, columns: 1, names: ["x"], values: Float64Array.of(0, 1, 2, 3) });

describe("ballRows", () => {
  it("the JSDoc example: around row 2 of 0, 1, 2, 3 with r = 1 the ball is rows 1, 2, 3 (ties d = r included)", () => {
    expect(Array.from(ballRows(createRowIndex(line0to3, euclidean), 2, 1))).toEqual([1, 2, 3]); // worked by hand
  });

  it("returns exactly the rows the reference predicate accepts, ascending, for every metric, radius, centre and leaf size", () => {
    fc.assert(
      fc.property(searchCase, fc.nat(), ({ table, metric, radius, leafSize }, pick) => {
        const index = createRowIndex(table, metric, { leafSize });
        for (const centre of [pick % table.rows, 0, table.rows - 1]) {
          expect(Array.from(ballRows(index, centre, radius))).toEqual(plainBall(table, metric, centre, radius));
        }
      }),
      { numRuns: 300 },
    );
  });

  it("gives the same rows with the boxes (mode tree) and with a flat scan of all positions (mode flat)", () => {
    fc.assert(
      fc.property(searchCase, ({ table, metric, radius, leafSize }) => {
        const tree = createRowIndex(table, metric, { leafSize });
        const flat = createRowIndex(table, metric, { leafSize });
        Object.assign(tree, { mode: "tree", modeRadius: radius });
        Object.assign(flat, { mode: "flat", modeRadius: radius });
        for (let centre = 0; centre < Math.min(table.rows, 8); ++centre) {
          expect(Array.from(ballRows(flat, centre, radius))).toEqual(Array.from(ballRows(tree, centre, radius)));
        }
      }),
    );
  });

  it("a table with a NaN value gets no tree, and its balls are still the predicate's (NaN rows in none)", () => {
    const table: NumericTable = { rows: 3, columns: 1, names: ["x"], values: Float64Array.of(0, NaN, 0.5) };
    const index = createRowIndex(table, euclidean);
    expect(index.tree).toBeNull();
    expect(Array.from(ballRows(index, 0, 1))).toEqual([0, 2]); // worked by hand: NaN ≤ r is false
  });

  it("a metric object outside the registry gets no tree and every pair is decided by its own predicate", () => {
    const absolute: Metric = { ...euclidean, within: (values, _d, i, j, radius) => Math.abs(values[i]! - values[j]!) < radius }; // strict, unlike euclidean
    const index = createRowIndex(line0to3, absolute);
    expect(index.space).toBeNull();
    expect(Array.from(ballRows(index, 2, 1))).toEqual([2]); // worked by hand: |2 − 1| < 1 is false
  });

  it("one row is its own ball, and duplicate rows share every ball", () => {
    const one: NumericTable = { rows: 1, columns: 2, names: ["a", "b"], values: Float64Array.of(5, -5) };
    expect(Array.from(ballRows(createRowIndex(one, euclidean), 0, 1e-9))).toEqual([0]);
    const copies: NumericTable = { rows: 5, columns: 2, names: ["a", "b"], values: new Float64Array(10).fill(0.1 + 0.2) };
    expect(Array.from(ballRows(createRowIndex(copies, euclidean, { leafSize: 1 }), 3, 1e-300))).toEqual([0, 1, 2, 3, 4]);
  });
});
