import { describe, expect, it } from "vitest";
import { buildCover, coverExports, parseCsvText, type CoverParams } from "../../../src/core/index.ts";

const table = parseCsvText("x\n0\n1\n5\n");
const params: CoverParams = { features: ["x"], scale: "none", metric: "euclidean", radius: 1, landmarks: "greedy-file-order", seed: 1 };

describe("summary.json lists the regions", () => {
  it("by name, with their row counts and 1-based record numbers", () => {
    const files = coverExports(table, buildCover(table, params), { fileName: "t.csv", fileSize: 1, idColumn: null, outcomes: [], regions: [{ name: "low", rows: Uint32Array.of(0, 1) }] });
    expect(JSON.parse(files["summary.json"]).regions).toEqual([{ name: "low", rowCount: 2, records: [1, 2] }]); // rows 0 and 1 are records 1 and 2
  });

  it("as an empty list when there are none", () => {
    const files = coverExports(table, buildCover(table, params), { fileName: "t.csv", fileSize: 1, idColumn: null, outcomes: [] });
    expect(JSON.parse(files["summary.json"]).regions).toEqual([]);
  });
});
