import type { CoverResult } from "../cover/buildCover.ts";
import { nodeMeans } from "../cover/nodeMeans.ts";
import { cellText } from "../table/cellText.ts";
import type { ParsedTable } from "../table/types.ts";
import { asciiLines } from "./asciiLines.ts";
import { csvLine, csvNumber, csvQuoted, csvText } from "./csvCell.ts";

/** The columns the tables name beside the features (a part of `ExportContext`). */
export interface ExportColumns {
  /** Identifier column written beside each row in members.csv; null for none. */
  readonly idColumn: string | null;
  /** Outcome columns whose node means follow the features' in nodes.csv. */
  readonly outcomes: readonly string[];
}

/** A piece of a file: text, or bytes of ASCII text (digits, commas, line ends) from `asciiLines`. */
export type ExportPiece = string | Uint8Array;

/** The three export tables as pieces, each produced on demand and in order, whose concatenation is the file. */
export interface CoverExportChunks {
  readonly "nodes.csv": () => Iterable<ExportPiece>;
  readonly "members.csv": () => Iterable<ExportPiece>;
  readonly "edges.csv": () => Iterable<ExportPiece>;
}

/** Characters gathered before a piece is handed out: large enough that a writer makes few calls, small beside any file worth streaming. */
export const exportChunkLength = 1 << 16; // our choice, no source

/**
 * nodes.csv, members.csv and edges.csv of `coverExports`, byte for byte, as generators of pieces of
 * about `exportChunkLength` characters, so a writer can stream a file of any size without holding
 * it as one string (a JavaScript string holds at most about 2^29 characters in V8). Lines of
 * integers only (members.csv without an id column, edges.csv) come as ASCII bytes (`asciiLines`),
 * the others as strings; `piecesText` joins either kind. The node means and the id column are resolved at once (an unknown column throws here, before anything is
 * written); the lines are made only as the pieces are taken. Each call of a file's function
 * starts that file again. O(nodes · columns + memberships + edges) per file read.
 */
export function coverExportChunks(parsed: ParsedTable, result: CoverResult, context: ExportColumns): CoverExportChunks {
  const nodes = result.landmarks.length;
  const { offsets, items } = result.members;
  const meanColumns = [...new Set([...result.params.features, ...context.outcomes])];
  const means = meanColumns.map((name) => nodeMeans(columnNumbers(parsed, name), result.members));
  const ids = context.idColumn === null ? null : idCells(parsed, context.idColumn);
  const { source, target, shared } = result.edges;

  return {
    *"nodes.csv"() {
      let text = csvLine(["node", "landmark_row", "size", ...meanColumns.map((name) => csvText(`mean_${name}`))]);
      for (let k = 0; k < nodes; ++k) {
        text += csvLine([String(k + 1), String(result.landmarks[k]! + 1), String(offsets[k + 1]! - offsets[k]!), ...means.map((m) => csvNumber(m[k]!))]);
        if (text.length >= exportChunkLength) {
          yield text;
          text = "";
        }
      }
      yield text;
    },
    *"members.csv"() {
      let text = csvLine(["node", "row", ...(context.idColumn === null ? [] : [csvText(context.idColumn)])]);
      if (!ids) {
        yield text;
        let k = 0;
        yield* asciiLines(items.length, 2, exportChunkLength, (t, cells) => {
          while (t >= offsets[k + 1]!) ++k;
          cells[0] = k + 1;
          cells[1] = items[t]! + 1;
        });
        return;
      }
      for (let k = 0; k < nodes; ++k) {
        const node = String(k + 1);
        for (let t = offsets[k]!; t < offsets[k + 1]!; ++t) {
          const row = items[t]!;
          text += `${node},${row + 1},${ids(row)}\n`;
          if (text.length >= exportChunkLength) {
            yield text;
            text = "";
          }
        }
      }
      yield text;
    },
    *"edges.csv"() {
      yield csvLine(["source", "target", "shared"]);
      yield* asciiLines(source.length, 3, exportChunkLength, (e, cells) => {
        cells[0] = source[e]! + 1;
        cells[1] = target[e]! + 1;
        cells[2] = shared[e]!;
      });
    },
  };
}

/** The text of a file's pieces (bytes from `asciiLines` are ASCII, one character per byte). */
export function piecesText(pieces: Iterable<ExportPiece>): string {
  let text = "";
  for (const piece of pieces) {
    if (typeof piece === "string") text += piece;
    else for (let i = 0; i < piece.length; i += 8192) text += String.fromCharCode(...piece.subarray(i, i + 8192));
  }
  return text;
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
