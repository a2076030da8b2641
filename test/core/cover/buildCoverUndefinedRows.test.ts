// Rows where the metric is undefined (cosine: zero row; correlation: constant row) are left out
// after scaling and reported by parsed-table row number; buildCover reports the same rows.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { buildCover, cosine, correlation, euclidean, excludeUndefinedRows, metrics, parseCsvText, scaleTable, selectFeatures, type CoverParams, type Metric, type NumericTable, type ScaleName } from "../../../src/core/index.ts";
import { allLists } from "../support/bruteForce.ts";
import { parsedTable } from "../support/parsedTable.ts";

const numeric = (columns: number, rows: number[][]): NumericTable => ({
  rows: rows.length,
  columns,
  names: Array.from({ length: columns }, (_, j) => `c${j + 1}`),
  values: Float64Array.from(rows.flat()),
});

describe("excludeUndefinedRows", () => {
  it("cosine: zero rows 1 and 3 of the table are reported as parsed rows 2 and 5; rows 0, 2 are kept as parsed rows 0, 3", () => {
    const defined = excludeUndefinedRows(numeric(2, [[1, 2], [0, 0], [3, 4], [0, -0]]), cosine, Uint32Array.of(0, 2, 3, 5));
    expect(Array.from(defined.undefinedRows)).toEqual([2, 5]); // worked by hand
    expect(Array.from(defined.usedRows)).toEqual([0, 3]); // worked by hand
    expect(Array.from(defined.table.values)).toEqual([1, 2, 3, 4]); // worked by hand: rows (1, 2), (3, 4) kept
    expect(defined.table.rows).toBe(2); // worked by hand
  });

  it("correlation: constant rows (5, 5, 5) and (0, 0, 0) at table rows 1 and 3 are reported as parsed rows 2 and 7", () => {
    const defined = excludeUndefinedRows(numeric(3, [[1, 2, 3], [5, 5, 5], [2, 2, 3], [0, 0, 0]]), correlation, Uint32Array.of(1, 2, 4, 7));
    expect(Array.from(defined.undefinedRows)).toEqual([2, 7]); // worked by hand
    expect(Array.from(defined.usedRows)).toEqual([1, 4]); // worked by hand
    expect(Array.from(defined.table.values)).toEqual([1, 2, 3, 2, 2, 3]); // worked by hand: rows (1, 2, 3), (2, 2, 3) kept
  });

  it("euclidean leaves every row, zero and constant ones included, and returns the same table", () => {
    const table = numeric(2, [[0, 0], [5, 5]]);
    const defined = excludeUndefinedRows(table, euclidean, Uint32Array.of(3, 4));
    expect(defined.table).toBe(table);
    expect(Array.from(defined.undefinedRows)).toEqual([]);
    expect(Array.from(defined.usedRows)).toEqual([3, 4]); // the input row numbers, unchanged
  });
});

