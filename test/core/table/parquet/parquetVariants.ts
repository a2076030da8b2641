import { readFileSync } from "node:fs";
import { gzipSync } from "fflate";
import { snappyUncompress } from "hyparquet";
import { compactInt, intEdit, parquetLayout, rewriteParquet, type Edit } from "./parquetSurgery.ts";

/** The Snappy fixture (test/fixtures/README.md) as bytes. */
export const snappyFixture = new Uint8Array(readFileSync(new URL("../../../fixtures/mixed-columns.parquet", import.meta.url)));

/**
 * A Zstandard frame holding `bytes` in one raw (stored) block: magic 0xFD2FB528, a frame header
 * with Single_Segment_flag set and a 1-byte content size, then a last raw block of 3-byte header
 * (RFC 8878, sections 3.1.1 and 3.1.1.2). Enough for fzstd to read; sizes up to 255 bytes.
 */
export function zstdStored(bytes: Uint8Array): Uint8Array {
  if (bytes.length > 255) throw new Error(`zstdStored takes at most 255 bytes, not ${bytes.length}`);
  const head = (bytes.length << 3) | 1; // Last_Block = 1, Block_Type = 0 (raw), Block_Size
  return Uint8Array.from([0x28, 0xb5, 0x2f, 0xfd, 0x20, bytes.length, head & 0xff, (head >> 8) & 0xff, head >> 16, ...bytes]);
}

const codecIds = { UNCOMPRESSED: 0, GZIP: 2, ZSTD: 6 } as const; // Apache Parquet format, CompressionCodec enum

/**
 * The Snappy fixture recompressed with another codec: each page's values (after its uncompressed
 * level bytes; the fixture's pages are DATA_PAGE_V2) are decompressed and compressed again, the
 * page's compressed size and the chunks' codec follow.
 */
export function recompressed(codec: keyof typeof codecIds): Uint8Array {
  const layout = parquetLayout(snappyFixture);
  const edits: Edit[] = [];
  for (const page of layout.pages) {
    const get = (path: string): number => Number(page.fields.find((f) => f.path === path)?.value ?? 0n);
    const levels = get("8.5") + get("8.6");
    const values = new Uint8Array(get("2") - levels);
    snappyUncompress(snappyFixture.subarray(page.bodyStart + levels, page.bodyEnd), values);
    const packed = codec === "GZIP" ? gzipSync(values) : codec === "ZSTD" ? zstdStored(values) : values;
    edits.push(intEdit(page.fields.find((f) => f.path === "3")!, BigInt(levels + packed.length)));
    edits.push({ start: page.bodyStart + levels, end: page.bodyEnd, bytes: packed });
  }
  const codecs = new Map(layout.footer.filter((f) => /^4\.\d+\.1\.\d+\.3\.4$/.test(f.path)).map((f) => [f.path, BigInt(codecIds[codec])]));
  return rewriteParquet(layout, edits, codecs);
}

/** A fresh ArrayBuffer holding exactly these bytes. */
export const bufferOf = (bytes: Uint8Array): ArrayBuffer => bytes.slice().buffer;

const pack = (codec: "UNCOMPRESSED" | "GZIP", bytes: Uint8Array): Uint8Array => (codec === "GZIP" ? gzipSync(bytes) : bytes);

/**
 * A copy of the fixture in `codec` whose column `count` in row group 0 (3, 4, null, 6) is
 * dictionary-encoded: a DICTIONARY_PAGE of the PLAIN INT32 values 3, 4, 6 is put before its data
 * page, which becomes RLE_DICTIONARY with a bit width of 2 and the given index runs (Apache Parquet
 * format, "Encodings"). The default runs are one bit-packed group (header 3) of the indices
 * 0, 1, 2: bits 00 01 10, least significant first, are the bytes 0x24, 0x00 (worked by hand).
 */
export function dictionaryEncoded(codec: "UNCOMPRESSED" | "GZIP", indexRuns: readonly number[] = [3, 0x24, 0x00]): Uint8Array {
  const base = recompressed(codec);
  const layout = parquetLayout(base);
  const page = layout.pages[2]!; // sample, depth, count: the third chunk of row group 0
  const field = (path: string) => page.fields.find((f) => f.path === path)!;
  const dictionary = Uint8Array.of(3, 0, 0, 0, 4, 0, 0, 0, 6, 0, 0, 0); // PLAIN INT32, little-endian
  const dictionaryBody = pack(codec, dictionary);
  // PageHeader (compact protocol): 1 type = 2 (DICTIONARY_PAGE), 2 and 3 sizes, 7 DictionaryPageHeader {1 num_values = 3, 2 encoding = 0 (PLAIN)}
  const dictionaryHeader = [0x15, 4, 0x15, ...compactInt(12n), 0x15, ...compactInt(BigInt(dictionaryBody.length)), 0x4c, 0x15, 6, 0x15, 0, 0, 0];
  const levels = Number(field("8.5").value) + Number(field("8.6").value);
  const values = pack(codec, Uint8Array.from([2, ...indexRuns]));
  return rewriteParquet(layout, [
    { start: page.headerStart, end: page.headerStart, bytes: Uint8Array.from([...dictionaryHeader, ...dictionaryBody]) },
    intEdit(field("2"), BigInt(levels + 1 + indexRuns.length)),
    intEdit(field("3"), BigInt(levels + values.length)),
    intEdit(field("8.4"), 8n), // RLE_DICTIONARY
    { start: page.bodyStart + levels, end: page.bodyEnd, bytes: values },
  ]);
}
