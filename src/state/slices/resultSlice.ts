import type { BuildPhase, CoverResult } from "../../core/index.ts";
import type { NodeColumnStats } from "../../worker/protocol.ts";

export interface BuildStatus {
  readonly state: "idle" | "running" | "done" | "failed";
  readonly phase: BuildPhase | null;
  readonly fraction: number;
  readonly error: string | null;
  /** Wall time from request to answer, in milliseconds, for the latest finished build. */
  readonly elapsedMs: number | null;
}

/** Member statistics of one node of one result, computed by the worker when the node is opened. */
export interface NodeStatsStatus {
  /** The result and node they belong to; statistics of another result or node are not shown. */
  readonly result: CoverResult | null;
  readonly node: number | null;
  readonly state: "idle" | "running" | "done" | "failed";
  readonly columns: readonly NodeColumnStats[];
  readonly error: string | null;
}

export interface ExportStatus {
  readonly state: "idle" | "running" | "failed";
  readonly error: string | null;
}

export interface ResultSlice {
  readonly result: CoverResult | null;
  readonly build: BuildStatus;
  /** The default rule's radius for the current table, metric and scaling (NaN before it is known). */
  readonly suggestedRadius: number;
  readonly nodeStats: NodeStatsStatus;
  /** The export zip being written by the worker, or why the last one failed. */
  readonly exportStatus: ExportStatus;
}

export const initialResult: ResultSlice = {
  result: null,
  build: { state: "idle", phase: null, fraction: 0, error: null, elapsedMs: null },
  suggestedRadius: NaN,
  nodeStats: { result: null, node: null, state: "idle", columns: [], error: null },
  exportStatus: { state: "idle", error: null },
};
