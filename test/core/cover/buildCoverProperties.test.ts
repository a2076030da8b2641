// Properties of every build, checked on buildCover itself over random small files with missing
// cells, every landmark rule (greedy, random, maximin) and random seeds. Distances are decided by
// the reference predicate (Metric.within) on the scaled table, the definition every build
// decision must follow.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { buildCover, euclidean, parseCsvText, selectFeatures, zScore, type CoverResult, type NumericTable } from "../../../src/core/index.ts";
import { allLists, bfsComponents, bruteBalls, bruteEdges } from "../support/bruteForce.ts";

interface Case {
  readonly csv: string;
  readonly columns: number;
  readonly missingRows: number[];
}

// 1..60 records, 1..5 columns of halves −3..3, about one cell in ten missing (never in the first
// record, so that every column stays numeric). A missing cell is written "NA": in a one-column file
// an empty cell would be a blank line, which is not a record.
const file: fc.Arbitrary<Case> = fc
  .record({ rows: fc.integer({ min: 1, max: 60 }), columns: fc.integer({ min: 1, max: 5 }) })
  .chain(({ rows, columns }) =>
    fc
      .array(fc.oneof({ weight: 9, arbitrary: fc.integer({ min: -6, max: 6 }) }, { weight: 1, arbitrary: fc.constant(null) }), {
        minLength: rows * columns,
        maxLength: rows * columns,
      })
      .map((cells): Case => {
        const records: string[] = [];
        const missingRows: number[] = [];
        for (let i = 0; i < rows; ++i) {
          const row = cells.slice(i * columns, (i + 1) * columns).map((k) => (i === 0 || k !== null ? String((k ?? 0) / 2) : "NA"));
          if (row.includes("NA")) missingRows.push(i);
          records.push(row.join(","));
        }
        const header = Array.from({ length: columns }, (_, j) => `c${j + 1}`).join(",");
        return { csv: `${header}\n${records.join("\n")}\n`, columns, missingRows };
      }),
  );

const settings = fc.record({
  radius: fc.constantFrom(0.25, 0.5, 0.75, 1, 1.5, 2),
  landmarks: fc.constantFrom("greedy-file-order" as const, "greedy-shuffled" as const, "maximin" as const),
  seed: fc.integer({ min: -1000, max: 1000 }),
});

interface Built {
  readonly result: CoverResult;
  readonly scaled: NumericTable;
  /** Parsed-table row → row of the scaled table. */
  readonly local: Map<number, number>;
  readonly within: (a: number, b: number) => boolean;
}

function build(c: Case, s: { radius: number; landmarks: "greedy-file-order" | "greedy-shuffled" | "maximin"; seed: number }): Built {
  const parsed = parseCsvText(c.csv);
  const features = Array.from({ length: c.columns }, (_, j) => `c${j + 1}`);
  const result = buildCover(parsed, { features, scale: "zscore", metric: "euclidean", ...s });
  const selection = selectFeatures(parsed, features);
  const scaled = zScore(selection.table).table;
  const local = new Map(Array.from(selection.usedRows, (row, i) => [row, i] as const));
  // a and b are parsed-table rows
  const within = (a: number, b: number): boolean => euclidean.within(scaled.values, scaled.columns, local.get(a)!, local.get(b)!, s.radius);
  return { result, scaled, local, within };
}

describe("buildCover properties on random files", () => {
  it("drops exactly the records with a missing feature and keeps the others, both ascending", () => {
    fc.assert(
      fc.property(file, settings, (c, s) => {
        const { result } = build(c, s);
        expect(Array.from(result.droppedRows)).toEqual(c.missingRows);
        const rows = Array.from({ length: result.rowsRead }, (_, i) => i);
        expect(Array.from(result.usedRows)).toEqual(rows.filter((i) => !c.missingRows.includes(i)));
      }),
    );
  });

  it("every used row lies within r of some landmark, and landmarks are used rows pairwise more than r apart", () => {
    fc.assert(
      fc.property(file, settings, (c, s) => {
        const { result, within } = build(c, s);
        const landmarks = Array.from(result.landmarks);
        for (const l of landmarks) expect(result.usedRows).toContain(l);
        for (const row of result.usedRows) expect(landmarks.some((l) => within(l, row))).toBe(true);
        for (let a = 0; a < landmarks.length; ++a) {
          for (let b = a + 1; b < landmarks.length; ++b) expect(within(landmarks[a]!, landmarks[b]!)).toBe(false);
        }
      }),
    );
  });

  it("every membership satisfies d ≤ r and no (landmark, row) pair with d ≤ r is missing", () => {
    fc.assert(
      fc.property(file, settings, (c, s) => {
        const { result, within } = build(c, s);
        const used = Array.from(result.usedRows);
        const expected = Array.from(result.landmarks, (l) => used.filter((row) => within(l, row)));
        expect(allLists(result.members)).toEqual(expected);
      }),
    );
  });

  it("each edge weight is the number of rows two balls share, and every sharing pair has an edge", () => {
    fc.assert(
      fc.property(file, settings, (c, s) => {
        const { result } = build(c, s);
        expect({ source: Array.from(result.edges.source), target: Array.from(result.edges.target), shared: Array.from(result.edges.shared) }).toEqual(
          bruteEdges(allLists(result.members)),
        );
      }),
    );
  });

  it("components agree with a breadth-first search", () => {
    fc.assert(
      fc.property(file, settings, (c, s) => {
        const { result } = build(c, s);
        const expected = bfsComponents(result.landmarks.length, result.edges.source, result.edges.target);
        expect(Array.from(result.component)).toEqual(expected.component);
        expect(result.componentCount).toBe(expected.count);
      }),
    );
  });

  it("the balls in scaled-table rows equal brute-force balls around the mapped landmarks", () => {
    fc.assert(
      fc.property(file, settings, (c, s) => {
        const { result, scaled, local } = build(c, s);
        const landmarks = Array.from(result.landmarks, (row) => local.get(row)!);
        const expected = bruteBalls(scaled.rows, landmarks, (l, i) => euclidean.within(scaled.values, scaled.columns, l, i, s.radius));
        expect(allLists(result.members).map((rows) => rows.map((row) => local.get(row)!))).toEqual(expected);
      }),
    );
  });
});
