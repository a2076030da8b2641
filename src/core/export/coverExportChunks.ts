import type { CoverResult } from "../cover/buildCover.ts";
import { nodeMeans } from "../cover/nodeMeans.ts";
import { cellText } from "../table/cellText.ts";
import type { ParsedTable } from "../table/types.ts";
import { csvLine, csvNumber, csvQuoted, csvText } from "./csvCell.ts";

/** The columns the tables name beside the features (a part of `ExportContext`). */
export interface ExportColumns {
  /** Identifier column written beside each row in members.csv; null for none. */
  readonly idColumn: string | null;
  /** Outcome columns whose node means follow the features' in nodes.csv. */
  readonly outcomes: readonly string[];
}

/** The three export tables as pieces of text, each produced on demand and in order, whose concatenation is the file. */
export interface CoverExportChunks {
  readonly "nodes.csv": () => Iterable<string>;
  readonly "members.csv": () => Iterable<string>;
  readonly "edges.csv": () => Iterable<string>;
}

/** Characters gathered before a piece is handed out: large enough that a writer makes few calls, small beside any file worth streaming. */
export const exportChunkLength = 1 << 16; // our choice, no source

/**
 * nodes.csv, members.csv and edges.csv of `coverExports`, byte for byte, as generators of pieces of
 * about `exportChunkLength` characters, so a writer can stream a file of any size without holding
 * it as one string (a JavaScript string holds at most about 2^29 characters in V8). The node means
 * and the id column are resolved at once (an unknown column throws here, before anything is
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
      for (let k = 0; k < nodes; ++k) {
        const node = String(k + 1);
        for (let t = offsets[k]!; t < offsets[k + 1]!; ++t) {
          const row = items[t]!;
          text += ids ? `${node},${row + 1},${ids(row)}\n` : `${node},${row + 1}\n`;
          if (text.length >= exportChunkLength) {
            yield text;
            text = "";
          }
        }
      }
      yield text;
    },
    *"edges.csv"() {
      let text = csvLine(["source", "target", "shared"]);
      for (let e = 0; e < source.length; ++e) {
        text += `${source[e]! + 1},${target[e]! + 1},${shared[e]!}\n`;
        if (text.length >= exportChunkLength) {
          yield text;
          text = "";
        }
      }
      yield text;
    },
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
