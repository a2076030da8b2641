import { readFileSync } from "node:fs";
import { parquetMetadata, parquetReadObjects } from "hyparquet";
import { describe, expect, it } from "vitest";
import { isParquet } from "../../../../src/core/table/parquet/isParquet.ts";
import { parquetCompressors } from "../../../../src/core/table/parquet/parquetCompressors.ts";
import { readParquet } from "../../../../src/core/table/parquet/readParquet.ts";
import { missingCode } from "../../../../src/core/table/finishColumn.ts";
import { assertClose } from "../../../assertClose.ts";

const bytes = (url: URL): ArrayBuffer => {
  const file = readFileSync(url);
  return file.buffer.slice(file.byteOffset, file.byteOffset + file.byteLength) as ArrayBuffer;
};
const fixture = bytes(new URL("../../../fixtures/mixed-columns.parquet", import.meta.url)); // see test/fixtures/README.md
const flights = bytes(new URL("../../../../node_modules/vega-datasets/data/flights-3m.parquet", import.meta.url)); // vega-datasets, 13 MB, ZSTD

describe("readParquet: the mixed-columns fixture (6 rows in row groups of 4 and 2)", async () => {
  const { table, report } = await readParquet(fixture);

  it("reads every flat column in file order with the same types as the text reader would infer", () => {
    expect(report.columns.map((c) => [c.name, c.type, c.missing])).toEqual([
      ["sample", "identifier", 0],
      ["depth", "numeric", 2], // one null, one NaN (fixture README)
      ["count", "numeric", 1],
      ["big", "numeric", 0],
      ["site", "categorical", 1],
      ["wet", "categorical", 1],
      ["when", "identifier", 0],
    ]);
    expect(report).toMatchObject({ format: { kind: "parquet" }, rows: 6, lines: null });
  });

  it("numbers across the two row groups, nulls and NaN as NaN (fixture README)", () => {
    assertClose(table.columns[1]!.numbers, [1.5, NaN, 3.25, NaN, -2, 8]);
    assertClose(table.columns[2]!.numbers, [3, 4, NaN, 6, 7, 8]);
  });

  it("NaN in a DOUBLE column is a flagged missing token, with its 1-based row and no line", () => {
    expect(report.columns[1]!.flagged).toEqual([{ row: 4, line: null, column: "depth", text: "NaN", reason: "missing-token" }]);
  });

  it("strings and booleans become categories; timestamps ISO 8601 text", () => {
    expect(table.columns[4]!.categories).toEqual({ codes: Uint32Array.of(0, 1, 0, missingCode, 0, 2), levels: ["north", "south", "12"] });
    expect(table.columns[5]!.texts).toEqual(["true", "false", "true", "true", "", "false"]);
    expect(table.columns[6]!.texts?.[1]).toBe("2024-01-02T00:00:00.000Z");
  });

  it("an INT64 beyond 2^53 is rounded with a notice", () => {
    expect(table.columns[3]!.numbers[2]).toBe(9007199254740992); // 2^53 + 1 rounds to 2^53 (IEEE 754 ties to even)
    expect(report.notices).toEqual([{ code: "large-integers", message: "column big has 1 integer beyond ±2^53, rounded to the nearest double" }]);
  });

  it("reads a chosen subset of columns in the order asked and only the first rows", async () => {
    const subset = await readParquet(fixture, { columns: ["count", "sample"], rowEnd: 5 });
    expect(subset.table.columns.map((c) => c.name)).toEqual(["count", "sample"]);
    expect(subset.table.rows).toBe(5);
    assertClose(subset.table.columns[0]!.numbers, [3, 4, NaN, 6, 7]);
  });

  it("reports progress once per row group read", async () => {
    const fractions: number[] = [];
    await readParquet(fixture, { onProgress: (f) => fractions.push(f) });
    expect(fractions).toEqual([4 / 6, 1]);
  });
});

describe("readParquet: bad input", () => {
  it("refuses text, an unknown column and a truncated file with one clear error", async () => {
    await expect(readParquet(new TextEncoder().encode("x,y\n1,2\n").buffer as ArrayBuffer)).rejects.toThrow("this is not a parquet file: it does not start and end with PAR1");
    await expect(readParquet(fixture, { columns: ["nope"] })).rejects.toThrow("unknown column: nope");
    await expect(readParquet(fixture, { rowEnd: 0 })).rejects.toThrow("the parquet file has no rows");
    const broken = new Uint8Array(fixture.slice(0));
    broken.fill(7, 8, 200); // keep both PAR1 marks, spoil the pages
    await expect(readParquet(broken.buffer)).rejects.toThrow(/^cannot read parquet file: /);
  });

  it("isParquet checks the magic at both ends of a whole file and at the start of a head (JSDoc example)", () => {
    expect(isParquet(Uint8Array.of(0x50, 0x41, 0x52, 0x31))).toBe(true);
    expect(isParquet(fixture)).toBe(true);
    expect(isParquet(fixture.slice(0, 100))).toBe(false);
  });
});

describe("readParquet: flights-3m.parquet (vega-datasets), a column subset", () => {
  const metadata = parquetMetadata(flights);

  it("the first row group: 272,727 rows, no nulls, min and max equal to the file's own column statistics", async () => {
    const group = metadata.row_groups[0]!;
    const rows = Number(group.num_rows);
    const { table, report } = await readParquet(flights, { columns: ["delay", "distance", "origin"], rowEnd: rows });
    expect(table.rows).toBe(272_727); // row-group metadata
    for (const name of ["delay", "distance"]) {
      const stats = group.columns.find((c) => c.meta_data?.path_in_schema[0] === name)!.meta_data!.statistics!;
      const column = report.columns.find((c) => c.name === name)!;
      expect([column.type, column.missing, column.min, column.max]).toEqual(["numeric", Number(stats.null_count), Number(stats.min_value), Number(stats.max_value)]); // written by Polars
    }
    expect(report.columns[2]).toMatchObject({ type: "categorical", missing: 0 });
  });

  it("rows [0, 300,000) across two row groups match hyparquet's own row reader, value for value", async () => {
    const { table } = await readParquet(flights, { columns: ["distance", "origin"], rowEnd: 300_000 });
    const rows = await parquetReadObjects({ file: flights, columns: ["distance", "origin"], rowEnd: 300_000, compressors: parquetCompressors });
    expect(table.rows).toBe(rows.length);
    expect(Array.from(table.columns[0]!.numbers)).toEqual(rows.map((r) => Number(r.distance)));
    expect(table.columns[1]!.texts).toEqual(rows.map((r) => r.origin));
  });
});
