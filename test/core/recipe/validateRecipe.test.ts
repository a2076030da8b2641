import { describe, expect, it } from "vitest";
import { RecipeError, parseRecipe, validateRecipe } from "../../../src/core/index.ts";
import { sampleRecipe, withField } from "./sampleRecipe.ts";

const problemsOf = (json: unknown): readonly string[] => {
  try {
    validateRecipe(json);
  } catch (error) {
    if (error instanceof RecipeError) return error.problems;
    throw error;
  }
  return [];
};

describe("validateRecipe", () => {
  it("a complete recipe passes unchanged", () => {
    expect(validateRecipe(JSON.parse(JSON.stringify(sampleRecipe)))).toEqual(sampleRecipe);
  });

  // each line: a field, a bad value, and the one message it must give (worded in validateRecipe)
  const cases: [string, unknown, string][] = [
    ["shoalRecipe", 0, "shoalRecipe: expected 1, got 0"],
    ["writtenBy", 3, "writtenBy: expected a text, got 3"],
    ["input", "x", 'input: expected an object, got "x"'],
    ["input.name", "", 'input.name: expected a non-empty text, got ""'],
    ["input.bytes", -1, "input.bytes: expected a whole number from 0 to 9007199254740991, got -1"],
    ["input.sha256", "ABC", 'input.sha256: expected 64 lowercase hexadecimal digits, got "ABC"'],
    ["reading", null, "reading: expected an object, got null"],
    ["reading.delimiter", ";", 'reading.delimiter: expected null or one of comma, semicolon, tab, pipe, got ";"'],
    ["reading.decimal", "x", 'reading.decimal: expected null or one of ., ,, got "x"'],
    ["reading.encoding", "latin1", 'reading.encoding: expected null or one of utf-8, windows-1252, got "latin1"'],
    ["reading.ragged", null, "reading.ragged: expected one of reject, pad, got null"],
    ["columns", [], "columns: expected an object, got []"],
    ["columns.features", "a,b", 'columns.features: expected a list of column names, got "a,b"'],
    ["columns.features", ["a", "a"], 'columns.features: expected each name once, got "a"'],
    ["columns.id", 7, "columns.id: expected null or a non-empty text, got 7"],
    ["columns.outcomes", [1], "columns.outcomes: expected a list of column names, got [1]"],
    ["columns.outcomes", ["y", "a"], "columns: a is in both features and outcomes"],
    ["columns.oneHot", {}, "columns.oneHot: expected a list of column names, got {}"],
    ["columns.weights", [2], "columns.weights: expected an object of column name to weight, got [2]"],
    ["columns.weights.b", -2, "columns.weights.b: expected a number of at least 0, got -2"],
    ["columns.weights.y", 2, "columns.weights: y is not a feature"],
    ["missing", "zero", 'missing: expected one of drop, median, mean, got "zero"'],
    ["scale", "log", 'scale: expected one of zscore, robust, minmax, none, got "log"'],
    ["metric", "hamming", 'metric: expected one of euclidean, manhattan, chebyshev, cosine, correlation, got "hamming"'],
    ["radius", 0, "radius: expected a positive number, got 0"],
    ["radius", "0.5", 'radius: expected a positive number, got "0.5"'],
    ["landmarks", 1, "landmarks: expected an object, got 1"],
    ["landmarks.rule", "kmeans", 'landmarks.rule: expected one of greedy-file-order, greedy-shuffled, maximin, greedy, random, got "kmeans"'],
    ["landmarks.seed", 1.5, "landmarks.seed: expected a whole number from -2147483648 to 4294967295, got 1.5"],
    ["colour", null, "colour: expected an object, got null"],
    ["colour.kind", "hue", 'colour.kind: expected one of none, column, levels, region, got "hue"'],
    ["colour.name", null, "colour.name: expected a non-empty text, got null"],
    ["colour.level", 3, "colour.level: expected null or a non-empty text, got 3"],
    ["regions", {}, "regions: expected a list, got {}"],
    ["regions.0.name", "", 'regions[0].name: expected a non-empty text, got ""'],
    ["regions.0.records", [3, 1], "regions[0].records: expected record numbers from 1, ascending, each once, got [3,1]"],
    ["regions.0.records", [0], "regions[0].records: expected record numbers from 1, ascending, each once, got [0]"],
    ["hotspots", [], "hotspots: expected an object, got []"],
    ["hotspots.column", "a", "hotspots.column: a is not one of columns.outcomes"],
    ["hotspots.direction", "up", 'hotspots.direction: expected one of high, low, both, got "up"'],
    ["hotspots.maxNodes", 16, "hotspots.maxNodes: expected a whole number from 1 to 15, got 16"],
    ["hotspots.replicates", -1, "hotspots.replicates: expected a whole number from 0 to 9007199254740991, got -1"],
    ["hotspots.score", "poisson", 'hotspots.score: expected one of auto, bernoulli, normal, rank, got "poisson"'],
    ["hotspots.scanSeed", "1", 'hotspots.scanSeed: expected a whole number from -2147483648 to 4294967295, got "1"'],
    ["hotspots.stabilitySeeds", 1001, "hotspots.stabilitySeeds: expected a whole number from 0 to 1000, got 1001"],
  ];
  it.each(cases)("a bad %s (%j) gives exactly its own message", (path, value, message) => {
    expect(problemsOf(withField(path, value))).toEqual([message]);
  });

  it("a missing field is named: missing field: metric", () => {
    expect(problemsOf(withField("metric", undefined))).toEqual(["missing field: metric"]);
  });

  it("hotspots may be left out (no scan was run)", () => {
    expect(problemsOf(withField("hotspots", undefined))).toEqual([]);
  });

  it("colour of a region names a region of the recipe: no region named \"B\" is refused", () => {
    expect(problemsOf(withField("colour", { kind: "region", name: "B", level: null }))).toEqual(['colour.name: no region named "B"']);
  });

  it("two regions with one name are refused at the second", () => {
    const json = withField("regions", [{ name: "A", records: [1] }, { name: "A", records: [2] }]);
    expect(problemsOf(json)).toEqual(['regions[1].name: a second region named "A"']);
  });

  it("unknown fields are refused with their names, at every level", () => {
    const json = withField("colour.shade", "dark");
    (json as Record<string, unknown>).notes = "x";
    (json.input as Record<string, unknown>).path = "/tmp";
    expect(problemsOf(json)).toEqual(["unknown field: notes", "unknown field: input.path", "unknown field: colour.shade"]);
  });

  it("several bad fields give one message each, all in one error", () => {
    const json = withField("radius", -1);
    (json as Record<string, unknown>).metric = "x";
    expect(problemsOf(json)).toEqual(['metric: expected one of euclidean, manhattan, chebyshev, cosine, correlation, got "x"', "radius: expected a positive number, got -1"]);
    expect(() => validateRecipe(json)).toThrow(/^invalid recipe: metric: .*; radius: /);
  });

  it("a newer schema version (2) is refused alone, whatever else the file holds", () => {
    const json = { ...withField("radius", "x"), shoalRecipe: 2, newThing: true };
    expect(problemsOf(json)).toEqual(["recipe schema version 2 is newer than this shoal reads (1): use a newer shoal"]);
  });

  it("a file without shoalRecipe is not a recipe", () => {
    expect(problemsOf({ nodes: 3 })).toEqual(["missing field: shoalRecipe (this is not a shoal recipe)"]);
    expect(problemsOf([1])).toEqual(["expected a JSON object, got a list"]);
  });

  it("the earlier landmark names are read as today's: random becomes greedy-shuffled", () => {
    expect(validateRecipe(withField("landmarks.rule", "random")).landmarks.rule).toBe("greedy-shuffled");
  });

  it("a damaged file is one error saying it is not JSON", () => {
    expect(() => parseRecipe('{"shoalRecipe": 1,')).toThrow(/^invalid recipe: not readable as JSON \(/);
  });
});
