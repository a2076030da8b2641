import type { CoverResult } from "../cover/buildCover.ts";
import type { DecimalMark, DelimiterName, RaggedPolicy } from "../table/readOptions.ts";
import type { ParsedTable } from "../table/types.ts";
import { coverExportChunks, piecesText, type ExportColumns } from "./coverExportChunks.ts";
import type { Region } from "./regionRowsCsv.ts";

/**
 * Version of the export layout below; bump it when a file's columns or meaning change.
 * 2: summary.json gains `input.reading`; a numeric row label is written as read (`007`).
 */
export const exportSchemaVersion = 2;

/** How the input was read, under the names the headless command takes (`--delimiter pipe`, `--ragged pad`). */
export type ReadingRecord =
  | { readonly format: "delimited"; readonly delimiter: DelimiterName; readonly decimal: DecimalMark; readonly ragged: RaggedPolicy }
  | { readonly format: "parquet" };

export interface ExportContext extends ExportColumns {
  readonly fileName: string;
  readonly fileSize: number;
  /** How the file was read; written as `input.reading` in summary.json (null when absent). */
  readonly reading?: ReadingRecord;
  /** Regions kept by name (0-based rows); listed as `regions` in summary.json (empty when absent). */
  readonly regions?: readonly Region[];
}

export interface CoverExports {
  readonly "nodes.csv": string;
  readonly "members.csv": string;
  readonly "edges.csv": string;
  readonly "summary.json": string;
}

/**
 * The export tables (schema version 2; documented in the README, whose key list a test compares with this). Nodes are numbered from 1
 * in the order their landmarks were chosen; `row` and `landmark_row` are 1-based data-record
 * numbers of the input file, counting every record including those left out. Each table is the
 * concatenation of its pieces from `coverExportChunks`, which the headless command streams instead.
 */
export function coverExports(parsed: ParsedTable, result: CoverResult, context: ExportContext): CoverExports {
  const chunks = coverExportChunks(parsed, result, context);
  return {
    "nodes.csv": piecesText(chunks["nodes.csv"]()),
    "members.csv": piecesText(chunks["members.csv"]()),
    "edges.csv": piecesText(chunks["edges.csv"]()),
    "summary.json": `${JSON.stringify(coverSummary(result, context), null, 2)}\n`,
  };
}

/** The object summary.json holds (its text is this object by `JSON.stringify(summary, null, 2)` and a line end). */
export function coverSummary(result: CoverResult, context: ExportContext) {
  const { source } = result.edges;
  return {
    schema: "shoal-cover-export",
    schemaVersion: exportSchemaVersion,
    input: { fileName: context.fileName, fileSize: context.fileSize, reading: context.reading ?? null },
    params: {
      ...result.params,
      missing: result.params.missing ?? "drop",
      weights: { ...result.params.weights },
      idColumn: context.idColumn,
      outcomes: [...context.outcomes],
    },
    rows: {
      read: result.rowsRead,
      used: result.usedRows.length,
      dropped: result.droppedRows.length + result.undefinedRows.length,
      droppedForMissingValue: result.droppedRows.length,
      droppedForUndefinedDistance: result.undefinedRows.length,
      firstDroppedRows: Array.from(result.droppedRows.subarray(0, 20), (r) => r + 1),
      firstUndefinedDistanceRows: Array.from(result.undefinedRows.subarray(0, 20), (r) => r + 1),
      imputedValues: { ...result.imputed },
    },
    constantColumns: [...result.constantColumns],
    nodes: result.landmarks.length,
    edges: source.length,
    components: result.componentCount,
    cycleRank: result.cycleRank,
    b0: result.betti?.b0 ?? null,
    b1: result.betti?.b1 ?? null,
    memberships: result.members.items.length,
    regions: (context.regions ?? []).map((region) => ({ name: region.name, rowCount: region.rows.length, records: Array.from(region.rows, (r) => r + 1) })),
  };
}
