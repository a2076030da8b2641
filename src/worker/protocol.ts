import type {
  BuildPhase,
  ByteReadOptions,
  CoverParams,
  ColumnSummary,
  CoverResult,
  ExportContext,
  FileFingerprint,
  HotspotOptions,
  HotspotScan,
  ParsedTable,
  RadiusBasis,
  Region,
  RegionTable,
  RadiusSweep,
  RegionTrack,
  SeedStability,
  SweepParams,
  TableFormat,
  TableReport,
  TextEncodingName,
} from "../core/index.ts";

/** What to read: text already in memory (the demo) or a file the user dropped or picked. */
export type TableSource = { readonly kind: "text"; readonly text: string } | { readonly kind: "file"; readonly file: Blob };

/** Radius range of a sweep: an end left out comes from the default range rule. */
export interface SweepRange {
  readonly radiusMin?: number;
  readonly radiusMax?: number;
  readonly steps: number;
  /** The radius on screen; the default range is widened to contain it unless the graph there passes the range's node cap of 2,000. */
  readonly current?: number;
}

/**
 * Requests from the main thread. Each carries an increasing id; the answer repeats it.
 * "Compute" requests (builds, default radius, sweeps, seed runs, hotspot scans) share one lane: a newer one cancels the older.
 */
export type Request =
  | { readonly id: number; readonly type: "load"; readonly source: TableSource; readonly options: ByteReadOptions }
  /** Hands the worker a table the main thread already holds (after a worker restart). */
  | { readonly id: number; readonly type: "adopt"; readonly table: ParsedTable }
  | { readonly id: number; readonly type: "suggestRadius"; readonly params: RadiusBasis }
  | { readonly id: number; readonly type: "build"; readonly params: CoverParams }
  /** A radius sweep; with a selection (parsed-table rows), also its matched region per radius. */
  | { readonly id: number; readonly type: "sweep"; readonly params: SweepParams; readonly range: SweepRange; readonly selection: Uint32Array | null }
  | { readonly id: number; readonly type: "seeds"; readonly params: CoverParams; readonly seeds: number; readonly selection: Uint32Array | null }
  /** Statistics of one node's member rows (parsed-table rows) in the named numeric columns, against all rows. */
  | { readonly id: number; readonly type: "nodeStats"; readonly rows: Uint32Array; readonly columns: readonly string[] }
  /** The export zip of a result built on the worker's table. */
  | { readonly id: number; readonly type: "exportZip"; readonly result: CoverResult; readonly context: ExportContext; /** recipe.json's text, packed beside the tables. */ readonly recipe?: string }
  /**
   * The region table of `region` (parsed-table rows) against the rest of a build's used rows, or
   * against `versus`; the build's `rowsRead` and `usedRows` say which rows are on neither side.
   */
  | {
      readonly id: number;
      readonly type: "regionTable";
      readonly rowsRead: number;
      readonly usedRows: Uint32Array;
      readonly region: Uint32Array;
      readonly versus: Uint32Array | null;
      readonly labelColumn: string | null;
    }
  /** region-rows.csv: the regions' rows with their cells read again from the source the table was loaded from. */
  | {
      readonly id: number;
      readonly type: "regionRows";
      readonly source: TableSource;
      readonly format: TableFormat;
      readonly encoding: TextEncodingName | null;
      readonly regions: readonly Region[];
    }
  /** Outcome hotspots of a build on the worker's table (a compute request: progress, Cancel). */
  | { readonly id: number; readonly type: "hotspots"; readonly result: CoverResult; readonly options: HotspotSettings }
  /** The exact number of candidate sets for K = maxNodes, counted before a scan starts (cheap: a view request). */
  | { readonly id: number; readonly type: "hotspotEstimate"; readonly result: CoverResult; readonly maxNodes: number };

/** A hotspot scan's options as they cross to the worker: everything but the callbacks (progress, cancel, a clock), which cannot be posted. */
export type HotspotSettings = Omit<HotspotOptions, "onProgress" | "shouldStop" | "now">;

export type RequestType = Request["type"];

/**
 * Lanes of cancellation: index into the shared cancel flags. "view" requests (node statistics,
 * the exports) read the table for what is on screen: they neither cancel nor are cancelled by a build.
 * Region tables have a lane of their own, where (as in "compute") a newer request cancels the older.
 */
export const lane = { compute: 0, load: 1, view: 2, region: 3 } as const;
export const laneOf = (type: RequestType): number =>
  type === "load" || type === "adopt" ? lane.load : type === "regionTable" ? lane.region : type === "nodeStats" || type === "exportZip" || type === "regionRows" || type === "hotspotEstimate" ? lane.view : lane.compute;

/** One column's statistics over a node's member rows. */
export interface NodeColumnStats {
  readonly name: string;
  readonly summary: ColumnSummary;
  /** (node mean − mean of all rows) / sd of all rows. */
  readonly standardisedDifference: number;
}

/**
 * What a distribution plot of one numeric line draws: each side's values, ascending, as the worker's
 * `ecdfSample` chose them (all present values up to `ecdfPoints`, else that many quantiles).
 */
export interface RegionCurve {
  readonly column: string;
  readonly inside: Float64Array;
  readonly outside: Float64Array;
}

/** Final answers. `load` returns the parsed table so the main thread can colour, summarise and export. */
export type Answer =
  | { readonly id: number; readonly type: "loaded"; readonly table: ParsedTable; readonly report: TableReport; readonly fingerprint: FileFingerprint }
  | { readonly id: number; readonly type: "adopted" }
  | { readonly id: number; readonly type: "radius"; readonly radius: number }
  | { readonly id: number; readonly type: "built"; readonly result: CoverResult }
  | { readonly id: number; readonly type: "swept"; readonly sweep: RadiusSweep; readonly region: RegionTrack | null }
  | { readonly id: number; readonly type: "seeded"; readonly stability: SeedStability }
  | { readonly id: number; readonly type: "summarised"; readonly columns: readonly NodeColumnStats[] }
  /** The zip's bytes, transferred. */
  | { readonly id: number; readonly type: "zipped"; readonly bytes: Uint8Array }
  | { readonly id: number; readonly type: "regionTabled"; readonly table: RegionTable; readonly curves: readonly RegionCurve[] }
  | { readonly id: number; readonly type: "regionRowsWritten"; readonly csv: string }
  | { readonly id: number; readonly type: "hotspotsScanned"; readonly scan: HotspotScan }
  | { readonly id: number; readonly type: "hotspotEstimated"; readonly candidateSets: number }
  | { readonly id: number; readonly type: "cancelled" }
  | { readonly id: number; readonly type: "failed"; readonly message: string };

/** Sent any number of times before the answer. */
export interface Progress {
  readonly id: number;
  readonly type: "progress";
  readonly phase: BuildPhase | "parse" | "suggest" | "sweep" | "seeds" | "region" | "hotspots";
  readonly fraction: number;
}

/** The first message to a worker: where to read cancellations (an Int32Array over a SharedArrayBuffer, one slot per lane). */
export interface Setup {
  readonly type: "setup";
  readonly cancelFlags: Int32Array;
}

export type WorkerMessage = Answer | Progress;
