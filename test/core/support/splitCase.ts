import fc from "fast-check";
import type { CoverParams, CoverResult, MetricName, ParsedTable } from "../../../src/core/index.ts";
import { parsedTable } from "./parsedTable.ts";

export interface SplitCase {
  readonly parsed: ParsedTable;
  readonly params: CoverParams;
}

const metricNames: readonly MetricName[] = ["euclidean", "manhattan", "chebyshev", "cosine", "correlation"];

/**
 * Random builds large enough for the split steps to split: 60..240 rows of 3..12 columns of
 * halves −4..4 (ties and repeated rows), every metric, every landmark rule, z-scored, with radii
 * small enough for many landmarks (often past the 64 of one group) and large enough for edges.
 */
export const splitCase: fc.Arbitrary<SplitCase> = fc
  .record({
    rows: fc.integer({ min: 60, max: 240 }),
    columns: fc.integer({ min: 3, max: 12 }),
    metric: fc.constantFrom(...metricNames),
    landmarks: fc.constantFrom("greedy-file-order" as const, "greedy-shuffled" as const, "maximin" as const),
    seed: fc.integer({ min: 0, max: 1000 }),
    spread: fc.double({ min: 0.05, max: 0.6, noNaN: true }),
  })
  .chain(({ rows, columns, metric, landmarks, seed, spread }) =>
    fc.array(fc.integer({ min: -8, max: 8 }), { minLength: rows * columns, maxLength: rows * columns }).map((cells): SplitCase => {
      const names = Array.from({ length: columns }, (_, j) => `c${j + 1}`);
      const table = Array.from({ length: rows }, (_, i) => cells.slice(i * columns, (i + 1) * columns).map((k) => k / 2));
      // z-scored columns: a radius of spread · √columns (distance units), a share of it for cosine and correlation (0..2)
      const radius = metric === "cosine" || metric === "correlation" ? spread : spread * Math.sqrt(columns) * (metric === "chebyshev" ? 1 : 2);
      return { parsed: parsedTable(names, table), params: { features: names, scale: "zscore", metric, radius, landmarks, seed } };
    }),
  );

/** The arrays a build's result is compared on, as plain arrays (members, edges, components, b0/b1). */
export function buildArrays(result: CoverResult): Record<string, unknown> {
  return {
    landmarks: Array.from(result.landmarks),
    offsets: Array.from(result.members.offsets),
    items: Array.from(result.members.items),
    source: Array.from(result.edges.source),
    target: Array.from(result.edges.target),
    shared: Array.from(result.edges.shared),
    component: Array.from(result.component),
    betti: result.betti,
  };
}
