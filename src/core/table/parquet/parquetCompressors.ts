import { gunzipSync } from "fflate";
import { decompress } from "fzstd";
import { snappyUncompress, type Compressors } from "hyparquet";
import { maxPageBytesFor } from "./parquetLimits.ts";

/**
 * Decompressors for the codecs the reader accepts besides uncompressed pages: Snappy through
 * hyparquet's own decoder, Zstandard through fzstd and gzip through fflate. Each first checks the
 * page's declared decompressed size against maxPageBytesFor(compressed size), so a damaged page
 * header cannot make it allocate more than that. Other codecs are refused before reading
 * (checkParquetMetadata).
 */
export const parquetCompressors: Compressors = {
  SNAPPY: (input, outputLength) => {
    const output = new Uint8Array(checkPageSize(input, outputLength));
    snappyUncompress(input, output);
    return output;
  },
  ZSTD: (input, outputLength) => decompress(input, new Uint8Array(checkPageSize(input, outputLength))),
  GZIP: (input, outputLength) => gunzipSync(input, { out: new Uint8Array(checkPageSize(input, outputLength)) }),
};

function checkPageSize(input: Uint8Array, outputLength: number): number {
  const limit = maxPageBytesFor(input.length);
  if (!(Number.isSafeInteger(outputLength) && outputLength >= 0 && outputLength <= limit)) {
    throw new Error(`a page of ${input.length} compressed bytes declares ${outputLength} bytes decompressed (the limit is ${limit})`);
  }
  return outputLength;
}
