import type { CoverResult } from "../cover/buildCover.ts";
import type { ParsedTable } from "../table/types.ts";
import type { HotspotOptions, HotspotScan } from "./types.ts";

/** Outcome hotspots on a cover graph (placeholder: the engine lands with its tests). */
export function scanHotspots(_parsed: ParsedTable, _result: CoverResult, _options: HotspotOptions): HotspotScan {
  throw new Error("hotspot scan not built yet");
}
