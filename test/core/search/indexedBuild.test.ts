import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  buildCover,
  excludeUndefinedRows,
  maybeMetric,
  randomSource,
  scaleTable,
  selectFeatures,
  shuffledOrder,
  type CoverParams,
  type CoverResult,
  type MetricName,
  type ParsedTable,
  type ScaleName,
} from "../../../src/core/index.ts";
import { bruteCover } from "../support/bruteCover.ts";
import { tableArbitrary } from "./support/searchTables.ts";

/** 8 clusters of 375 rows in 6 columns: centres uniform in [−10, 10], offsets uniform in [−1, 1]. Seeded. */
function clusters(): ParsedTable {
  const random = randomSource(7);
  const centres = Array.from({ length: 8 }, () => Array.from({ length: 6 }, () => 20 * random() - 10));
  const values = Float64Array.from({ length: 3000 * 6 }, (_, t) => centres[Math.floor(t / 6) % 8]![t % 6]! + 2 * random() - 1);
  return toParsed(values, 3000, 6);
}

const toParsed = (values: Float64Array, rows: number, columns: number): ParsedTable => ({
  rows,
  columns: Array.from({ length: columns }, (_, k) => ({
    name: `c${k + 1}`,
    kind: "numeric" as const,
    numbers: Float64Array.from({ length: rows }, (_, i) => values[i * columns + k]!),
    texts: null,
    missing: 0,
  })),
});

/** The build by the reference cover builder (bruteCover) with the metric's predicate, on the same scaled table: net, balls (as parsed rows) and edges. */
function plainBuild(parsed: ParsedTable, params: CoverParams) {
  const metric = maybeMetric(params.metric);
  const selection = selectFeatures(parsed, params.features, "drop");
  const defined = excludeUndefinedRows(scaleTable(selection.table, params.scale).table, metric, selection.usedRows);
  const { values, columns: d, rows: n } = defined.table;
  if (n === 0) return { landmarks: [], balls: [], edges: { source: [], target: [], shared: [] } };
  const cover = bruteCover(
    Array.from({ length: n }, (_, i) => Array.from(values.subarray(i * d, i * d + d))),
    {
      metric: params.metric,
      radius: params.radius,
      landmarks: params.landmarks,
      order: Array.from(params.landmarks === "greedy-shuffled" ? shuffledOrder(n, randomSource(params.seed)) : Uint32Array.from({ length: n }, (_, i) => i)),
      start: Math.floor(randomSource(params.seed)() * n),
      within: (a, b) => metric.within(values, d, a, b, params.radius),
      distance: (a, b) => metric.distance(values, d, a, b),
      loops: false,
    },
  );
  const parsedRow = (i: number): number => defined.usedRows[i]!;
  return { landmarks: cover.landmarks.map(parsedRow), balls: cover.balls.map((ball) => ball.map(parsedRow)), edges: cover.edges };
}

const built = (result: CoverResult) => ({
  landmarks: Array.from(result.landmarks),
  balls: Array.from({ length: result.landmarks.length }, (_, k) => Array.from(result.members.items.subarray(result.members.offsets[k]!, result.members.offsets[k + 1]!))),
  edges: { source: Array.from(result.edges.source), target: Array.from(result.edges.target), shared: Array.from(result.edges.shared) },
});

const settings = fc.record({
  metric: fc.constantFrom<MetricName>("euclidean", "manhattan", "chebyshev", "cosine", "correlation"),
  scale: fc.constantFrom<ScaleName>("none", "zscore", "minmax", "robust"),
  landmarks: fc.constantFrom("greedy-file-order" as const, "greedy-shuffled" as const, "maximin" as const),
  seed: fc.integer({ min: -1000, max: 1000 }),
  radius: fc.oneof(fc.constantFrom(0.25, 0.5, 1, 1.5, 2, 0.1 + 0.2), fc.double({ min: 0.01, max: 3, noNaN: true })),
});

describe("buildCover with candidate indexes", () => {
  it("gives the plain pipeline's landmarks, balls and edges for every metric, scaling, landmark rule and seed", () => {
    fc.assert(
      fc.property(tableArbitrary, settings, (table, s) => {
        const parsed = toParsed(table.values, table.rows, table.columns);
        const params: CoverParams = { features: parsed.columns.map((c) => c.name), ...s };
        expect(built(buildCover(parsed, params, { loops: false }))).toEqual(plainBuild(parsed, params));
      }),
      { numRuns: 300 },
    );
  });

  it("gives the plain pipeline's result on 3,000 rows of 8 clusters in 6 columns (deep tree; the index judges its own pruning)", () => {
    const parsed = clusters();
    for (const metric of ["euclidean", "manhattan", "chebyshev", "cosine", "correlation"] as const) {
      for (const landmarks of ["greedy-file-order", "maximin"] as const) {
        const radius = metric === "cosine" || metric === "correlation" ? 0.05 : metric === "manhattan" ? 1.5 : 0.6;
        const params: CoverParams = { features: parsed.columns.map((c) => c.name), scale: "zscore", metric, radius, landmarks, seed: 3 };
        expect(built(buildCover(parsed, params, { loops: false }))).toEqual(plainBuild(parsed, params));
      }
    }
  });
});
