import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { readTableText } from "../../../src/core/table/readTableText.ts";
import { selectFeatures } from "../../../src/core/table/selectFeatures.ts";
import { readInChunksOf } from "./readerSupport.ts";

// Open datasets from the vega-datasets package (tests only). Expected counts come two ways:
// written-in numbers counted with Python 3's csv module (csv.reader, cells with strip() == "" as
// empty), and the same counts recomputed here by a naive split, which is exact because each file
// has no quote character (checked first); birdstrikes.csv has \r\n line ends.
const data = (name: string): string => readFileSync(new URL(`../../../node_modules/vega-datasets/data/${name}`, import.meta.url), "utf8");

function naiveCounts(text: string, delimiter: string) {
  const [header, ...records] = text.split(/\r?\n/).filter((line) => line !== "").map((line) => line.split(delimiter));
  return header!.map((name, j) => {
    const cells = records.map((r) => r[j]!);
    const numbers = cells.filter((c) => c.trim() !== "").map(Number);
    return { name, rows: records.length, empty: cells.filter((c) => c.trim() === "").length, numbers, distinct: new Set(numbers).size };
  });
}

describe("open datasets end to end", () => {
  it("birdstrikes.csv (vega-datasets): 10,000 records; Speed IAS in knots has 2,836 empty cells; costs and speed numeric", () => {
    const text = data("birdstrikes.csv");
    expect(text.includes('"')).toBe(false);
    const { table, report } = readTableText(text);
    expect(table.rows).toBe(10_000); // Python csv module: 10,000 records after the header
    const speed = report.columns.find((c) => c.name === "Speed IAS in knots")!;
    expect(speed).toMatchObject({ type: "numeric", missing: 2836, distinct: 122, min: 0, max: 350 }); // Python csv module
    expect(report.columns.filter((c) => c.type === "numeric").map((c) => c.name)).toEqual(["Cost Other", "Cost Repair", "Cost Total $", "Speed IAS in knots"]);
    for (const expected of naiveCounts(text, ",")) {
      const column = report.columns.find((c) => c.name === expected.name)!;
      expect(column.missing).toBe(expected.empty); // naive split, no missing token in the file (Python check)
      if (column.type === "numeric") expect([column.distinct, column.min, column.max]).toEqual([expected.distinct, Math.min(...expected.numbers), Math.max(...expected.numbers)]);
    }
    expect(report.columns.find((c) => c.name === "Effect Amount of damage")).toMatchObject({ type: "categorical", distinct: 6, missing: 0 }); // Python csv: 6 levels, "None" among them
  });

  it("birdstrikes.csv read in 4 KiB chunks gives the same table and report as in one piece", () => {
    const text = data("birdstrikes.csv");
    expect(readInChunksOf(text, 4096)).toEqual(readTableText(text));
  });

  it("birdstrikes.csv under drop: read 10,000 = used 7,164 + dropped 2,836 for the speed feature", () => {
    const { missing } = selectFeatures(readTableText(data("birdstrikes.csv")).table, ["Speed IAS in knots", "Cost Total $"]);
    expect([missing.read, missing.used, missing.dropped]).toEqual([10_000, 7164, 2836]); // Python csv module: 7,164 speeds present
  });

  it("seattle-weather.csv (vega-datasets): 1,461 records, no missing cell, date an identifier, weather categorical with 5 levels", () => {
    const text = data("seattle-weather.csv");
    expect(text.includes('"')).toBe(false);
    const { table, report } = readTableText(text);
    expect(table.rows).toBe(1461); // Python csv module; also 4 years of days, 2012–2015 (366 + 3 × 365)
    expect(report.columns.map((c) => [c.name, c.type, c.missing])).toEqual([
      ["date", "identifier", 0],
      ["precipitation", "numeric", 0],
      ["temp_max", "numeric", 0],
      ["temp_min", "numeric", 0],
      ["wind", "numeric", 0],
      ["weather", "categorical", 0],
    ]);
    expect(table.columns[5]!.categories?.levels.length).toBe(5); // Python csv module
    expect(report.columns[3]).toMatchObject({ min: -7.1, max: 18.3, distinct: 55 }); // Python csv module
    for (const expected of naiveCounts(text, ",").filter((c) => c.name !== "date" && c.name !== "weather")) {
      const column = report.columns.find((c) => c.name === expected.name)!;
      expect([column.distinct, column.min, column.max]).toEqual([expected.distinct, Math.min(...expected.numbers), Math.max(...expected.numbers)]);
    }
  });

  it("unemployment.tsv (vega-datasets): tab detected, 3,218 records, id and rate numeric (rate 0.012 to 0.301)", () => {
    const text = data("unemployment.tsv");
    const { table, report } = readTableText(text);
    expect(report.format).toMatchObject({ delimiter: "\t", decimal: "." });
    expect(table.rows).toBe(3218); // Python csv module
    expect(report.columns.map((c) => [c.name, c.type, c.missing, c.distinct])).toEqual([
      ["id", "numeric", 0, 3218], // Python csv module
      ["rate", "numeric", 0, 210], // Python csv module
    ]);
    expect([report.columns[1]!.min, report.columns[1]!.max]).toEqual([0.012, 0.301]); // Python csv module
    const naive = naiveCounts(text, "\t");
    expect(naive.map((c) => c.rows)).toEqual([3218, 3218]);
  });
});
