import {
  delimiterNames,
  isRecipeInput,
  otherFileLine,
  recipeSchemaVersion,
  recipeToJson,
  shoalVersion,
  validateRecipe,
  type ByteReadOptions,
  type CoverParams,
  type FileFingerprint,
  type Recipe,
  type RecipeHotspots,
  type Region,
} from "../core/index.ts";
import type { CommonOptions } from "./commonOptions.ts";
import { noRecipe, type RecipeUse } from "./recipeOptions.ts";
import { writeFileWhole } from "./writeFileWhole.ts";

/** True when the run needs the input's fingerprint: to check it against --recipe, or to write --save-recipe. */
export const needsFingerprint = (use: RecipeUse = noRecipe): boolean => use.recipe !== null || use.saveTo !== null;

/**
 * Checks the input against the recipe's fingerprint: another file is an error (one line naming both
 * fingerprints, so exit code 2) unless --allow-other-file, which prints the same line as a warning.
 */
export function checkRecipeInput(use: RecipeUse = noRecipe, fileName: string, fingerprint: FileFingerprint | null, warn: (line: string) => void = (line) => console.error(line)): void {
  if (!use.recipe || !fingerprint || isRecipeInput(use.recipe.input, fingerprint)) return;
  const line = otherFileLine(use.recipe.input, fileName, fingerprint);
  if (!use.allowOtherFile) throw new Error(`${line}; add --allow-other-file to apply it anyway`);
  warn(`shoal: warning: ${line}`);
}

/** The recipe's regions as 0-based rows of a table of `rowsRead` records; a record past the last is an error naming it. */
export function recipeRegionRows(use: RecipeUse = noRecipe, rowsRead: number): Region[] {
  return (use.recipe?.regions ?? []).map((region) => {
    const past = region.records.find((record) => record > rowsRead);
    if (past !== undefined) throw new Error(`the recipe's region ${region.name} names record ${past}, past the table's last record (${rowsRead})`);
    return { name: region.name, rows: Uint32Array.from(region.records, (record) => record - 1) };
  });
}

export interface RunFacts {
  readonly fileName: string;
  readonly fingerprint: FileFingerprint;
  readonly read: ByteReadOptions;
  /** The parameters the run used (resolved features, the radius it built at or would build at). */
  readonly params: CoverParams;
  readonly regions: readonly Region[];
  /** The scan's settings for `hotspots`; absent elsewhere (the recipe's own are kept while their column is an outcome). */
  readonly hotspots?: RecipeHotspots;
}

/**
 * The recipe of a headless run, as the workbench would write it for the same settings: features
 * resolved, the radius used, regions by record number; the colour is the --recipe's (none without).
 */
export function recipeOfRun(command: CommonOptions, facts: RunFacts): Recipe {
  const { params, read } = facts;
  const given = command.recipe?.recipe ?? null;
  const hotspots = facts.hotspots ?? (given?.hotspots && command.outcomes.includes(given.hotspots.column) ? given.hotspots : undefined);
  const regionNames = facts.regions.map((r) => r.name);
  const colour = given && (given.colour.kind !== "region" || regionNames.includes(given.colour.name ?? "")) ? given.colour : { kind: "none" as const, name: null, level: null };
  const recipe: Recipe = {
    shoalRecipe: recipeSchemaVersion,
    writtenBy: `shoal ${shoalVersion}`,
    input: { name: facts.fileName, bytes: facts.fingerprint.bytes, sha256: facts.fingerprint.sha256 },
    reading: { delimiter: read.delimiter === undefined ? null : delimiterNames[read.delimiter], decimal: read.decimal ?? null, encoding: read.encoding ?? null, ragged: read.ragged ?? "reject" },
    columns: { features: [...params.features], id: command.idColumn, outcomes: [...command.outcomes], oneHot: [...(params.oneHot ?? [])], weights: { ...params.weights } },
    missing: params.missing ?? "drop",
    scale: params.scale,
    metric: params.metric,
    radius: params.radius,
    landmarks: { rule: params.landmarks, seed: params.seed },
    colour,
    regions: facts.regions.map((region) => ({ name: region.name, records: Array.from(region.rows, (row) => row + 1).sort((a, b) => a - b) })),
    ...(hotspots ? { hotspots } : {}),
  };
  return validateRecipe(JSON.parse(recipeToJson(recipe)));
}

/**
 * The run's recipe when --save-recipe asks for it, else null: made (and checked) before any output
 * is written, so a recipe that cannot be written stops the run before it changes anything.
 */
export const recipeToSave = (use: RecipeUse = noRecipe, recipe: () => Recipe): Recipe | null => (use.saveTo === null ? null : recipe());

/** Writes --save-recipe, whole or not at all; returns the note for the command's one-line account ("" without it). */
export async function saveRecipe(use: RecipeUse = noRecipe, recipe: Recipe | null): Promise<string> {
  if (use.saveTo === null || recipe === null) return "";
  await writeFileWhole(use.saveTo, recipeToJson(recipe));
  return `; recipe ${use.saveTo}`;
}
