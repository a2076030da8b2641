import { Cancelled } from "../cancel.ts";
import { decodeWindows1252 } from "../encoding/decodeWindows1252.ts";
import { detectEncoding, encodingProbeBytes, type TextEncodingName } from "../encoding/detectEncoding.ts";
import { isParquet } from "../parquet/isParquet.ts";
import { readParquet } from "../parquet/readParquet.ts";
import { cellText } from "./cellText.ts";
import { chunkParser } from "./chunkParser.ts";
import { lineEnds } from "./lineEnds.ts";
import { readChunkBytes, type ByteReadControl, type ByteSource, type Utf8Decoder } from "./readTableBytes.ts";
import type { Delimiter } from "./readOptions.ts";

export interface RecordTextOptions {
  /** The delimiter the table was read with (its report's `format.delimiter`); ignored for Parquet. */
  readonly delimiter: Delimiter;
  /** The encoding the table was read with; detected as the reader does when absent. */
  readonly encoding?: TextEncodingName;
}

/**
 * The cell texts of some data records, read again from the file rather than kept in memory:
 * the same decoding, line-end normalising and chunk parser as `readTableBytes`, and the same rule for
 * wholly empty lines as `RecordSink` (not a record, except in a file of one column), so record k here
 * is row k − 1 of the table the build read. Cells come exactly as written in the file (`007`,
 * `1,5`, all 20 digits of a long number; line breaks inside quotes as "\n"), one per header field:
 * a short record is padded with "" and a long one cut, as the "pad" policy does.
 * For Parquet there is no text: each cell is the table's value in its shortest exact form (`cellText`).
 * `rows` are 0-based; the answer maps each wanted row that exists to its cells. Reading stops after
 * the last wanted row. O(file size up to that row); memory: the wanted rows' texts plus one chunk.
 */
export async function readRecordTexts(source: ByteSource, rows: ArrayLike<number>, options: RecordTextOptions, control: ByteReadControl): Promise<Map<number, readonly string[]>> {
  const wanted = new Set<number>(Array.from(rows));
  const found = new Map<number, readonly string[]>();
  const { size } = source;
  if (size === 0 || wanted.size === 0) return found;
  const last = Math.max(...wanted);
  const head = await source.read(0, Math.min(size, encodingProbeBytes));
  if (size >= 12 && isParquet(head.subarray(0, 4)) && isParquet(await source.read(size - 4, size))) {
    const bytes = await source.read(0, size);
    const { table } = await readParquet(bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength) as ArrayBuffer);
    for (const row of wanted) if (row < table.rows) found.set(row, table.columns.map((column) => cellText(column, row)));
    return found;
  }
  const detected = detectEncoding(head, size <= encodingProbeBytes);
  const decode: Utf8Decoder = (options.encoding ?? detected.encoding) === "utf-8" ? control.utf8() : (bytes) => decodeWindows1252(bytes);
  let width = 0;
  let row = -1; // -1 while the header is still to come
  const parser = chunkParser(options.delimiter, (records) => {
    for (const record of records) {
      if (record.length === 1 && record[0] === "" && width !== 1) continue;
      if (row === -1) width = record.length;
      else if (wanted.has(row)) found.set(row, Array.from({ length: width }, (_, j) => record[j] ?? ""));
      row++;
    }
  }, () => 0);
  const ends = lineEnds();
  const step = control.chunkBytes ?? readChunkBytes;
  for (let start = detected.bomLength; start < size && row <= last; start += step) {
    if (control.shouldStop?.()) throw new Cancelled("reading the rows again");
    const end = Math.min(size, start + step);
    parser.push(ends.push(decode(await source.read(start, end), end === size)));
    control.onProgress?.(end / size, Math.max(row, 0));
  }
  if (row <= last) {
    parser.push(ends.flush());
    parser.finish();
  }
  return found;
}
