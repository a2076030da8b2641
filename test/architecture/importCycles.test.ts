import { describe, expect, it } from "vitest";
import { fileURLToPath } from "node:url";
import { fileCycles, importGraph, mutualFolders, upwardImports } from "./importGraph.ts";

const src = fileURLToPath(new URL("../../src", import.meta.url));
const core = fileURLToPath(new URL("../../src/core", import.meta.url));

// core's layers, bottom first, as in DEVELOPERS.md ("Where things live in core"): a file imports
// only from its own layer or from layers before it in this list
const layers = ["params", "control", "random", "stats", "encoding", "metric", "table", "scale", "lists", "search", "landmark", "radius", "nerve", "cover", "sweep", "stability", "regions", "hotspots", "recipe", "export", "demo", "index"];

describe("imports", () => {
  it("no file of src takes part in an import cycle, type-only imports included", () => {
    expect(fileCycles(importGraph(src))).toEqual([]);
  });

  it("no two folders of src/core import each other", () => {
    expect(mutualFolders(importGraph(core))).toEqual([]);
  });

  it("every import between core's layers goes down the layer list of DEVELOPERS.md (index.ts re-exports from all)", () => {
    expect(upwardImports(importGraph(core), layers)).toEqual([]);
  });

  it("params.ts imports nothing", () => {
    expect(importGraph(core).get("params.ts")).toEqual([]);
  });
});

describe("the cycle check itself", () => {
  it("finds a two-file cycle through a type-only import, and the pair of folders it joins", () => {
    const graph = new Map([
      ["scale/zScore.ts", ["scale/columnTransform.ts", "table/types.ts"]],
      ["scale/columnTransform.ts", ["scale/zScore.ts"]],
      ["table/types.ts", []],
      ["cover/a.ts", ["sweep/b.ts"]],
      ["sweep/b.ts", ["cover/c.ts"]],
      ["cover/c.ts", []],
    ]);
    expect(fileCycles(graph)).toEqual([["scale/columnTransform.ts", "scale/zScore.ts"]]); // worked by hand
    expect(mutualFolders(graph)).toEqual(["cover ↔ sweep"]); // worked by hand
    expect(upwardImports(graph, ["table", "scale", "sweep", "cover"])).toEqual(["sweep → cover"]); // worked by hand: sweep/b.ts imports cover/c.ts
  });

  it("reads import type, export from and dynamic import statements", () => {
    const graph = importGraph(fileURLToPath(new URL("./fixtures", import.meta.url)));
    expect(graph.get("a.ts")).toEqual(["b.ts", "c.ts", "d.ts"]); // worked by hand: the three statements in fixtures/a.ts
  });
});
