import { memoizeLast } from "./memoizeLast.ts";
import { selectRegionRows } from "./selectors.ts";
import type { RegionPaneStatus } from "./slices/regionPaneSlice.ts";
import type { NamedRegion } from "./slices/selectionSlice.ts";
import type { WorkbenchState } from "./store.ts";

/** What the region pane explains: the active region, else the selection's rows (named "selection"), and what it is set against. */
export interface ExplainedRegion {
  /** The named region's id; null for the unkept selection. */
  readonly id: number | null;
  readonly name: string;
  /** 0-based parsed-table rows, ascending. */
  readonly rows: Uint32Array;
  /** "A vs B": the other named region; null for "A vs rest". */
  readonly versus: NamedRegion | null;
}

const memoExplained = memoizeLast(
  (regions: readonly NamedRegion[], activeId: number | null, selectionRows: Uint32Array | null, versusId: number | null): ExplainedRegion | null => {
    const active = regions.find((r) => r.id === activeId);
    const versus = regions.find((r) => r.id === versusId && r.id !== activeId) ?? null;
    if (active) return { id: active.id, name: active.name, rows: active.rows, versus };
    if (selectionRows && selectionRows.length > 0) return { id: null, name: "selection", rows: selectionRows, versus };
    return null;
  },
);

/** The region the pane explains, or null when no region is active and no node is selected. */
export const selectExplainedRegion = (s: WorkbenchState): ExplainedRegion | null =>
  memoExplained(s.regions, s.activeRegionId, selectRegionRows(s), s.versusRegionId);

/** The worker's table when it belongs to the explained region, its comparison and the current build; else an idle status. */
export function selectRegionPane(s: WorkbenchState): RegionPaneStatus {
  const explained = selectExplainedRegion(s);
  const pane = s.regionPane;
  const current = explained !== null && pane.result === s.result && pane.rows === explained.rows && pane.versus === (explained.versus?.rows ?? null);
  return current ? pane : idlePane;
}

const idlePane: RegionPaneStatus = { rows: null, versus: null, result: null, state: "idle", table: null, curves: [], error: null };
