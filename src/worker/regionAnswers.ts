import { readRecordTexts, regionRowsCsv, regionSides, regionTable, type ByteSource, type ParsedTable } from "../core/index.ts";
import { ecdfSample } from "./ecdfSample.ts";
import type { Answer, Request } from "./protocol.ts";

export interface RegionControl {
  readonly onProgress: (fraction: number) => void;
  readonly shouldStop: () => boolean;
}

/** The region table of a request (core's `regionSides` then `regionTable`) with the plot samples of every numeric line. */
export function regionTableAnswer(table: ParsedTable, request: Extract<Request, { type: "regionTable" }>, control: RegionControl): Answer {
  const sides = regionSides(request.rowsRead, request.usedRows, request.region, request.versus ?? undefined);
  const explained = regionTable(table, sides, {
    labelColumn: request.labelColumn,
    onProgress: (done, total) => control.onProgress(done / total),
    shouldStop: control.shouldStop,
  });
  const curves = explained.lines.flatMap((line) => {
    const column = line.kind === "numeric" ? table.columns.find((c) => c.name === line.column) : undefined;
    return column?.kind === "numeric" ? [{ column: line.column, inside: ecdfSample(column.numbers, sides.inside), outside: ecdfSample(column.numbers, sides.outside) }] : [];
  });
  return { id: request.id, type: "regionTabled", table: explained, curves };
}

/** region-rows.csv of a request: the regions' rows read again from the source with the reader's numbering (`readRecordTexts`). */
export async function regionRowsAnswer(table: ParsedTable, request: Extract<Request, { type: "regionRows" }>, control: RegionControl): Promise<Answer> {
  const { source, format, encoding, regions } = request;
  const bytes: ByteSource = source.kind === "text" ? bytesSource(new TextEncoder().encode(source.text)) : blobSource(source.file);
  const rows = regions.flatMap((region) => Array.from(region.rows));
  const texts = await readRecordTexts(bytes, rows, { delimiter: format.kind === "delimited" ? format.delimiter : ",", ...(encoding === null ? {} : { encoding }) }, {
    utf8: () => {
      const decoder = new TextDecoder("utf-8", { fatal: true });
      return (chunk, last) => decoder.decode(chunk, { stream: !last });
    },
    onProgress: control.onProgress,
    shouldStop: control.shouldStop,
  });
  const decimal = format.kind === "delimited" ? format.decimal : ".";
  return { id: request.id, type: "regionRowsWritten", csv: regionRowsCsv(regions, table.columns.map((c) => c.name), texts, decimal) };
}

function bytesSource(bytes: Uint8Array): ByteSource {
  return { size: bytes.length, read: async (start, end) => bytes.subarray(start, end) };
}

/** A dropped or picked file, read a slice at a time. */
function blobSource(file: Blob): ByteSource {
  return { size: file.size, read: async (start, end) => new Uint8Array(await file.slice(start, end).arrayBuffer()) };
}