describe("buildCover reports undefined rows", () => {
  const params = (patch: Partial<CoverParams>): CoverParams =>
    Object.freeze({ features: ["a", "b"], scale: "none", metric: "cosine", radius: 0.5, landmarks: "greedy-file-order", seed: 1, ...patch });

  it("cosine, scale none: zero rows 1 and 3 are undefined, row 2 (missing a) is dropped, rows 0 and 4 are used", () => {
    const parsed = parseCsvText("a,b\n1,2\n0,0\nNA,1\n0,0\n3,4\n");
    const result = buildCover(parsed, params({}));
    expect(Array.from(result.undefinedRows)).toEqual([1, 3]); // worked by hand
    expect(Array.from(result.droppedRows)).toEqual([2]); // worked by hand
    expect(Array.from(result.usedRows)).toEqual([0, 4]); // worked by hand
    expect(allLists(result.members)).toEqual([[0, 4]]); // worked by hand: (1, 2), (3, 4) are 1 − 11/√125 ≈ 0.016 apart, one ball
  });

  it("correlation, scale none: constant rows 1 and 4 are undefined, row 2 is dropped", () => {
    const parsed = parseCsvText("a,b,c\n1,2,3\n5,5,5\n2,NA,2\n2,2,3\n0,0,0\n3,2,1\n");
    const result = buildCover(parsed, params({ features: ["a", "b", "c"], metric: "correlation" }));
    expect(Array.from(result.undefinedRows)).toEqual([1, 4]); // worked by hand
    expect(Array.from(result.droppedRows)).toEqual([2]); // worked by hand: b missing in row 2
    expect(Array.from(result.usedRows)).toEqual([0, 3, 5]); // worked by hand
  });

  it("is decided after scaling: under zscore, the row at both column means, (1, 1) of (0, 0), (1, 1), (2, 2), becomes (0, 0) and is undefined for cosine", () => {
    const parsed = parseCsvText("a,b\n0,0\n1,1\n2,2\n");
    expect(Array.from(buildCover(parsed, params({ scale: "zscore" })).undefinedRows)).toEqual([1]); // worked by hand: z = (−1, −1), (0, 0), (1, 1)
    expect(Array.from(buildCover(parsed, params({ scale: "none" })).undefinedRows)).toEqual([0]); // worked by hand: the raw zero row
  });

  it("when every row is undefined (correlation on z-scores (−1, −1), (0, 0), (1, 1), all constant) the graph is empty", () => {
    const result = buildCover(parseCsvText("a,b\n0,5\n1,6\n2,7\n"), params({ scale: "zscore", metric: "correlation" }));
    expect(Array.from(result.undefinedRows)).toEqual([0, 1, 2]); // worked by hand
    expect(result.landmarks.length).toBe(0); // worked by hand: no defined row
    expect(result.componentCount).toBe(0); // worked by hand
    expect(result.betti).toEqual({ b0: 0, b1: 0 }); // worked by hand: the empty complex
  });

  it("on random files, under every metric and scaling, undefinedRows equal excludeUndefinedRows on the scaled selection, and no node holds such a row", () => {
    const cell = fc.oneof({ weight: 8, arbitrary: fc.integer({ min: -2, max: 2 }) }, { weight: 1, arbitrary: fc.constant(NaN) });
    const cases = fc.record({
      columns: fc.integer({ min: 1, max: 4 }),
      rows: fc.integer({ min: 1, max: 30 }),
      metric: fc.constantFrom(...(Object.values(metrics) as Metric[])),
      scale: fc.constantFrom<ScaleName>("none", "zscore", "minmax", "robust"),
      missing: fc.constantFrom("drop" as const, "median" as const, "mean" as const),
    }).chain((c) => fc.record({ c: fc.constant(c), cells: fc.array(fc.array(cell, { minLength: c.columns, maxLength: c.columns }), { minLength: c.rows, maxLength: c.rows }) }));
    fc.assert(
      fc.property(cases, ({ c, cells }) => {
        const names = Array.from({ length: c.columns }, (_, j) => `c${j + 1}`);
        const rows = cells.map((row, i) => (i === 0 ? row.map((x) => (Number.isNaN(x) ? 0 : x)) : row)); // row 0 complete, so no column is all missing
        const parsed = parsedTable(names, rows);
        const result = buildCover(parsed, { features: names, scale: c.scale, metric: c.metric.name, radius: 0.75, landmarks: "greedy-file-order", seed: 1, missing: c.missing });
        const selection = selectFeatures(parsed, names, c.missing);
        const expected = excludeUndefinedRows(scaleTable(selection.table, c.scale).table, c.metric, selection.usedRows);
        expect(Array.from(result.undefinedRows)).toEqual(Array.from(expected.undefinedRows));
        expect(Array.from(result.usedRows)).toEqual(Array.from(expected.usedRows));
        const left = new Set(result.undefinedRows);
        expect(allLists(result.members).flat().filter((row) => left.has(row))).toEqual([]);
        expect(result.usedRows.length + result.undefinedRows.length + result.droppedRows.length).toBe(parsed.rows);
      }),
    );
  });
});
