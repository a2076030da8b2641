import { describe, expect, it } from "vitest";
import { checkHybridRuns } from "../../../../src/core/table/parquet/checkHybridRuns.ts";
import { checkParquetFooter } from "../../../../src/core/table/parquet/checkParquetFooter.ts";
import { maxPageBytesFor } from "../../../../src/core/table/parquet/parquetLimits.ts";
import { readParquet } from "../../../../src/core/table/parquet/readParquet.ts";
import { intEdit, parquetLayout, rewriteParquet, type Edit, type IntField } from "./parquetSurgery.ts";
import { bufferOf, dictionaryEncoded, recompressed, snappyFixture } from "./parquetVariants.ts";

// One damaged file per check, each made from the mixed-columns fixture (1,527 bytes; test/fixtures/README.md).
const layout = parquetLayout(snappyFixture);
const withFooter = (values: Record<string, bigint>): ArrayBuffer => bufferOf(rewriteParquet(layout, [], new Map(Object.entries(values))));
const pageField = (page: number, path: string): IntField => layout.pages[page]!.fields.find((f) => f.path === path)!;
const allCodecs = (id: bigint): Record<string, bigint> => Object.fromEntries(layout.footer.filter((f) => /^4\.\d+\.1\.\d+\.3\.4$/.test(f.path)).map((f) => [f.path, id]));

/** ULEB128 of an RLE run header (count << 1), as the hybrid encoding writes it. */
function rleRun(count: number, value: number): number[] {
  const bytes: number[] = [];
  let h = count * 2;
  do {
    const low = h % 128;
    h = Math.floor(h / 128);
    bytes.push(h ? low | 0x80 : low);
  } while (h);
  return [...bytes, value];
}

/** The fixture with the definition levels of page 1 (column depth, group 0, 4 values) replaced. */
function depthLevels(levels: number[]): ArrayBuffer {
  const page = layout.pages[1]!;
  const growth = BigInt(levels.length - 2); // the fixture's levels take 2 bytes (page header field 8.5)
  const edits: Edit[] = [
    { start: page.bodyStart, end: page.bodyStart + 2, bytes: Uint8Array.from(levels) },
    intEdit(pageField(1, "8.5"), BigInt(levels.length)),
    intEdit(pageField(1, "3"), pageField(1, "3").value + growth),
    intEdit(pageField(1, "2"), pageField(1, "2").value + growth),
  ];
  return bufferOf(rewriteParquet(layout, edits));
}

describe("readParquet: damaged files end in one plain error", () => {
  it("the surgery helper rewrites the fixture byte for byte when nothing changes", () => {
    expect(rewriteParquet(layout, [])).toEqual(snappyFixture);
  });

  it("GZIP, ZSTD and uncompressed copies of the fixture read to the same table and report", async () => {
    const expected = await readParquet(bufferOf(snappyFixture));
    for (const codec of ["GZIP", "ZSTD", "UNCOMPRESSED"] as const) expect(await readParquet(bufferOf(recompressed(codec)))).toEqual(expected);
  });

  it("a footer length of 2^32 - 1 or 0 is refused before parsing: invalid parquet footer length", async () => {
    for (const length of [2 ** 32 - 1, 0, 1527 - 11]) {
      const bytes = snappyFixture.slice();
      new DataView(bytes.buffer).setUint32(bytes.length - 8, length, true);
      await expect(readParquet(bytes.buffer)).rejects.toThrow(`invalid parquet footer length: ${length} (the file has 1527 bytes)`);
    }
  });

  it("codec LZ4 (id 5) and an unknown id 99 are refused by name: unsupported parquet codec", async () => {
    await expect(readParquet(withFooter(allCodecs(5n)))).rejects.toThrow(/^unsupported parquet codec: LZ4$/); // id 5 is LZ4 (Apache Parquet format, CompressionCodec)
    await expect(readParquet(withFooter(allCodecs(99n)))).rejects.toThrow(/^unsupported parquet codec: unknown$/);
  });

  it("2^40 declared rows (in the footer and its row group) pass the cell limit of 1e8 and are refused", async () => {
    await expect(readParquet(withFooter({ "3": 2n ** 40n, "4.0.3": 2n ** 40n - 2n }))).rejects.toThrow(
      "the parquet file declares too many cells: 1099511627776 rows × 7 columns (the limit is 100000000)",
    );
  });

  it("row groups of 4 + 2 rows under a footer that declares 7 are refused", async () => {
    await expect(readParquet(withFooter({ "3": 7n }))).rejects.toThrow("the parquet row groups hold 6 rows but the footer declares 7");
  });

  it("a column chunk placed at byte 1,000,000 of a 1,527-byte file is refused", async () => {
    await expect(readParquet(withFooter({ "4.0.1.0.3.9": 1_000_000n }))).rejects.toThrow(
      "parquet column sample declares bytes 1000000 to 1000048, outside the data part of the file (4 to 571)", // 48 compressed bytes; footer at 571 (by hand from the layout)
    );
  });

  it("a 27-byte Snappy page that declares 2^30 bytes decompressed is refused at the 1 MiB floor before any allocation", async () => {
    const edits = [intEdit(pageField(0, "2"), 2n ** 30n)];
    await expect(readParquet(bufferOf(rewriteParquet(layout, edits)))).rejects.toThrow(
      "cannot read parquet file: column sample, page at byte 4: 27 compressed bytes declare 1073741824 bytes decompressed (the limit is 1048576)",
    );
  });

  it("a page that declares 1,000,000 values in a row group of 4 rows is refused", async () => {
    const edits = [intEdit(pageField(0, "8.1"), 1_000_000n)];
    await expect(readParquet(bufferOf(rewriteParquet(layout, edits)))).rejects.toThrow(
      "cannot read parquet file: column sample, page at byte 4: it declares 1000000 values where at most 4 fit",
    );
  });

  it("the depth levels as one RLE run of 4 values (1, 0, 1, 1 becomes 1, 1, 1, 1) read as a table: the rewrite itself is sound", async () => {
    const { table } = await readParquet(depthLevels(rleRun(4, 1)));
    expect(table.columns[1]!.numbers.length).toBe(6);
  });

  it("one RLE run of 2^30 definition levels in a 4-value page is refused without expanding it", async () => {
    // expanding the run would take gigabytes; the refusal comes from the run check before any decoding
    await expect(readParquet(depthLevels(rleRun(2 ** 30, 1)))).rejects.toThrow(
      "cannot read parquet file: column depth, page at byte 52: a run declares 1073741824 values where at most 4 fit",
    );
  });

  it("a bit-packed run whose header has the sign bit set (a negative count in 32-bit arithmetic) is refused", async () => {
    await expect(readParquet(depthLevels([0xff, 0xff, 0xff, 0xff, 0x0f, 0]))).rejects.toThrow(/a run declares -8 values where at most 4 fit$/); // header 2^32 - 1 as int32 is -1; (-1 >> 1) << 3 = -8
  });
});

