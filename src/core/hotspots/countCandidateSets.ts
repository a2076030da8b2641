import type { CoverResult } from "../cover/buildCover.ts";
import type { ParsedTable } from "../table/types.ts";

/** Exact size of the flexibly shaped candidate family for K = maxNodes (placeholder: lands with the engine). */
export function countCandidateSets(_parsed: ParsedTable, _result: CoverResult, _maxNodes: number): number {
  throw new Error("candidate count not built yet");
}
