import { parquetSchema, type FileMetaData } from "hyparquet";
import { parquetHeader } from "hyparquet/src/column.js";
import { checkPageRuns, type PageColumn } from "./checkPageRuns.ts";
import { parquetCompressors } from "./parquetCompressors.ts";
import { maxPageBytesFor } from "./parquetLimits.ts";

/**
 * Walks the page headers of every column chunk about to be read, before any page is decoded, and
 * checks what they declare against the footer and the limits: each page lies inside its chunk; its
 * decompressed size is at most maxPageBytesFor(compressed size); a data page holds at most the row
 * group's rows, and the chunk's data pages together too; a dictionary page holds at most 8 values
 * per decompressed byte (one bit each, the least any plain value takes); level lengths fit in the
 * page; the run-length streams in data pages declare no more values than the page holds
 * (checkPageRuns, which decompresses the pages that hold such a stream inside their compressed
 * part). So what the decoder allocates from these counts stays within the row group's size, which
 * checkParquetMetadata has already capped. Throws one plain error naming the column and page.
 * O(bytes of the chunks read); holds one decompressed page at a time. Those pages are decompressed
 * again by the decoder: on the 13 MB flights-3m file (ZSTD) this walk took about 1 s of a 20 s read.
 * Call after checkParquetMetadata (chunk ranges inside the file).
 */
export function checkParquetPages(buffer: ArrayBuffer, metadata: FileMetaData, columns: readonly string[], rowEnd: number): void {
  const read = new Set(columns);
  const elements = new Map(parquetSchema(metadata).children.map((node) => [node.element.name, node.element]));
  let groupStart = 0;
  for (const group of metadata.row_groups) {
    if (groupStart >= rowEnd) return;
    const groupRows = Number(group.num_rows);
    groupStart += groupRows;
    for (const chunk of group.columns) {
      const meta = chunk.meta_data;
      const name = meta?.path_in_schema[0] ?? "";
      if (!meta || !read.has(name)) continue;
      const start = Number(meta.dictionary_page_offset || meta.data_page_offset);
      const reader = { view: new DataView(buffer, start, Number(meta.total_compressed_size)), offset: 0 };
      const decompress = parquetCompressors[meta.codec];
      const column: PageColumn = { element: elements.get(name)!, decompress: decompress ?? ((bytes) => bytes) };
      let rows = 0;
      while (reader.offset < reader.view.byteLength) {
        const pageStart = start + reader.offset;
        const fail = (problem: string): never => {
          throw new Error(`cannot read parquet file: column ${name}, page at byte ${pageStart}: ${problem}`);
        };
        let header: ReturnType<typeof parquetHeader>;
        try {
          header = parquetHeader(reader);
        } catch {
          return fail("the page header cannot be read");
        }
        const compressed = header.compressed_page_size;
        const uncompressed = header.uncompressed_page_size;
        if (!Number.isSafeInteger(compressed) || compressed < 0) fail(`invalid compressed page size: ${String(compressed)}`);
        if (reader.offset + compressed > reader.view.byteLength) fail(`its ${compressed} bytes run past the column chunk`);
        const limit = maxPageBytesFor(compressed);
        if (!(Number.isSafeInteger(uncompressed) && uncompressed >= 0 && uncompressed <= limit)) fail(`${compressed} compressed bytes declare ${uncompressed} bytes decompressed (the limit is ${limit})`);
        const v1 = header.data_page_header;
        const v2 = header.data_page_header_v2;
        const dictionary = header.dictionary_page_header;
        if (v1) rows += count(v1.num_values, groupRows, fail);
        if (v2) {
          rows += count(v2.num_rows, groupRows, fail);
          count(v2.num_values, groupRows, fail);
          count(v2.num_nulls, v2.num_values, fail);
          count(v2.definition_levels_byte_length + v2.repetition_levels_byte_length, compressed, fail);
        }
        if (dictionary) count(dictionary.num_values, 8 * uncompressed, fail);
        if (rows > groupRows) fail(`the column's pages hold ${rows} values but its row group has ${groupRows} rows`);
        if (v1 || v2) {
          try {
            checkPageRuns(header, new Uint8Array(buffer, start + reader.offset, compressed), column);
          } catch (error) {
            fail(error instanceof RangeError ? "its body ends too early" : String((error as Error).message).replace(/^./, (c) => c.toLowerCase()));
          }
        }
        reader.offset += compressed;
      }
    }
  }
}

function count(value: number, limit: number, fail: (problem: string) => never): number {
  if (!(Number.isSafeInteger(value) && value >= 0 && value <= limit)) fail(`it declares ${value} values where at most ${limit} fit`);
  return value;
}
