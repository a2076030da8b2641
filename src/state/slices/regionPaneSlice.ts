import type { CoverResult, RegionTable } from "../../core/index.ts";
import type { RegionCurve } from "../../worker/protocol.ts";

/** The worker's region table for one pair of sides of one build. */
export interface RegionPaneStatus {
  /** What the table was asked for (compared by identity): the rows explained, the other region's rows or null for the rest, the build. */
  readonly rows: Uint32Array | null;
  readonly versus: Uint32Array | null;
  readonly result: CoverResult | null;
  readonly state: "idle" | "running" | "done" | "failed";
  readonly table: RegionTable | null;
  readonly curves: readonly RegionCurve[];
  readonly error: string | null;
}

export interface RegionPaneSlice {
  /** "A vs B": the named region the pane compares with; null for "A vs rest". */
  readonly versusRegionId: number | null;
  readonly regionPane: RegionPaneStatus;
  /** region-rows.csv being written by the worker, or why the last one failed. */
  readonly regionRowsStatus: { readonly state: "idle" | "running" | "failed"; readonly error: string | null };
}

export const initialRegionPane: RegionPaneSlice = {
  versusRegionId: null,
  regionPane: { rows: null, versus: null, result: null, state: "idle", table: null, curves: [], error: null },
  regionRowsStatus: { state: "idle", error: null },
};
