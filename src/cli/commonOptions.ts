import type { RecipeUse } from "./recipeOptions.ts";
import { maybeLandmarkRule, maybeMetric, maybeMissingPolicy, maybeScale, parseNumber, type CoverParams, type ParsedTable } from "../core/index.ts";

/**
 * The data and landmark options every headless command shares, as node:util parseArgs options.
 * No defaults here: an option not typed stays undefined, so a recipe's value can fill it, and
 * `readCommonOptions` fills the rest with the defaults.
 */
export const commonOptionSpec = {
  columns: { type: "string" },
  id: { type: "string" },
  outcome: { type: "string" },
  scale: { type: "string" },
  metric: { type: "string" },
  landmarks: { type: "string" },
  seed: { type: "string" },
  missing: { type: "string" },
  weights: { type: "string" },
  "one-hot": { type: "string" },
} as const;

export const commonUsage = `  --columns a,b,c     feature columns (default: every numeric column but the id and outcomes)
  --id COLUMN         row label column (never a feature)
  --outcome a,b       outcome columns (never features)
  --scale S           none | zscore | minmax | robust (default zscore)
  --metric M          euclidean | manhattan | chebyshev | cosine | correlation (default euclidean)
  --landmarks L       greedy-file-order | greedy-shuffled (seeded order) | maximin (default greedy-file-order;
                      the earlier names greedy and random still work)
  --seed N            integer seed for greedy-shuffled and maximin (default 1)
  --missing P         drop | median | mean: rows with a missing feature value (default drop)
  --weights a=2,b=0.5 factor per feature after scaling (default 1); for a one-hot column, the indicator's value
  --one-hot a,b       categorical columns used as features, one 0/1 column per level (not scaled)`;

export interface CommonOptions {
  /** Feature columns, or null for every numeric column except the id and outcomes. */
  readonly columns: readonly string[] | null;
  readonly idColumn: string | null;
  readonly outcomes: readonly string[];
  readonly params: Omit<CoverParams, "features" | "radius">;
  /** The --recipe read, its file, and --save-recipe / --allow-other-file (absent: none of them). */
  readonly recipe?: RecipeUse;
}

/** Comma-separated names, trimmed, empty ones dropped. */
export function listOption(text: string | undefined): string[] {
  return (text ?? "").split(",").map((s) => s.trim()).filter((s) => s !== "");
}

/** Checks and normalizes the shared options (numbers by parseNumber, as the table's cells); throws one clear message for anything wrong. */
export function readCommonOptions(values: { readonly [K in keyof typeof commonOptionSpec]?: string | undefined }, recipe?: RecipeUse): CommonOptions {
  const seed = parseNumber(values.seed ?? "1");
  if (!Number.isInteger(seed)) throw new Error(`invalid seed: ${values.seed}`);
  return {
    columns: values.columns === undefined ? null : listOption(values.columns),
    idColumn: values.id ?? null,
    outcomes: listOption(values.outcome),
    params: {
      scale: maybeScale(values.scale ?? "zscore"),
      metric: maybeMetric(values.metric ?? "euclidean").name,
      landmarks: maybeLandmarkRule(values.landmarks ?? "greedy-file-order"),
      seed,
      missing: maybeMissingPolicy(values.missing ?? "drop"),
      weights: parseWeights(listOption(values.weights)),
      ...(values["one-hot"] === undefined ? {} : { oneHot: listOption(values["one-hot"]) }),
    },
    ...(recipe ? { recipe } : {}),
  };
}

/**
 * The feature columns for a parsed table: the named ones, else every numeric column but the id and
 * outcomes. Throws for a named column that does not exist, for a feature (numeric or one-hot) that
 * is also the --id or an --outcome column, and for a --weights name that is not a feature.
 */
export function resolveFeatures(table: ParsedTable, options: CommonOptions): string[] {
  const oneHot = options.params.oneHot ?? [];
  for (const name of [...(options.columns ?? []), ...oneHot, ...options.outcomes, ...(options.idColumn ? [options.idColumn] : [])]) {
    if (!table.columns.some((c) => c.name === name)) throw new Error(`unknown column: ${name}`);
  }
  const features = options.columns
    ? [...options.columns]
    : table.columns.filter((c) => c.kind === "numeric" && c.name !== options.idColumn && !options.outcomes.includes(c.name)).map((c) => c.name);
  for (const [flag, names] of [["--columns", options.columns ?? []], ["--one-hot", oneHot]] as const) {
    for (const name of names) {
      if (name === options.idColumn) throw new Error(`${flag} includes the --id column: ${name}`);
      if (options.outcomes.includes(name)) throw new Error(`${flag} includes an --outcome column: ${name}`);
    }
  }
  for (const name of Object.keys(options.params.weights ?? {})) {
    if (!table.columns.some((c) => c.name === name)) throw new Error(`unknown column in --weights: ${name}`);
    if (!features.includes(name) && !oneHot.includes(name)) throw new Error(`--weights names a column that is not a feature: ${name}`);
  }
  return features;
}

function parseWeights(pairs: readonly string[]): Record<string, number> {
  const weights: Record<string, number> = {};
  for (const pair of pairs) {
    const at = pair.lastIndexOf("=");
    const name = pair.slice(0, at).trim();
    const weight = parseNumber(pair.slice(at + 1));
    if (at <= 0 || !(weight >= 0)) throw new Error(`invalid weight: ${pair}`);
    weights[name] = weight;
  }
  return weights;
}
