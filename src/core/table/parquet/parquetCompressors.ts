import { gunzipSync } from "fflate";
import { decompress } from "fzstd";
import type { Compressors } from "hyparquet";

/**
 * Decompressors that hyparquet lacks, for the codecs that common writers use by default besides
 * Snappy: Zstandard through fzstd and gzip through fflate. hyparquet reads Snappy and
 * uncompressed pages itself; Brotli and LZ4 are refused with its own error.
 */
export const parquetCompressors: Compressors = {
  ZSTD: (input, outputLength) => decompress(input, new Uint8Array(outputLength)),
  GZIP: (input, outputLength) => gunzipSync(input, { out: new Uint8Array(outputLength) }),
};
