import { readFileSync } from "node:fs";
import { parseRecipe, type Recipe } from "../core/index.ts";
import { strictArgs, type OptionSpec, type ParsedArgs } from "./strictArgs.ts";

/** The recipe options every command takes (build, sweep, explain, hotspots, and any command parsed through `argsWithRecipe`). */
export const recipeOptionSpec = {
  recipe: { type: "string" },
  "save-recipe": { type: "string" },
  "allow-other-file": { type: "boolean" },
} as const;

export const recipeUsage = `  --recipe FILE       take every setting from a recipe; options typed here override its values one by one
  --allow-other-file  apply the recipe even if the input is not the file it was made on (a warning names both)
  --save-recipe FILE  also write this run's recipe to FILE`;

/** What a command does with recipes. */
export interface RecipeUse {
  /** The --recipe file, checked; null without --recipe. */
  readonly recipe: Recipe | null;
  readonly recipeFile: string | null;
  /** --save-recipe FILE, or null. */
  readonly saveTo: string | null;
  readonly allowOtherFile: boolean;
}

export const noRecipe: RecipeUse = { recipe: null, recipeFile: null, saveTo: null, allowOtherFile: false };

/**
 * strictArgs over `spec` plus the recipe options, with the --recipe file's settings filled in
 * under the options typed: a typed option wins, one not typed keeps the recipe's value, and
 * defaults come after (in each command's reader). Only the options `spec` has are filled, so
 * `sweep` takes no radius and only `hotspots` takes the scan settings. Throws one message for a
 * damaged recipe, a newer schema version, or a recipe option without --recipe.
 */
export function argsWithRecipe(args: readonly string[], spec: OptionSpec): ParsedArgs & { readonly recipe: RecipeUse } {
  const parsed = strictArgs(args, { ...spec, ...recipeOptionSpec });
  const { recipe: recipeFile, "save-recipe": saveTo, ...typed } = parsed.values;
  if (saveTo === "") throw new Error("invalid --save-recipe: an empty file name");
  const allowOtherFile = parsed.flags.has("allow-other-file");
  if (recipeFile === undefined) {
    if (allowOtherFile) throw new Error("--allow-other-file needs --recipe FILE");
    return { ...parsed, values: typed, recipe: { ...noRecipe, saveTo: saveTo ?? null } };
  }
  const recipe = readRecipeFile(recipeFile);
  const fromRecipe = Object.fromEntries(Object.entries(recipeValues(recipe)).filter(([name]) => name in spec));
  const values = { ...fromRecipe, ...Object.fromEntries(Object.entries(typed).filter(([, value]) => value !== undefined)) };
  return { ...parsed, values, recipe: { recipe, recipeFile, saveTo: saveTo ?? null, allowOtherFile } };
}

function readRecipeFile(path: string): Recipe {
  let text: string;
  try {
    text = readFileSync(path, "utf8");
  } catch {
    throw new Error(`cannot read recipe file: ${path}`);
  }
  try {
    return parseRecipe(text);
  } catch (error) {
    throw new Error(`${path}: ${error instanceof Error ? error.message : String(error)}`, { cause: error });
  }
}

/** A recipe's settings as the option values a person would type (lists comma-separated, numbers in shortest round-trip form). */
export function recipeValues(recipe: Recipe): Record<string, string> {
  const { columns, reading, hotspots } = recipe;
  const list = (names: readonly string[]): string => {
    const comma = names.find((name) => name.includes(","));
    if (comma !== undefined) throw new Error(`the recipe names a column with a comma, which the command line cannot carry: ${comma}`);
    return names.join(",");
  };
  const values: Record<string, string> = {
    columns: list(columns.features),
    ...(columns.id === null ? {} : { id: columns.id }),
    ...(columns.outcomes.length === 0 ? {} : { outcome: list(columns.outcomes) }),
    ...(columns.oneHot.length === 0 ? {} : { "one-hot": list(columns.oneHot) }),
    ...(Object.keys(columns.weights).length === 0 ? {} : { weights: list(Object.entries(columns.weights).map(([name, w]) => `${name}=${w}`)) }),
    scale: recipe.scale,
    metric: recipe.metric,
    landmarks: recipe.landmarks.rule,
    seed: String(recipe.landmarks.seed),
    missing: recipe.missing,
    radius: String(recipe.radius),
    ...(reading.delimiter === null ? {} : { delimiter: reading.delimiter }),
    ...(reading.decimal === null ? {} : { decimal: reading.decimal }),
    ...(reading.encoding === null ? {} : { encoding: reading.encoding }),
    ragged: reading.ragged,
  };
  if (hotspots) {
    Object.assign(values, {
      scan: hotspots.column, direction: hotspots.direction, "max-nodes": String(hotspots.maxNodes), replicates: String(hotspots.replicates),
      ...(hotspots.score === "auto" ? {} : { score: hotspots.score }), "scan-seed": String(hotspots.scanSeed), "stability-seeds": String(hotspots.stabilitySeeds),
    });
  }
  return values;
}
