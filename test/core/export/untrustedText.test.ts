import { strFromU8, unzipSync } from "fflate";
import Papa from "papaparse";
import { describe, expect, it } from "vitest";
import { buildCover, coverExports, parseCsvText, zipExports, type CoverParams } from "../../../src/core/index.ts";

// Text from the table reaches every export only as text: a feature column named like an HTML
// element with an event handler, an outcome column and an id holding &, " and a letter.

const hostileName = "<img src=x onerror=alert(1)>";
const hostileLabel = 'a&b"c';
const input = `id,${hostileName},"a&b""c"\n"a&b""c",0,1\np2,1,2\np3,5,3\n`;
const parsed = parseCsvText(input);
// radius 10 in z-units covers all three rows from the first landmark: one node of rows 1–3
const params: CoverParams = { features: [hostileName], scale: "zscore", metric: "euclidean", radius: 10, landmarks: "greedy-file-order", seed: 1 };
const files = coverExports(parsed, buildCover(parsed, params), { fileName: `${hostileName}.csv`, fileSize: input.length, idColumn: "id", outcomes: [hostileLabel] });

const parseBack = (text: string): string[][] => Papa.parse<string[]>(text, { skipEmptyLines: true }).data;

describe("exports of hostile text", () => {
  it("the reader keeps both names and the label verbatim", () => {
    expect(parsed.columns.map((c) => c.name)).toEqual(["id", hostileName, hostileLabel]);
  });

  it("nodes.csv writes the hostile name as is and quotes the label's header per RFC 4180 (its quote doubled)", () => {
    // worked by hand: one node, landmark row 1, size 3, mean x (0 + 1 + 5) / 3 = 2, mean of the outcome (1 + 2 + 3) / 3 = 2
    expect(files["nodes.csv"]).toBe(`node,landmark_row,size,mean_${hostileName},"mean_a&b""c"\n1,1,3,2,2\n`);
    expect(parseBack(files["nodes.csv"])[0]).toEqual(["node", "landmark_row", "size", `mean_${hostileName}`, `mean_${hostileLabel}`]);
  });

  it("members.csv quotes the id a&b\"c as \"a&b\"\"c\" and it parses back verbatim", () => {
    expect(files["members.csv"]).toBe(`node,row,id\n1,1,"a&b""c"\n1,2,p2\n1,3,p3\n`); // worked by hand
    expect(parseBack(files["members.csv"]).map((row) => row[2])).toEqual(["id", hostileLabel, "p2", "p3"]);
  });

  it("summary.json holds the file name, the feature and the outcome verbatim", () => {
    const summary = JSON.parse(files["summary.json"]);
    expect(summary.input.fileName).toBe(`${hostileName}.csv`);
    expect(summary.params.features).toEqual([hostileName]);
    expect(summary.params.outcomes).toEqual([hostileLabel]);
  });

  it("the zip's files are the same texts byte for byte, so they parse back to the same names and label", () => {
    const unzipped = unzipSync(zipExports(files));
    expect(Object.keys(unzipped).sort()).toEqual(Object.keys(files).sort());
    for (const [name, text] of Object.entries(files)) expect(strFromU8(unzipped[name]!)).toBe(text);
    expect(parseBack(strFromU8(unzipped["members.csv"]!))[1]).toEqual(["1", "1", hostileLabel]);
    expect(JSON.parse(strFromU8(unzipped["summary.json"]!)).params.features).toEqual([hostileName]);
  });
});
