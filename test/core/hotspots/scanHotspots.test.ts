import { describe, expect, it } from "vitest";
import { buildCover, Cancelled, countCandidateSets, scanHotspots, type CoverParams, type ParsedTable } from "../../../src/core/index.ts";
import { coverGeometry } from "../../../src/core/hotspots/coverGeometry.ts";
import { nearestLandmarkNodes } from "../../../src/core/hotspots/nearestLandmarkNodes.ts";
import { pointsTable } from "../sweep/support.ts";

// Invented: a 20 × 20 grid of rows at unit spacing; the outcome is 1 on the 5 × 5 block in the
// corner x, y ≤ 4 and on every 10th other row (a background rate of about 10%).
const grid: number[][] = [];
for (let x = 0; x < 20; ++x) for (let y = 0; y < 20; ++y) grid.push([x, y, x <= 4 && y <= 4 ? 1 : (x * 20 + y) % 10 === 0 ? 1 : 0]);
const gridTable = pointsTable(["x", "y", "flag"], grid);
const gridParams: CoverParams = { features: ["x", "y"], scale: "none", metric: "euclidean", radius: 1.5, landmarks: "greedy-file-order", seed: 1 };
const gridBuild = buildCover(gridTable, gridParams);
const planted = grid.flatMap((row, i) => (row[0]! <= 4 && row[1]! <= 4 ? [i] : []));

const withColumn = (table: ParsedTable, name: string, values: readonly number[]): ParsedTable => ({
  rows: table.rows,
  columns: [...table.columns, { name, kind: "numeric", numbers: Float64Array.from(values), texts: null, missing: values.filter(Number.isNaN).length }],
});

describe("rows in the scan", () => {
  it("rows at 0, 1, 3 with landmarks 0 and 3 at r = 2 go to nodes 0, 0, 1 (row 1 lies in both balls, nearer node 0)", () => {
    const table = pointsTable(["x"], [[0], [1], [3]]);
    const result = buildCover(table, { features: ["x"], scale: "none", metric: "euclidean", radius: 2, landmarks: "greedy-file-order", seed: 1 });
    expect(Array.from(nearestLandmarkNodes(coverGeometry(table, result)))).toEqual([0, 0, 1]); // worked by hand: |1 − 0| = 1 < |1 − 3| = 2
  });

  it("a row equally near two landmarks goes to the lower node", () => {
    const table = pointsTable(["x"], [[0], [1], [2]]);
    const result = buildCover(table, { features: ["x"], scale: "none", metric: "euclidean", radius: 1, landmarks: "greedy-file-order", seed: 1 });
    expect(Array.from(nearestLandmarkNodes(coverGeometry(table, result)))).toEqual([0, 0, 1]); // worked by hand: row 1 lies at 1 from both landmarks
  });

  it("rows with a missing outcome are left out and counted; the others are scanned once each", () => {
    const flags = grid.map((row, i) => (i % 50 === 7 ? NaN : row[2]!));
    const scan = scanHotspots(withColumn(gridTable, "gappy", flags), buildCover(withColumn(gridTable, "gappy", flags), gridParams), { outcome: "gappy", replicates: 9 });
    expect(scan.rowsMissingOutcome).toBe(8); // worked by hand: rows 7, 57, …, 357
    expect(scan.rowsScanned).toBe(392); // worked by hand: 400 − 8
    for (const h of scan.hotspots) expect(h.nInside + h.nOutside).toBe(392);
    expect(scan.hotspots[0]!.rows.every((row) => !Number.isNaN(flags[row]!))).toBe(true);
  });
});

describe("candidate count", () => {
  it("rows at 0, 0.5, 1, 1.5, 2 with r = 0.5 give the path of nodes 0–1–2, whose family at K = 3 has 6 sets (the JSDoc example)", () => {
    const table = pointsTable(["x"], [[0], [0.5], [1], [1.5], [2]]);
    const result = buildCover(table, { features: ["x"], scale: "none", metric: "euclidean", radius: 0.5, landmarks: "greedy-file-order", seed: 1 });
    expect(Array.from(result.edges.source)).toEqual([0, 1]); // worked by hand: landmarks at 0, 1, 2; balls share 0.5 and 1.5
    expect(Array.from(result.edges.target)).toEqual([1, 2]);
    expect(countCandidateSets(table, result, 3)).toBe(6); // worked by hand: 3 singletons, 2 pairs, 1 triple
    expect(() => countCandidateSets(table, result, 0)).toThrow("invalid maximum nodes: 0 (1 to 15)");
  });
});

