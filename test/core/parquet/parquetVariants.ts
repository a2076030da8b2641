import { readFileSync } from "node:fs";
import { gzipSync } from "fflate";
import { snappyUncompress } from "hyparquet";
import { parquetLayout, rewriteParquet, intEdit, type Edit } from "./parquetSurgery.ts";

/** The Snappy fixture (test/fixtures/README.md) as bytes. */
export const snappyFixture = new Uint8Array(readFileSync(new URL("../../fixtures/mixed-columns.parquet", import.meta.url)));

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
