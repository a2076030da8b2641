import { parquetMetadata, parquetRead, parquetSchema, type ColumnData, type FileMetaData } from "hyparquet";
import { finishColumn } from "../finishColumn.ts";
import { maxInputBytes } from "../readOptions.ts";
import type { ColumnReport, Notice, ReadOutcome } from "../tableReport.ts";
import { tableNotices } from "../tableOutcome.ts";
import type { TableColumn } from "../types.ts";
import { checkParquetFooter } from "./checkParquetFooter.ts";
import { checkParquetMetadata } from "./checkParquetMetadata.ts";
import { checkParquetPages } from "./checkParquetPages.ts";
import { parquetColumn, pushParquetValue, type ParquetColumn } from "./parquetColumn.ts";
import { parquetCompressors } from "./parquetCompressors.ts";

export interface ParquetOptions {
  /** Columns to read, in this order (default: every flat column). */
  readonly columns?: readonly string[];
  /** Read only rows [0, rowEnd) (default: all); whole row groups past it are never decoded. */
  readonly rowEnd?: number;
  /** Called after each row group with the share of rows read. */
  readonly onProgress?: (fraction: number) => void;
}

/**
 * Reads a Parquet file (flat numeric and string columns) into the same table and report as the
 * text reader, through hyparquet, one row group at a time and column by column, so only one row
 * group's decoded values are held besides the table. Row k is the file's row k + 1 (1-based outside);
 * nulls are empty cells; NaN and ±Infinity in number columns count as missing tokens; strings,
 * booleans and dates go through the same type inference as CSV cells; nested columns are skipped
 * with a notice. Throws one clear error for a file that is not Parquet, cannot be decoded, has no
 * flat column or no row, or names an unknown column. A damaged or hostile file ends in one such
 * error too: the footer's frame and declared sizes are checked before any page is decoded, and
 * each page's decompressed size as it is read, against the limits in parquetLimits.ts. O(cells read).
 */
export async function readParquet(buffer: ArrayBuffer, options: ParquetOptions = {}): Promise<ReadOutcome> {
  if (buffer.byteLength > maxInputBytes) throw new Error(`the file is too large: ${(buffer.byteLength / 2 ** 30).toFixed(2)} GiB (the limit is 1 GiB)`);
  const dataEnd = buffer.byteLength - 8 - checkParquetFooter(buffer);
  const metadata = decoding(() => parquetMetadata(buffer), "damaged footer: ");
  const top = decoding(() => parquetSchema(metadata).children, "damaged schema: ");
  const flat = top.filter((node) => node.children.length === 0).map((node) => node.element.name);
  const notices: Notice[] = top.filter((node) => node.children.length > 0).map((node) => ({ code: "skipped-column", message: `skipped the nested parquet column ${node.element.name}` }));
  const names = options.columns ? [...options.columns] : flat;
  for (const name of names) if (!flat.includes(name)) throw new Error(top.some((n) => n.element.name === name) ? `nested parquet column not supported: ${name}` : `unknown column: ${name}`);
  if (names.length === 0) throw new Error("the parquet file has no flat column to read");
  const columns = new Map(names.map((name) => [name, parquetColumn(top.find((n) => n.element.name === name)!.element)]));
  const total = checkParquetMetadata(metadata, names, dataEnd);
  const rowEnd = Math.min(total, options.rowEnd ?? total);
  if (!(rowEnd >= 0)) throw new Error(`invalid row end: ${options.rowEnd}`);
  if (rowEnd === 0) throw new Error("the parquet file has no rows");
  checkParquetPages(buffer, metadata, names, rowEnd);
  await readRowGroups(buffer, metadata, columns, rowEnd, options.onProgress);

  const tableColumns: TableColumn[] = [];
  const reports: ColumnReport[] = [];
  for (const [name, column] of columns) {
    const finished = finishColumn(column.builder, name, name);
    tableColumns.push(finished.column);
    reports.push(finished.report);
    if (column.largeIntegers > 0) notices.push({ code: "large-integers", message: `column ${name} has ${column.largeIntegers} integer${column.largeIntegers === 1 ? "" : "s"} beyond ±2^53, rounded to the nearest double` });
  }
  notices.push(...tableNotices(rowEnd, reports, { kind: "parquet" }));
  return { table: { rows: rowEnd, columns: tableColumns }, report: { format: { kind: "parquet" }, rows: rowEnd, lines: null, columns: reports, notices } };
}

async function readRowGroups(buffer: ArrayBuffer, metadata: FileMetaData, columns: Map<string, ParquetColumn>, rowEnd: number, onProgress?: (fraction: number) => void): Promise<void> {
  let groupStart = 0;
  for (const group of metadata.row_groups) {
    const groupEnd = Math.min(groupStart + Number(group.num_rows), rowEnd);
    if (groupStart >= groupEnd) break;
    const chunks: ColumnData[] = [];
    await decodingAsync(() =>
      parquetRead({ file: buffer, metadata, columns: [...columns.keys()], rowStart: groupStart, rowEnd: groupEnd, compressors: parquetCompressors, onChunk: (chunk) => void chunks.push(chunk) }),
    );
    chunks.sort((a, b) => a.rowStart - b.rowStart);
    for (const [name, column] of columns) {
      let next = groupStart;
      for (const chunk of chunks) {
        if (chunk.columnName !== name) continue;
        const data = chunk.columnData as ArrayLike<unknown>;
        for (let r = Math.max(next, chunk.rowStart); r < Math.min(chunk.rowEnd, groupEnd); ++r) pushParquetValue(column, data[r - chunk.rowStart]);
        next = Math.max(next, Math.min(chunk.rowEnd, groupEnd));
      }
      if (next < groupEnd) throw new Error(`cannot read parquet file: column ${name} ends at row ${next} of ${groupEnd}`);
    }
    groupStart += Number(group.num_rows);
    onProgress?.(Math.min(1, groupEnd / Math.max(1, rowEnd)));
  }
}

function decoding<T>(step: () => T, what: string): T {
  try {
    return step();
  } catch (error) {
    throw new Error(`cannot read parquet file: ${what}${lowercase(error)}`, { cause: error });
  }
}

async function decodingAsync(step: () => Promise<void>): Promise<void> {
  try {
    await step();
  } catch (error) {
    throw new Error(`cannot read parquet file: ${lowercase(error)}`, { cause: error });
  }
}

function lowercase(error: unknown): string {
  const message = error instanceof Error ? error.message : String(error);
  return message.replace(/^parquet /, "").replace(/^./, (c) => c.toLowerCase());
}
