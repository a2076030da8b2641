import { hotspotDefaults } from "../hotspots/hotspotDefaults.ts";
import { metricNames } from "../metric/metrics.ts";
import { landmarkRuleAliases, landmarkRules, missingPolicies, scaleNames } from "../params.ts";
import { delimiterNames } from "../table/readOptions.ts";
import { bad, integer, isObject, names, objectField, oneOf, oneOfOrNull, text, textOrNull, type Json, type Problems } from "./fieldChecks.ts";
import { RecipeError } from "./recipeError.ts";
import { recipeSchemaVersion, type Recipe } from "./types.ts";

const topKeys = ["shoalRecipe", "writtenBy", "input", "reading", "columns", "missing", "scale", "metric", "radius", "landmarks", "colour", "regions", "hotspots"];
const seedRange = [-(2 ** 31), 2 ** 32 - 1] as const; // what randomSource reads as 32 bits without a collision (seed >>> 0)

/**
 * Checks a parsed recipe file and returns it typed. Every bad field gives its own message (with
 * its path and value), unknown fields are named, and all of them are thrown together in one
 * `RecipeError`; a recipe of a newer schema version is refused before anything else is read.
 * Landmark rules under their earlier names (`greedy`, `random`) are read as today's names.
 * Checks the recipe alone: whether its columns exist is `recipeTableProblems`'s question.
 */
export function validateRecipe(json: unknown): Recipe {
  if (!isObject(json)) throw new RecipeError([`expected a JSON object, got ${Array.isArray(json) ? "a list" : JSON.stringify(json)}`]);
  const version = json.shoalRecipe;
  if (version === undefined) throw new RecipeError(["missing field: shoalRecipe (this is not a shoal recipe)"]);
  if (typeof version === "number" && Number.isInteger(version) && version > recipeSchemaVersion) {
    throw new RecipeError([`recipe schema version ${version} is newer than this shoal reads (${recipeSchemaVersion}): use a newer shoal`]);
  }
  const problems: Problems = [];
  objectField(problems, "", json, topKeys, ["hotspots"]);
  if (version !== recipeSchemaVersion) bad(problems, "shoalRecipe", `${recipeSchemaVersion}`, version);
  if (typeof json.writtenBy !== "string") bad(problems, "writtenBy", "a text", json.writtenBy);
  checkInput(problems, json.input);
  checkReading(problems, json.reading);
  const columns = checkColumns(problems, json.columns);
  oneOf(problems, "missing", json.missing, missingPolicies);
  oneOf(problems, "scale", json.scale, scaleNames);
  oneOf(problems, "metric", json.metric, metricNames);
  if (!(typeof json.radius === "number" && json.radius > 0 && Number.isFinite(json.radius))) bad(problems, "radius", "a positive number", json.radius);
  const landmarks = objectField(problems, "landmarks", json.landmarks, ["rule", "seed"]);
  if (landmarks) {
    oneOf(problems, "landmarks.rule", landmarks.rule, [...landmarkRules, ...Object.keys(landmarkRuleAliases)]);
    integer(problems, "landmarks.seed", landmarks.seed, ...seedRange);
  }
  const regionNames = checkRegions(problems, json.regions);
  checkColour(problems, json.colour, regionNames);
  if (json.hotspots !== undefined) checkHotspots(problems, json.hotspots, columns?.outcomes);
  if (problems.length > 0) throw new RecipeError(problems);
  const recipe = json as unknown as Recipe;
  const rule = recipe.landmarks.rule as string;
  return Object.hasOwn(landmarkRuleAliases, rule) ? { ...recipe, landmarks: { ...recipe.landmarks, rule: landmarkRuleAliases[rule]! } } : recipe;
}

function checkInput(problems: Problems, value: unknown): void {
  const input = objectField(problems, "input", value, ["name", "bytes", "sha256"]);
  if (!input) return;
  text(problems, "input.name", input.name);
  integer(problems, "input.bytes", input.bytes, 0, Number.MAX_SAFE_INTEGER);
  if (typeof input.sha256 !== "string" || !/^[0-9a-f]{64}$/.test(input.sha256)) bad(problems, "input.sha256", "64 lowercase hexadecimal digits", input.sha256);
}

function checkReading(problems: Problems, value: unknown): void {
  const reading = objectField(problems, "reading", value, ["delimiter", "decimal", "encoding", "ragged"]);
  if (!reading) return;
  oneOfOrNull(problems, "reading.delimiter", reading.delimiter, Object.values(delimiterNames));
  oneOfOrNull(problems, "reading.decimal", reading.decimal, [".", ","]);
  oneOfOrNull(problems, "reading.encoding", reading.encoding, ["utf-8", "windows-1252"]);
  oneOf(problems, "reading.ragged", reading.ragged, ["reject", "pad"]);
}

