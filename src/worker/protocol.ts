import type { BuildPhase, CoverParams, CoverResult, ParsedTable, RadiusBasis } from "../core/index.ts";

/** Requests from the main thread. Each carries an increasing id; the answer repeats it. */
export type Request =
  | { readonly id: number; readonly type: "load"; readonly text: string }
  | { readonly id: number; readonly type: "suggestRadius"; readonly params: RadiusBasis }
  | { readonly id: number; readonly type: "build"; readonly params: CoverParams };

/** Final answers. `load` returns the parsed table so the main thread can colour, summarise and export. */
export type Answer =
  | { readonly id: number; readonly type: "loaded"; readonly table: ParsedTable }
  | { readonly id: number; readonly type: "radius"; readonly radius: number }
  | { readonly id: number; readonly type: "built"; readonly result: CoverResult }
  | { readonly id: number; readonly type: "failed"; readonly message: string };

/** Sent any number of times before the answer. */
export interface Progress {
  readonly id: number;
  readonly type: "progress";
  readonly phase: BuildPhase | "parse";
  readonly fraction: number;
}

export type WorkerMessage = Answer | Progress;
