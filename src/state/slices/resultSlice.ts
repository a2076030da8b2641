import type { BuildPhase, CoverResult } from "../../core/index.ts";

export interface BuildStatus {
  readonly state: "idle" | "running" | "done" | "failed";
  readonly phase: BuildPhase | null;
  readonly fraction: number;
  readonly error: string | null;
  /** Wall time from request to answer, in milliseconds, for the latest finished build. */
  readonly elapsedMs: number | null;
}

export interface ResultSlice {
  readonly result: CoverResult | null;
  readonly build: BuildStatus;
  /** The default rule's radius for the current table, metric and scaling (NaN before it is known). */
  readonly suggestedRadius: number;
}

export const initialResult: ResultSlice = {
  result: null,
  build: { state: "idle", phase: null, fraction: 0, error: null, elapsedMs: null },
  suggestedRadius: NaN,
};
