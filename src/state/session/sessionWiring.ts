import type { Recipe } from "../../core/index.ts";
import type { TableSource } from "../../worker/protocol.ts";
import { createHistoryActions, type HistoryActions, type RecipeBridge } from "../history/historyActions.ts";
import { recipeFromState } from "../recipeFromState.ts";
import { recipePatch, type RecipeOutcome } from "../recipeActions.ts";
import { sameBuild } from "../history/sameBuild.ts";
import type { WorkbenchStore } from "../store.ts";
import { createSessionActions, type SessionActions } from "./sessionActions.ts";
import { idbSessionStorage, type SessionStorage } from "./sessionStore.ts";

export interface KeepingEnvironment {
  readonly applyRecipe: (recipe: Recipe, options: { readonly allowOtherFile: boolean }) => Promise<RecipeOutcome>;
  readonly loadDemo: () => Promise<void>;
  readonly loadFile: (file: Blob & { readonly name: string }) => Promise<void>;
  readonly loadedSource: () => TableSource | null;
  /** A fresh region id (never reused in the session), for regions a recipe brings back. */
  readonly takeRegionId: () => number;
  readonly storage?: SessionStorage;
  /** Wait after a change before the session is written (default 500 ms). */
  readonly saveDelayMs?: number;
}

/**
 * Undo/redo and the kept session over the recipe's two directions. The fingerprint check is the
 * session's own (it asks before applying), so the recipe is applied with `allowOtherFile`; a
 * recipe that differs from the state's only in what is drawn over the graph is set without a rebuild.
 * In a page, the pending change is written when the page is hidden or left.
 */
export type KeepingActions = HistoryActions & SessionActions;

export function createKeepingActions(store: WorkbenchStore, env: KeepingEnvironment): KeepingActions {
  const recipes: RecipeBridge = {
    recipeOf: recipeFromState,
    apply: async (recipe) => {
      const s = store.getState();
      const now = recipeFromState(s);
      // only colour, regions or hotspot settings differ: set them, and keep the graph (no rebuild)
      if (now && sameBuild(now, recipe)) {
        try {
          store.setState({ ...recipePatch(s, recipe, env.takeRegionId), selection: s.selection, selectedNode: s.selectedNode });
          return null;
        } catch (error) {
          return error instanceof Error ? error.message : String(error);
        }
      }
      const outcome = await env.applyRecipe(recipe, { allowOtherFile: true });
      return outcome.kind === "refused" ? outcome.message : outcome.kind === "other-file" ? outcome.line : null;
    },
  };
  const history = createHistoryActions(store, recipes);
  const session = createSessionActions(store, { storage: env.storage ?? idbSessionStorage(), recipes, loadDemo: env.loadDemo, loadFile: env.loadFile, loadedSource: env.loadedSource, ...(env.saveDelayMs === undefined ? {} : { saveDelayMs: env.saveDelayMs }) });
  store.subscribe((state, previous) => {
    if (previous.sessionRestore.state !== "none" && state.sessionRestore.state === "none") history.restartHistory();
  });
  if (typeof document !== "undefined") {
    const flush = (): void => void session.flushSession();
    window.addEventListener("pagehide", flush);
    document.addEventListener("visibilitychange", () => document.visibilityState === "hidden" && flush());
  }
  return { ...history, ...session };
}
