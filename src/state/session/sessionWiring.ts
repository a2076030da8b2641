import type { Recipe } from "../../core/index.ts";
import type { TableSource } from "../../worker/protocol.ts";
import { createHistoryActions, type HistoryActions, type RecipeBridge } from "../history/historyActions.ts";
import { recipeFromState } from "../recipeFromState.ts";
import type { RecipeOutcome } from "../recipeActions.ts";
import type { WorkbenchStore } from "../store.ts";
import { createSessionActions, type SessionActions } from "./sessionActions.ts";
import { idbSessionStorage, type SessionStorage } from "./sessionStore.ts";

export interface KeepingEnvironment {
  readonly applyRecipe: (recipe: Recipe, options: { readonly allowOtherFile: boolean }) => Promise<RecipeOutcome>;
  readonly loadDemo: () => Promise<void>;
  readonly loadFile: (file: Blob & { readonly name: string }) => Promise<void>;
  readonly loadedSource: () => TableSource | null;
  readonly storage?: SessionStorage;
  /** Wait after a change before the session is written (default 500 ms). */
  readonly saveDelayMs?: number;
}

/**
 * Undo/redo and the kept session over the recipe's two directions. The fingerprint check is the
 * session's own (it asks before applying), so the recipe is applied with `allowOtherFile`.
 * In a page, the pending change is written when the page is hidden or left.
 */
export type KeepingActions = HistoryActions & SessionActions;

export function createKeepingActions(store: WorkbenchStore, env: KeepingEnvironment): KeepingActions {
  const recipes: RecipeBridge = {
    recipeOf: recipeFromState,
    apply: async (recipe) => {
      const outcome = await env.applyRecipe(recipe, { allowOtherFile: true });
      return outcome.kind === "refused" ? outcome.message : outcome.kind === "other-file" ? outcome.line : null;
    },
  };
  const history = createHistoryActions(store, recipes);
  const session = createSessionActions(store, { storage: env.storage ?? idbSessionStorage(), recipes, loadDemo: env.loadDemo, loadFile: env.loadFile, loadedSource: env.loadedSource, ...(env.saveDelayMs === undefined ? {} : { saveDelayMs: env.saveDelayMs }) });
  if (typeof document !== "undefined") {
    const flush = (): void => void session.flushSession();
    window.addEventListener("pagehide", flush);
    document.addEventListener("visibilitychange", () => document.visibilityState === "hidden" && flush());
  }
  return { ...history, ...session };
}
