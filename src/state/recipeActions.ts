import {
  isRecipeInput,
  parseRecipe,
  recipeToJson,
  maybeDelimiter,
  otherFileLine,
  RecipeError,
  recipeTableProblems,
  type ByteReadOptions,
  type Recipe,
  type RecipeReading,
} from "../core/index.ts";
import { fileStem } from "./answerError.ts";
import { levelsColor, regionColor } from "./colorChoices.ts";
import { recipeFromState } from "./recipeFromState.ts";
import type { ColumnRole } from "./slices/paramsSlice.ts";
import type { NamedRegion } from "./slices/selectionSlice.ts";
import type { WorkbenchState, WorkbenchStore } from "./store.ts";

export interface RecipeEnvironment {
  /** A fresh region id (never reused in the session). */
  readonly takeRegionId: () => number;
  /** Reads the current file again with these reading options; resolves once the table is in. */
  readonly reload: (options: ByteReadOptions) => Promise<void>;
  /** Sets the radius as a typed one (it wins over a default radius on its way) and rebuilds. */
  readonly setRadius: (radius: number) => Promise<void>;
}

/** What became of a recipe: applied; held back because it was made on another file (`line` names both fingerprints); or refused, with nothing changed. */
export type RecipeOutcome =
  | { readonly kind: "applied" }
  | { readonly kind: "other-file"; readonly line: string }
  | { readonly kind: "refused"; readonly message: string };

export interface ApplyRecipeOptions {
  /** Apply a recipe made on another file anyway (after the warning). */
  readonly allowOtherFile?: boolean;
}

/** The reading options a recipe asks for, as the reader takes them (absent: detected). */
export function recipeReadOptions(reading: RecipeReading): ByteReadOptions {
  return {
    ...(reading.delimiter === null ? {} : { delimiter: maybeDelimiter(reading.delimiter) }),
    ...(reading.decimal === null ? {} : { decimal: reading.decimal }),
    ...(reading.encoding === null ? {} : { encoding: reading.encoding }),
    ...(reading.ragged === "reject" ? {} : { ragged: reading.ragged }),
  };
}

const sameReading = (a: ByteReadOptions, b: ByteReadOptions): boolean =>
  a.delimiter === b.delimiter && a.decimal === b.decimal && a.encoding === b.encoding && (a.ragged ?? "reject") === (b.ragged ?? "reject");

/**
 * The whole change a recipe makes to the loaded table's state, in one patch: roles, weights,
 * parameters, colour, regions (new ids from `takeRegionId`), hotspot settings; the selection is
 * cleared. Throws one `RecipeError` listing every way the recipe does not fit the table, before
 * anything is taken from `takeRegionId`.
 */
export function recipePatch(s: WorkbenchState, recipe: Recipe, takeRegionId: () => number): Partial<WorkbenchState> {
  if (!s.table) throw new RecipeError(["no table is loaded"]);
  const problems = recipeTableProblems(recipe, s.table);
  if (problems.length > 0) throw new RecipeError(problems);
  const { features, id, outcomes, oneHot, weights } = recipe.columns;
  const roles: Record<string, ColumnRole> = {};
  for (const column of s.table.columns) {
    const name = column.name;
    roles[name] = name === id ? "id" : features.includes(name) || oneHot.includes(name) ? "feature" : outcomes.includes(name) ? "outcome" : "ignore";
  }
  const regions: NamedRegion[] = recipe.regions.map((r) => ({ id: takeRegionId(), name: r.name, rows: Uint32Array.from(r.records, (record) => record - 1) }));
  const { colour, hotspots } = recipe;
  const colouredRegion = colour.kind === "region" ? regions.find((r) => r.name === colour.name) : undefined;
  const colorBy = colour.kind === "none" || colour.name === null ? null : colouredRegion ? regionColor(colouredRegion.id) : colour.kind === "levels" ? levelsColor(colour.name) : colour.name;
  return {
    roles, weights: { ...weights }, scale: recipe.scale, metric: recipe.metric, radius: recipe.radius, landmarks: recipe.landmarks.rule, seed: recipe.landmarks.seed,
    missing: recipe.missing, colorBy, colorLevel: colorBy === null ? null : colour.level,
    regions, activeRegionId: null, selection: [], selectedNode: null,
    ...(hotspots
      ? {
          hotspotColumn: hotspots.column, hotspotDirection: hotspots.direction, hotspotMaxNodes: hotspots.maxNodes, hotspotReplicates: hotspots.replicates,
          hotspotScore: hotspots.score, hotspotScanSeed: hotspots.scanSeed, hotspotStabilitySeeds: hotspots.stabilitySeeds,
        }
      : {}),
  };
}

/** "Open recipe": applies a checked recipe to the loaded table, all or nothing, then builds at its radius. */
export function createRecipeActions(store: WorkbenchStore, env: RecipeEnvironment) {
  const refused = (error: unknown): RecipeOutcome => ({ kind: "refused", message: error instanceof Error ? error.message : String(error) });

  async function applyRecipe(recipe: Recipe, { allowOtherFile = false }: ApplyRecipeOptions = {}): Promise<RecipeOutcome> {
    const before = store.getState();
    if (!before.table || !before.source) return { kind: "refused", message: `no table is loaded: open ${recipe.input.name} first, then the recipe` };
    const fingerprint = before.inputFingerprint ?? { bytes: before.source.fileSize, sha256: "unknown" };
    if (!allowOtherFile && !isRecipeInput(recipe.input, fingerprint)) return { kind: "other-file", line: otherFileLine(recipe.input, before.source.fileName, fingerprint) };
    const reading = recipeReadOptions(recipe.reading);
    if (!sameReading(reading, before.readOptions)) {
      // the columns are known only after reading again; on a misfit, read back and restore what was there
      const previous = recipeFromState(before);
      const previousReading = before.readOptions;
      await env.reload(reading);
      try {
        const reread = store.getState();
        if (reread.loadStatus !== "ready") throw new RecipeError([`the file could not be read with the recipe's reading options: ${reread.loadError ?? "reading stopped"}`]);
        store.setState(recipePatch(reread, recipe, env.takeRegionId));
      } catch (error) {
        await env.reload(previousReading);
        if (previous) {
          store.setState(recipePatch(store.getState(), previous, env.takeRegionId));
          await env.setRadius(previous.radius);
        }
        return refused(error);
      }
    } else {
      try {
        store.setState(recipePatch(before, recipe, env.takeRegionId));
      } catch (error) {
        return refused(error);
      }
    }
    await env.setRadius(recipe.radius);
    return { kind: "applied" };
  }

  return {
    applyRecipe,
    /** "Open recipe": a recipe file's text, checked, then applied as `applyRecipe` does; a damaged file is refused whole. */
    async openRecipe(text: string, options: ApplyRecipeOptions = {}): Promise<RecipeOutcome> {
      let recipe: Recipe;
      try {
        recipe = parseRecipe(text);
      } catch (error) {
        return refused(error);
      }
      return applyRecipe(recipe, options);
    },
    /** "Save recipe": the file to offer (named after the table) and its text, or null while nothing is built from a hashed table. */
    recipeFile(): { readonly fileName: string; readonly text: string } | null {
      const s = store.getState();
      const recipe = recipeFromState(s);
      return recipe && s.source ? { fileName: `${fileStem(s.source.fileName)}.recipe.json`, text: recipeToJson(recipe) } : null;
    },
  };
}

export type RecipeActions = ReturnType<typeof createRecipeActions>;
