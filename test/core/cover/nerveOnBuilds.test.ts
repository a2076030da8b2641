// The loop numbers of whole builds: buildCover's betti against an independent GF(2) computation
// from its own balls (test/core/support/gf2Betti.ts), and cycleRank = E − V + C ≥ b1, on random
// unscaled tables under every metric and landmark rule.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { buildCover, metrics, type Metric } from "../../../src/core/index.ts";
import { allLists } from "../support/bruteForce.ts";
import { independentNerve } from "../support/gf2Betti.ts";
import { parsedTable } from "../support/parsedTable.ts";

// Tables dense enough that loops and filled triangles are common (measured with fc.statistics while
// writing: about a third of the cases have rank ∂2 > 0 or b1 > 0): integer coordinates 0..5 in 2 or 3
// columns for the true metrics; for cosine, −2..2 in 2 or 3 columns (directions round a circle or a
// sphere); for correlation, −2..2 in 3 columns (centred rows lie in a plane, so again round a circle).
function shapeFor(metric: Metric) {
  if (metric.name === "cosine") return { columns: fc.integer({ min: 2, max: 3 }), lo: -2, hi: 2, radius: fc.constantFrom(0.1, 0.2, 0.3, 0.5) };
  if (metric.name === "correlation") return { columns: fc.constant(3), lo: -2, hi: 2, radius: fc.constantFrom(0.1, 0.2, 0.3, 0.5) };
  return { columns: fc.integer({ min: 2, max: 3 }), lo: 0, hi: 5, radius: fc.constantFrom(1, 1.5, 2) };
}

const cases = fc.constantFrom(...(Object.values(metrics) as Metric[])).chain((metric) => {
  const shape = shapeFor(metric);
  return fc
    .record({
      metric: fc.constant(metric),
      columns: shape.columns,
      rows: fc.integer({ min: 10, max: 60 }),
      radius: shape.radius,
      landmarks: fc.constantFrom("greedy-file-order" as const, "greedy-shuffled" as const, "maximin" as const),
      seed: fc.integer({ min: -99, max: 99 }),
    })
    .chain((c) =>
      fc.record({
        c: fc.constant(c),
        cells: fc.array(fc.array(fc.integer({ min: shape.lo, max: shape.hi }), { minLength: c.columns, maxLength: c.columns }), { minLength: c.rows, maxLength: c.rows }),
      }),
    );
});

describe("b0 and b1 of builds on random tables", () => {
  it("betti equals the independent computation; b0 is the component count; cycleRank = E − V + C ≥ b1 ≥ 0", () => {
    fc.assert(
      fc.property(cases, ({ c, cells }) => {
        const names = Array.from({ length: c.columns }, (_, j) => `c${j + 1}`);
        const result = buildCover(parsedTable(names, cells), { features: names, scale: "none", metric: c.metric.name, radius: c.radius, landmarks: c.landmarks, seed: c.seed });
        const independent = independentNerve(allLists(result.members));
        expect(result.betti).toEqual({ b0: independent.b0, b1: independent.b1 });
        expect(result.betti!.b0).toBe(result.componentCount);
        expect(result.cycleRank).toBe(result.edges.source.length - result.landmarks.length + result.componentCount);
        expect(result.cycleRank).toBeGreaterThanOrEqual(result.betti!.b1); // b1 = cycleRank − rank ∂2 (nerveBetti JSDoc)
        expect(result.betti!.b1).toBeGreaterThanOrEqual(0); // rank ∂2 ≤ dim ker ∂1 (from memory)
        expect(result.cycleRank - result.betti!.b1).toBe(independent.boundaryRank); // E − V + C − b1 = rank ∂2 by definition
      }),
    );
  });

  it("loops: false leaves betti null and keeps cycleRank", () => {
    const table = parsedTable(["x"], [[0], [1], [2]]);
    const params = { features: ["x"], scale: "none", metric: "euclidean", radius: 1, landmarks: "greedy-file-order", seed: 1 } as const;
    const result = buildCover(table, params, { loops: false });
    expect(result.betti).toBeNull();
    expect(result.cycleRank).toBe(0); // worked by hand: landmarks 0, 2; one edge; 1 − 2 + 1
  });
});
