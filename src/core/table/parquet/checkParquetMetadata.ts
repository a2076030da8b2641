import type { FileMetaData } from "hyparquet";
import { maxParquetCells } from "./parquetLimits.ts";

const supportedCodecs = new Set(["UNCOMPRESSED", "SNAPPY", "GZIP", "ZSTD"]);

/**
 * Checks the sizes a parsed footer declares for the columns about to be read, before any page is
 * decoded: a row count that is a whole number, equal to the sum of the row groups' counts, with
 * rows × columns at most maxParquetCells; for each column chunk read, a codec the reader knows and
 * a byte range inside the data part of the file (after the leading magic, before the footer).
 * Page sizes are checked later, as each page is decompressed (parquetCompressors). Throws one plain
 * error naming the problem; returns the row count. O(row groups × columns).
 */
export function checkParquetMetadata(metadata: FileMetaData, columns: readonly string[], dataEnd: number): number {
  const total = Number(metadata.num_rows);
  if (!Number.isSafeInteger(total) || total < 0) throw new Error(`invalid parquet row count: ${metadata.num_rows}`);
  if (total * columns.length > maxParquetCells) {
    throw new Error(`the parquet file declares too many cells: ${total} rows × ${columns.length} columns (the limit is ${maxParquetCells})`);
  }
  const read = new Set(columns);
  let sum = 0;
  for (const group of metadata.row_groups) {
    const rows = Number(group.num_rows);
    if (!Number.isSafeInteger(rows) || rows < 0) throw new Error(`invalid parquet row group size: ${group.num_rows}`);
    sum += rows;
    for (const chunk of group.columns) {
      const meta = chunk.meta_data;
      if (!meta || !read.has(meta.path_in_schema[0] ?? "")) continue;
      if (chunk.file_path) throw new Error(`parquet column chunks in other files are not supported: ${chunk.file_path}`);
      if (!supportedCodecs.has(meta.codec)) throw new Error(`unsupported parquet codec: ${meta.codec ?? "unknown"}`);
      const start = Number(meta.dictionary_page_offset || meta.data_page_offset);
      const end = start + Number(meta.total_compressed_size);
      if (!(Number.isSafeInteger(start) && Number.isSafeInteger(end) && start >= 4 && end > start && end <= dataEnd)) {
        throw new Error(`parquet column ${meta.path_in_schema.join(".")} declares bytes ${start} to ${end}, outside the data part of the file (4 to ${dataEnd})`);
      }
    }
  }
  if (sum !== total) throw new Error(`the parquet row groups hold ${sum} rows but the footer declares ${total}`);
  return total;
}
