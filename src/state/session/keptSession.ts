import { validateRecipe, type Recipe } from "../../core/index.ts";
import type { KeptFile, LayoutPositions } from "../slices/sessionSlice.ts";
import type { WorkbenchState } from "../store.ts";

/** Version of the session record this code writes and reads; an unknown one is not restored. */
export const keptSessionVersion = 1;

/** What the workbench keeps of a session between visits (the table's bytes, when kept, sit in a key of their own). */
export interface KeptSession {
  readonly keptSession: typeof keptSessionVersion;
  readonly file: KeptFile;
  readonly recipe: Recipe;
  /** 0-based nodes of the recipe's build. */
  readonly selection: readonly number[];
  readonly activeRegion: string | null;
  readonly layout: LayoutPositions | null;
  /** True when the user chose to keep the table's bytes in this browser. */
  readonly keptTable: boolean;
}

/** The record of the state, or null while there is nothing worth keeping (no table or no recipe yet). */
export function keptSessionOf(s: WorkbenchState, recipeOf: (state: WorkbenchState) => Recipe | null): KeptSession | null {
  const recipe = recipeOf(s);
  if (!recipe || !s.source) return null;
  // a selection names nodes of a build: while another is on its way it names nothing
  const selection = s.build.state === "running" ? [] : [...s.selection];
  return {
    keptSession: keptSessionVersion,
    file: { name: s.source.fileName, bytes: recipe.input.bytes, sha256: recipe.input.sha256, isDemo: s.source.isDemo },
    recipe,
    selection,
    activeRegion: s.regions.find((r) => r.id === s.activeRegionId)?.name ?? null,
    layout: s.layoutPositions,
    keptTable: s.keepTable && !s.source.isDemo,
  };
}

const isNumbers = (value: unknown): value is number[] => Array.isArray(value) && value.every((v) => typeof v === "number" && Number.isFinite(v));

/** Checks a record read back from IndexedDB (another version of the page may have written it); throws a short reason. */
export function maybeKeptSession(value: unknown): KeptSession {
  if (typeof value !== "object" || value === null) throw new Error(`not a kept session: ${JSON.stringify(value)}`);
  const record = value as Record<string, unknown>;
  if (record.keptSession !== keptSessionVersion) throw new Error(`unknown kept session version: ${JSON.stringify(record.keptSession)}`);
  const file = record.file as Record<string, unknown> | undefined;
  if (!file || typeof file.name !== "string" || typeof file.bytes !== "number" || typeof file.isDemo !== "boolean" || !(file.sha256 === null || typeof file.sha256 === "string")) {
    throw new Error("kept session: bad file");
  }
  const recipe = validateRecipe(record.recipe);
  if (!isNumbers(record.selection)) throw new Error("kept session: bad selection");
  if (!(record.activeRegion === null || typeof record.activeRegion === "string")) throw new Error("kept session: bad active region");
  const layout = record.layout as Record<string, unknown> | null;
  const goodLayout = layout === null || (isNumbers(layout.landmarks) && isNumbers(layout.x) && isNumbers(layout.y) && layout.x.length === layout.landmarks.length && layout.y.length === layout.x.length);
  if (!goodLayout) throw new Error("kept session: bad layout");
  if (typeof record.keptTable !== "boolean") throw new Error("kept session: bad kept-table flag");
  return { ...(value as KeptSession), recipe };
}
