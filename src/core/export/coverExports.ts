import type { CoverResult } from "../cover/buildCover.ts";
import { nodeMeans } from "../cover/nodeMeans.ts";
import { cellText } from "../table/cellText.ts";
import type { DecimalMark, DelimiterName, RaggedPolicy } from "../table/readOptions.ts";
import type { ParsedTable } from "../table/types.ts";
import { csvLine, csvNumber, csvQuoted, csvText } from "./csvCell.ts";
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

export interface ExportContext {
  readonly fileName: string;
  readonly fileSize: number;
  /** Identifier column written beside each row in members.csv; null for none. */
  readonly idColumn: string | null;
  /** Outcome columns whose node means follow the features' in nodes.csv. */
  readonly outcomes: readonly string[];
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
 * numbers of the input file, counting every record including those left out.
 */
export function coverExports(parsed: ParsedTable, result: CoverResult, context: ExportContext): CoverExports {
  const nodes = result.landmarks.length;
  const meanColumns = [...new Set([...result.params.features, ...context.outcomes])];
  const means = meanColumns.map((name) => nodeMeans(columnNumbers(parsed, name), result.members));
  let nodesCsv = csvLine(["node", "landmark_row", "size", ...meanColumns.map((name) => csvText(`mean_${name}`))]);
  for (let k = 0; k < nodes; ++k) {
    const size = result.members.offsets[k + 1]! - result.members.offsets[k]!;
    nodesCsv += csvLine([String(k + 1), String(result.landmarks[k]! + 1), String(size), ...means.map((m) => csvNumber(m[k]!))]);
  }

  const ids = context.idColumn === null ? null : idCells(parsed, context.idColumn);
  const memberHeader = ["node", "row", ...(context.idColumn === null ? [] : [csvText(context.idColumn)])];
  const memberLines: string[] = [csvLine(memberHeader)];
  for (let k = 0; k < nodes; ++k) {
    for (let t = result.members.offsets[k]!; t < result.members.offsets[k + 1]!; ++t) {
      const row = result.members.items[t]!;
      memberLines.push(csvLine([String(k + 1), String(row + 1), ...(ids ? [ids(row)] : [])]));
    }
  }

  const { source, target, shared } = result.edges;
  const edgeLines: string[] = [csvLine(["source", "target", "shared"])];
  for (let e = 0; e < source.length; ++e) edgeLines.push(csvLine([String(source[e]! + 1), String(target[e]! + 1), String(shared[e]!)]));

  const summary = {
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
    nodes,
    edges: source.length,
    components: result.componentCount,
    cycleRank: result.cycleRank,
    b0: result.betti?.b0 ?? null,
    b1: result.betti?.b1 ?? null,
    memberships: result.members.items.length,
    regions: (context.regions ?? []).map((region) => ({ name: region.name, rowCount: region.rows.length, records: Array.from(region.rows, (r) => r + 1) })),
  };
  return {
    "nodes.csv": nodesCsv,
    "members.csv": memberLines.join(""),
    "edges.csv": edgeLines.join(""),
    "summary.json": `${JSON.stringify(summary, null, 2)}\n`,
  };
}

function columnNumbers(parsed: ParsedTable, name: string): Float64Array {
  const column = parsed.columns.find((c) => c.name === name);
  if (!column) throw new Error(`unknown column: ${name}`);
  return column.numbers;
}

// A numeric id is written as read (007 stays 007, digits past 2^53 are kept) and never neutralised, so -5 stays -5; a text id as safe text.
function idCells(parsed: ParsedTable, name: string): (row: number) => string {
  const column = parsed.columns.find((c) => c.name === name);
  if (!column) throw new Error(`unknown column: ${name}`);
  const texts = column.texts;
  return texts ? (row) => csvText(texts[row]!) : (row) => csvQuoted(cellText(column, row));
}
