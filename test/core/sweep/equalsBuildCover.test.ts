// The sweep's covers must be the covers buildCover makes at the same radii: same landmarks in the
// same order, same balls, same weighted edges, components, cycle rank, b0 and b1. Checked over
// random files (halves on a grid, so that ties d = r are common; some cells missing), random
// radius lists, every landmark rule and seed, and every metric, cosine and correlation included.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { buildCover, metricNames, parseCsvText, randomSource, type CoverResult, type MetricName } from "../../../src/core/index.ts";
import type { SweepCover } from "../../../src/core/sweep/coverFromBalls.ts";
import { lists, sweepWithCovers } from "./support.ts";

// 1..50 records, 1..4 columns of halves −3..3, about one cell in ten "NA" (never in the first record).
const file = fc
  .record({ rows: fc.integer({ min: 1, max: 50 }), columns: fc.integer({ min: 1, max: 4 }) })
  .chain(({ rows, columns }) =>
    fc.array(fc.oneof({ weight: 9, arbitrary: fc.integer({ min: -6, max: 6 }) }, { weight: 1, arbitrary: fc.constant(null) }), { minLength: rows * columns, maxLength: rows * columns }).map((cells) => {
      const records = Array.from({ length: rows }, (_, i) => cells.slice(i * columns, (i + 1) * columns).map((k) => (i === 0 || k !== null ? String((k ?? 0) / 2) : "NA")).join(","));
      return { csv: `${Array.from({ length: columns }, (_, j) => `c${j + 1}`).join(",")}\n${records.join("\n")}\n`, columns };
    }),
  );

// Radii on the half grid (ties with the grid's distances) and off it; 1..6 of them, repeats allowed.
const radii = fc.array(fc.oneof(fc.integer({ min: 1, max: 12 }).map((k) => k / 4), fc.double({ min: 0.05, max: 4, noNaN: true })), { minLength: 1, maxLength: 6 });
const settings = fc.record({
  landmarks: fc.constantFrom("greedy-file-order" as const, "greedy-shuffled" as const, "maximin" as const),
  metric: fc.constantFrom(...(metricNames as MetricName[])),
  scale: fc.constantFrom("zscore" as const, "none" as const, "robust" as const),
  seed: fc.integer({ min: -1000, max: 1000 }),
});

function graphOf(result: CoverResult | SweepCover) {
  return {
    landmarks: Array.from(result.landmarks),
    members: lists(result.members),
    edges: [Array.from(result.edges.source), Array.from(result.edges.target), Array.from(result.edges.shared)],
    component: Array.from(result.component),
    componentCount: result.componentCount,
    cycleRank: result.cycleRank,
    b0: result.betti!.b0,
    b1: result.betti!.b1,
  };
}

describe("a sweep equals separate buildCover builds at its radii", () => {
  it("landmarks, balls, edges, components, cycle rank, b0 and b1 agree at every radius, for every rule and metric", () => {
    fc.assert(
      fc.property(file, radii, settings, (f, list, s) => {
        const parsed = parseCsvText(f.csv);
        const params = { features: Array.from({ length: f.columns }, (_, j) => `c${j + 1}`), ...s };
        let built;
        try {
          built = sweepWithCovers(parsed, params, { radii: list });
        } catch (error) {
          // a build that cannot start (e.g. every row undefined for the metric) must fail alike
          expect(() => buildCover(parsed, { ...params, radius: list[0]! })).toThrow((error as Error).message);
          return;
        }
        const { sweep, covers } = built;
        const ascending = [...new Set(list)].sort((a, b) => a - b);
        expect(Array.from(sweep.figures.radius)).toEqual(ascending);
        ascending.forEach((radius, k) => {
          const separate = buildCover(parsed, { ...params, radius });
          expect(graphOf(covers[k]!)).toEqual(graphOf(separate));
          expect(sweep.figures.nodes[k]).toBe(separate.landmarks.length);
          expect(sweep.figures.edges[k]).toBe(separate.edges.source.length);
          expect(sweep.figures.b1[k]).toBe(separate.betti!.b1);
        });
      }),
      { numRuns: 150 },
    );
  });

  it("figures: balls per row, largest node share and largest component share follow from the separate build", () => {
    fc.assert(
      fc.property(file, radii, settings, (f, list, s) => {
        const parsed = parseCsvText(f.csv);
        const params = { features: Array.from({ length: f.columns }, (_, j) => `c${j + 1}`), ...s, metric: "euclidean" as const };
        const { sweep } = sweepWithCovers(parsed, params, { radii: list });
        sweep.figures.radius.forEach((radius, k) => {
          const b = buildCover(parsed, { ...params, radius });
          const rows = b.usedRows.length;
          const sizes = lists(b.members).map((m) => m.length);
          const byComponent = new Map<number, Set<number>>();
          lists(b.members).forEach((members, node) => members.forEach((row) => byComponent.set(b.component[node]!, (byComponent.get(b.component[node]!) ?? new Set()).add(row))));
          expect(sweep.figures.ballsPerRow[k]).toBe(sizes.reduce((a, c) => a + c, 0) / rows); // definition: memberships / rows
          expect(sweep.figures.largestNodeShare[k]).toBe(Math.max(...sizes) / rows); // definition
          expect(sweep.figures.largestComponentShare[k]).toBe(Math.max(...[...byComponent.values()].map((set) => set.size)) / rows); // definition
        });
      }),
      { numRuns: 60 },
    );
  });

  it("on tables of 2,000 to 4,000 rows the sweep's covers equal separate builds at every radius, for every rule", () => {
    // clustered rows in 3 columns on a grid of quarters (ties d = r common), seeded; 3 radii per table
    fc.assert(
      fc.property(fc.integer({ min: 2000, max: 4000 }), fc.integer({ min: 1, max: 1e6 }), settings, (rows, dataSeed, s) => {
        const random = randomSource(dataSeed);
        const records = Array.from({ length: rows }, () => {
          const cluster = Math.floor(random() * 4);
          return [0, 1, 2].map((j) => String(Math.round(4 * (cluster * (j === cluster % 3 ? 3 : 0) + 2 * (random() - 0.5))) / 4)).join(",");
        });
        const parsed = parseCsvText(`a,b,c\n${records.join("\n")}\n`);
        const params = { features: ["a", "b", "c"], ...s, metric: s.metric === "correlation" ? ("euclidean" as const) : s.metric };
        const list = params.metric === "cosine" ? [0.02, 0.05, 0.1] : [0.25, 0.5, 1];
        const { covers } = sweepWithCovers(parsed, params, { radii: list });
        list.forEach((radius, k) => expect(graphOf(covers[k]!)).toEqual(graphOf(buildCover(parsed, { ...params, radius }))));
      }),
      { numRuns: 6 },
    );
  });
});
