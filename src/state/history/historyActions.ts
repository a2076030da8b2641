import type { Recipe } from "../../core/index.ts";
import type { WorkbenchState, WorkbenchStore } from "../store.ts";
import { isSettled } from "./isSettled.ts";
import { createUndoHistory, defaultHistoryCap } from "./undoHistory.ts";
import { whenSettled } from "./whenSettled.ts";
import { snapshotKey, snapshotRecipe, workbenchSnapshot, type WorkbenchSnapshot } from "./workbenchSnapshot.ts";

/** The recipe's two directions, from wip/recipe's recipeFromState and applyRecipe. */
export interface RecipeBridge {
  readonly recipeOf: (state: WorkbenchState) => Recipe | null;
  /** Applies a recipe to the loaded table, all or nothing (rebuilding when parameters changed); resolves to why not, or null. */
  readonly apply: (recipe: Recipe) => Promise<string | null>;
}

// the fields whose change may make a new undo step (the others are views, progress or results)
const watched = [
  "roles", "scale", "metric", "radius", "landmarks", "seed", "missing", "weights", "colorBy", "colorLevel", "regions", "activeRegionId", "selection", "result", "build",
  "readOptions",
] as const satisfies readonly (keyof WorkbenchState)[];

/**
 * Undo and redo over snapshots of the recipe, the selection and the active region. A step is
 * taken whenever the store settles on a new snapshot (isSettled: never halfway through a rebuild);
 * a new table starts a new history. Undo applies the earlier recipe (a rebuild when its parameters
 * differ), then its selection and active region; nothing is recorded while a step is shown, and
 * presses during it move the cursor on, the last one shown when the running one is done.
 */
export function createHistoryActions(store: WorkbenchStore, bridge: RecipeBridge, cap = defaultHistoryCap) {
  const set = store.setState;
  const history = createUndoHistory<WorkbenchSnapshot>(snapshotKey, cap);
  let showing = false;
  let target: WorkbenchSnapshot | null = null;
  let scheduled = false;

  const publish = (): void => {
    const { undo, redo } = history.depth();
    const s = store.getState();
    if (s.undoDepth !== undo || s.redoDepth !== redo) set({ undoDepth: undo, redoDepth: redo });
  };

  function recordNow(): void {
    scheduled = false;
    const s = store.getState();
    if (showing || !isSettled(s)) return;
    const snapshot = workbenchSnapshot(s, bridge.recipeOf);
    if (snapshot && history.record(snapshot)) publish();
  }

  store.subscribe((state, previous) => {
    if (state.table !== previous.table) {
      history.reset();
      publish();
    }
    if (showing || scheduled || !watched.some((key) => state[key] !== previous[key])) return;
    // a microtask later: an action that sets parameters starts its build in the same task
    scheduled = true;
    queueMicrotask(recordNow);
  });

  function showSelection(snapshot: WorkbenchSnapshot): void {
    const s = store.getState();
    const nodes = s.result?.landmarks.length ?? 0;
    const activeRegionId = s.regions.find((r) => r.name === snapshot.activeRegion)?.id ?? null;
    set({ selection: snapshot.selection.filter((k) => k < nodes), activeRegionId });
  }

  let running: Promise<void> | null = null;

  async function showTargets(): Promise<void> {
    showing = true;
    try {
      while (target) {
        const snapshot = target;
        target = null;
        await whenSettled(store);
        const now = snapshotRecipe(store.getState(), bridge.recipeOf);
        // the same recipe (a selection step) is not applied again: no rebuild, the layout stays
        const refusal = now && JSON.stringify(now) === JSON.stringify(snapshot.recipe) ? null : await bridge.apply(snapshot.recipe);
        await whenSettled(store);
        if (refusal === null) showSelection(snapshot);
      }
    } finally {
      showing = false;
      running = null;
    }
    // the step shown is the cursor's own: recording it again changes nothing (an unequal result, say after a refusal, is a new step)
    recordNow();
  }

  /** Shows the target, or leaves it to the loop already showing one (which takes the newest target next). */
  const show = (): Promise<void> => (running ??= showTargets());

  function step(snapshot: WorkbenchSnapshot | null): Promise<void> {
    if (!snapshot) return Promise.resolve();
    publish();
    target = snapshot;
    return show();
  }

  return {
    /** Shows the step before the current one (Ctrl+Z). */
    undo: (): Promise<void> => step(history.undo()),
    /** Shows the step after the current one, if an undo went back (Ctrl+Shift+Z, Ctrl+Y). */
    redo: (): Promise<void> => step(history.redo()),
    /** Forgets every step; the state now (once settled) is the first (a restored session starts its own history). */
    restartHistory(): void {
      history.reset();
      publish();
      recordNow();
    },
  };
}

export type HistoryActions = ReturnType<typeof createHistoryActions>;