describe("the hotspot scan on a planted block", () => {
  const scan = scanHotspots(gridTable, gridBuild, { outcome: "flag", replicates: 19, scanSeed: 3 });

  it("chooses the Bernoulli score for a 0/1 outcome and the flexible search within the default budget", () => {
    expect(scan.score).toBe("bernoulli");
    expect(scan.search).toBe("flexible");
    expect(scan.candidateSets).toBe(countCandidateSets(gridTable, gridBuild, 8));
    expect(scan.rowCap).toBe(200); // worked by hand: half of 400
  });

  it("finds the planted block as the top hotspot with p = 1/(R + 1) = 0.05, the best possible, never 0", () => {
    const top = scan.hotspots[0]!;
    const shared = planted.filter((row) => top.rows.includes(row)).length;
    expect(shared / (top.rows.length + planted.length - shared)).toBeGreaterThanOrEqual(0.6); // common practice, no source: the power test's bar
    expect(top.p).toBe(1 / 20); // worked by hand: (1 + 0) / (1 + 19)
    for (const h of scan.hotspots) expect(h.p).toBeGreaterThanOrEqual(1 / 20); // worked by hand: the smallest value of (1 + k)/(1 + R)
  });

  it("reports at most 10 hotspots, best first, no two sharing a node, each with inside − outside inside its interval", () => {
    expect(scan.hotspots.length).toBeLessThanOrEqual(10);
    const seen = new Set<number>();
    scan.hotspots.forEach((h, k) => {
      expect(h.rank).toBe(k + 1);
      if (k > 0) expect(h.score).toBeLessThanOrEqual(scan.hotspots[k - 1]!.score);
      for (const node of h.nodes) {
        expect(seen.has(node)).toBe(false);
        seen.add(node);
      }
      expect(h.difference).toBe(h.inside - h.outside);
      expect(h.ciLow).toBeLessThanOrEqual(h.ciHigh);
      expect(h.seedShare).toBeNull();
    });
  });

  it("is reproducible from its scan seed", () => {
    expect(scanHotspots(gridTable, gridBuild, { outcome: "flag", replicates: 19, scanSeed: 3 }).hotspots).toEqual(scan.hotspots);
  });

  it("with a budget below the family's size runs greedy growth, labelled heuristic, and still finds the block", () => {
    const heuristic = scanHotspots(gridTable, gridBuild, { outcome: "flag", replicates: 19, budget: 10 });
    expect(heuristic.search).toBe("heuristic");
    expect(heuristic.candidateSets).toBe(scan.candidateSets);
    const top = heuristic.hotspots[0]!;
    expect(top.search).toBe("heuristic");
    expect(top.p).toBe(1 / 20); // worked by hand: (1 + 0) / (1 + 19)
    expect(planted.filter((row) => top.rows.includes(row)).length).toBeGreaterThan(planted.length / 2);
  });

  it("the low direction reports only regions whose inside rate is below the outside rate; the normal and rank scores also give the top hotspot p = 1/(R + 1)", () => {
    const low = scanHotspots(gridTable, gridBuild, { outcome: "flag", replicates: 19, direction: "low" });
    expect(low.hotspots.every((h) => h.inside < h.outside)).toBe(true);
    for (const score of ["normal", "rank"] as const) {
      const other = scanHotspots(gridTable, gridBuild, { outcome: "flag", replicates: 19, score });
      expect(other.score).toBe(score);
      expect(other.hotspots[0]!.p).toBe(1 / 20); // worked by hand: (1 + 0) / (1 + 19)
    }
  });

  it("seed stability gives each hotspot a share in [0, 1], and the planted block is found again at every seed", () => {
    const stable = scanHotspots(gridTable, gridBuild, { outcome: "flag", replicates: 19, stabilitySeeds: 3 });
    expect(stable.stabilitySeeds).toBe(3);
    expect(stable.stabilityRule).toBe("greedy-shuffled");
    expect(stable.hotspots[0]!.seedShare).toBe(1); // the block is strong: expected at every seed, no source
    for (const h of stable.hotspots) expect(h.seedShare! >= 0 && h.seedShare! <= 1).toBe(true);
  });
});

describe("degenerate outcomes and control", () => {
  it("no cases: no hotspots, p = 1 everywhere, and a notice that says so", () => {
    const table = withColumn(gridTable, "none", grid.map(() => 0));
    const scan = scanHotspots(table, buildCover(table, gridParams), { outcome: "none", replicates: 9 });
    expect(scan.hotspots).toEqual([]);
    expect(scan.notice).toBe("the outcome has no cases or only cases: every score is 0 and p = 1");
  });

  it("a constant numeric outcome: no hotspots and a notice", () => {
    const table = withColumn(gridTable, "flat", grid.map(() => 2.5));
    const scan = scanHotspots(table, buildCover(table, gridParams), { outcome: "flat", replicates: 9 });
    expect(scan.score).toBe("normal");
    expect(scan.hotspots).toEqual([]);
    expect(scan.notice).toBe("the outcome is constant: every score is 0 and p = 1");
  });

  it("reports nondecreasing progress up to 1 and stops with Cancelled when asked", () => {
    const fractions: number[] = [];
    scanHotspots(gridTable, gridBuild, { outcome: "flag", replicates: 9, onProgress: (f) => fractions.push(f) });
    expect(fractions.at(-1)).toBe(1);
    expect(fractions.every((f, k) => k === 0 || f >= fractions[k - 1]!)).toBe(true);
    let asked = 0;
    expect(() => scanHotspots(gridTable, gridBuild, { outcome: "flag", replicates: 99, shouldStop: () => ++asked > 3 })).toThrow(Cancelled);
  });

  it("rejects an unknown outcome, a text outcome and K outside 1..15 with one line naming the value", () => {
    expect(() => scanHotspots(gridTable, gridBuild, { outcome: "nope" })).toThrow("unknown column: nope");
    expect(() => scanHotspots(gridTable, gridBuild, { outcome: "flag", maxNodes: 16 })).toThrow("invalid maximum nodes: 16 (1 to 15)");
    expect(() => scanHotspots(gridTable, gridBuild, { outcome: "flag", score: "bernoulli", direction: "sideways" as "high" })).toThrow("invalid direction: sideways");
  });
});
