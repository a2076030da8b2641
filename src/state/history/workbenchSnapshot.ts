import type { Recipe } from "../../core/index.ts";
import type { WorkbenchState } from "../store.ts";

/**
 * One undo step: the recipe (parameters, roles, weights, colour, named regions; no hotspot settings), the selected
 * nodes of the build it gives, and the active region by name (region ids are not kept by a recipe).
 */
export interface WorkbenchSnapshot {
  readonly recipe: Recipe;
  readonly selection: readonly number[];
  readonly activeRegion: string | null;
}

/**
 * The recipe an undo step keeps: the state's, less the hotspot settings (a recipe names them only
 * after a scan of the graph on screen, so a scan is no step, and undoing one would be undone by
 * the scan still on screen). Null while there is no recipe (no table, or no radius yet).
 */
export function snapshotRecipe(state: WorkbenchState, recipeOf: (state: WorkbenchState) => Recipe | null): Recipe | null {
  const recipe = recipeOf(state);
  if (!recipe) return null;
  const { hotspots: _hotspots, ...rest } = recipe;
  return rest;
}

/** The snapshot of the state, or null while there is no recipe. */
export function workbenchSnapshot(state: WorkbenchState, recipeOf: (state: WorkbenchState) => Recipe | null): WorkbenchSnapshot | null {
  const recipe = snapshotRecipe(state, recipeOf);
  if (!recipe) return null;
  const activeRegion = state.regions.find((r) => r.id === state.activeRegionId)?.name ?? null;
  return { recipe, selection: [...state.selection], activeRegion };
}

/** Equal snapshots have equal keys: the recipe's fields in the order the recipe writes them. */
export const snapshotKey = (snapshot: WorkbenchSnapshot): string => JSON.stringify(snapshot);
