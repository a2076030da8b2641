import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { buildCover, coverExports, parseCsvText, type CoverParams } from "../../../src/core/index.ts";

const readme = readFileSync(new URL("../../../README.md", import.meta.url), "utf8");

/** The key paths listed in the README's summary.json table: rows that start with a `dotted.key`. */
function readmeKeys(): string[] {
  const start = readme.indexOf("`summary.json` holds exactly these keys");
  const end = readme.indexOf("\n\n", readme.indexOf("| key | holds |", start));
  return [...readme.slice(start, end).matchAll(/^\| `([\w.]+)` \|/gm)].map((m) => m[1]!);
}

// Maps keyed by column names, and values that may be null, are leaves: their keys depend on the data.
const leaves = new Set(["input.reading", "params.weights", "rows.imputedValues"]);

function keyPaths(value: unknown, prefix = ""): string[] {
  if (value === null || typeof value !== "object" || Array.isArray(value) || leaves.has(prefix)) return [prefix];
  return Object.entries(value).flatMap(([key, inner]) => keyPaths(inner, prefix ? `${prefix}.${key}` : key));
}

describe("the README's export schema matches the code", () => {
  it("summary.json's keys, with one-hot columns, are exactly the README's list (plus timingsMs, which the command adds)", () => {
    const table = parseCsvText("id,x,group,y\na,0,u,1\nb,1,v,2\nc,5,u,3\n");
    const params: CoverParams = { features: ["x"], scale: "zscore", metric: "euclidean", radius: 1, landmarks: "greedy-file-order", seed: 1, weights: { x: 2 }, oneHot: ["group"] };
    const summary = JSON.parse(coverExports(table, buildCover(table, params), { fileName: "t.csv", fileSize: 1, idColumn: "id", outcomes: ["y"] })["summary.json"]);
    expect(readmeKeys().sort()).toEqual([...keyPaths(summary), "timingsMs"].sort());
  });

  it("names the schema version the code writes (2) in the heading", () => {
    expect(readme).toContain("## Exports (schema version 2)");
  });

  it("nodes.csv's header is node, landmark_row, size and mean_ for features and outcomes, as the README says", () => {
    const table = parseCsvText("x,y\n0,1\n5,2\n");
    const nodes = coverExports(table, buildCover(table, { features: ["x"], scale: "none", metric: "euclidean", radius: 1, landmarks: "greedy-file-order", seed: 1 }), { fileName: "t.csv", fileSize: 1, idColumn: null, outcomes: ["y"] })["nodes.csv"];
    expect(nodes.split("\n")[0]).toBe("node,landmark_row,size,mean_x,mean_y");
    expect(readme).toContain("`node`, `landmark_row`, `size`, then `mean_<column>` for each feature and then each outcome");
  });
});