describe("readParquet: a dictionary-encoded column with hostile runs", () => {
  it("GZIP and uncompressed copies with column count dictionary-encoded read to the same table as the fixture", async () => {
    const expected = await readParquet(bufferOf(snappyFixture));
    for (const codec of ["GZIP", "UNCOMPRESSED"] as const) expect((await readParquet(bufferOf(dictionaryEncoded(codec)))).table).toEqual(expected.table);
  });

  it("one RLE run of 2^30 dictionary indices, inside a GZIP page, is refused without expanding it", async () => {
    // as above: refused by the run check, before the dictionary indices are expanded
    await expect(readParquet(bufferOf(dictionaryEncoded("GZIP", [0x80, 0x80, 0x80, 0x80, 0x08, 1])))).rejects.toThrow(
      /^cannot read parquet file: column count, page at byte \d+: a run declares 1073741824 values where at most 4 fit$/, // header 2^31 (by hand); 2^31 >>> 1 = 2^30
    );
  });

  it("a dictionary page of 12 bytes that declares 1,000,000 values is refused (at most 8 per byte, 96)", async () => {
    const bytes = dictionaryEncoded("UNCOMPRESSED");
    const dictionaryPage = parquetLayout(bytes).pages[2]!;
    const edits = [intEdit(dictionaryPage.fields.find((f) => f.path === "7.1")!, 1_000_000n)];
    await expect(readParquet(bufferOf(rewriteParquet(parquetLayout(bytes), edits)))).rejects.toThrow(/: it declares 1000000 values where at most 96 fit$/); // by hand: 8 × 12
  });
});

describe("the checks' documented examples", () => {
  it("checkParquetFooter of a 13-byte frame with footer length 1 returns 1 (JSDoc example)", () => {
    expect(checkParquetFooter(Uint8Array.of(0x50, 0x41, 0x52, 0x31, 9, 1, 0, 0, 0, 0x50, 0x41, 0x52, 0x31).buffer)).toBe(1); // by hand: bytes 5–8 hold 1
  });

  it("checkHybridRuns of header 8 (an RLE run of 4) and value 1 counts 4 values (JSDoc example)", () => {
    expect(checkHybridRuns(new DataView(Uint8Array.of(8, 1).buffer), 0, 2, 1, 4)).toBe(4); // by hand: 8 >>> 1 = 4
  });

  it("maxPageBytesFor(100) is the 1 MiB floor, 1048576; maxPageBytesFor(10,000) is 1032 × 10,000 (JSDoc example)", () => {
    expect(maxPageBytesFor(100)).toBe(1048576); // by hand: 1032 × 100 < 2^20
    expect(maxPageBytesFor(10_000)).toBe(10_320_000); // by hand: 1032 × 10,000 > 2^20
    expect(maxPageBytesFor(1e9)).toBe(2 ** 28); // by hand: the absolute cap
  });
});