function checkColumns(problems: Problems, value: unknown): { outcomes: readonly string[] | undefined } | undefined {
  const columns = objectField(problems, "columns", value, ["features", "id", "outcomes", "oneHot", "weights"]);
  if (!columns) return undefined;
  // a list that is itself bad is left out of the checks across lists, so it gives one message only
  const features = names(problems, "columns.features", columns.features);
  const id = textOrNull(problems, "columns.id", columns.id);
  const outcomes = names(problems, "columns.outcomes", columns.outcomes);
  const oneHot = names(problems, "columns.oneHot", columns.oneHot);
  const roles: [string, readonly string[]][] = [["features", features ?? []], ["oneHot", oneHot ?? []], ["outcomes", outcomes ?? []], ["id", typeof id === "string" ? [id] : []]];
  for (let a = 0; a < roles.length; ++a) {
    for (let b = a + 1; b < roles.length; ++b) {
      for (const name of roles[a]![1]) if (roles[b]![1].includes(name)) problems.push(`columns: ${name} is in both ${roles[a]![0]} and ${roles[b]![0]}`);
    }
  }
  if (isObject(columns.weights)) {
    for (const [name, weight] of Object.entries(columns.weights as Json)) {
      if (!(typeof weight === "number" && weight >= 0 && Number.isFinite(weight))) bad(problems, `columns.weights.${name}`, "a number of at least 0", weight);
      else if (features && oneHot && !features.includes(name) && !oneHot.includes(name)) problems.push(`columns.weights: ${name} is not a feature`);
    }
  } else if ("weights" in columns) bad(problems, "columns.weights", "an object of column name to weight", columns.weights);
  return { outcomes };
}

function checkRegions(problems: Problems, value: unknown): string[] {
  if (!Array.isArray(value)) return bad(problems, "regions", "a list", value) ?? [];
  const seen: string[] = [];
  value.forEach((entry: unknown, k) => {
    const path = `regions[${k}]`;
    const region = objectField(problems, path, entry, ["name", "records"]);
    if (!region) return;
    const name = text(problems, `${path}.name`, region.name);
    if (name !== undefined && seen.includes(name)) problems.push(`${path}.name: a second region named ${JSON.stringify(name)}`);
    if (name !== undefined) seen.push(name);
    const records = region.records;
    const ascending = Array.isArray(records) && records.every((r, j) => typeof r === "number" && Number.isSafeInteger(r) && r >= 1 && (j === 0 || r > (records[j - 1] as number)));
    if (!ascending) bad(problems, `${path}.records`, "record numbers from 1, ascending, each once", records);
  });
  return seen;
}

function checkColour(problems: Problems, value: unknown, regionNames: readonly string[]): void {
  const colour = objectField(problems, "colour", value, ["kind", "name", "level"]);
  if (!colour) return;
  const kind = oneOf(problems, "colour.kind", colour.kind, ["none", "column", "levels", "region"]);
  if (kind === "none" && colour.name !== null) bad(problems, "colour.name", "null when colour.kind is none", colour.name);
  if (kind !== undefined && kind !== "none") {
    const name = text(problems, "colour.name", colour.name);
    if (kind === "region" && name !== undefined && !regionNames.includes(name)) problems.push(`colour.name: no region named ${JSON.stringify(name)}`);
  }
  textOrNull(problems, "colour.level", colour.level);
}

function checkHotspots(problems: Problems, value: unknown, outcomes: readonly string[] | undefined): void {
  const hotspots = objectField(problems, "hotspots", value, ["column", "direction", "maxNodes", "replicates", "score", "scanSeed", "stabilitySeeds"]);
  if (!hotspots) return;
  const column = text(problems, "hotspots.column", hotspots.column);
  if (column !== undefined && outcomes && !outcomes.includes(column)) problems.push(`hotspots.column: ${column} is not one of columns.outcomes`);
  oneOf(problems, "hotspots.direction", hotspots.direction, ["high", "low", "both"]);
  integer(problems, "hotspots.maxNodes", hotspots.maxNodes, 1, hotspotDefaults.maxNodesLimit);
  integer(problems, "hotspots.replicates", hotspots.replicates, 0, Number.MAX_SAFE_INTEGER);
  oneOf(problems, "hotspots.score", hotspots.score, ["auto", "bernoulli", "normal", "rank"]);
  integer(problems, "hotspots.scanSeed", hotspots.scanSeed, ...seedRange);
  integer(problems, "hotspots.stabilitySeeds", hotspots.stabilitySeeds, 0, 1000);
}
