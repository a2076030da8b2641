import { describe, expect, it } from "vitest";
import type { Recipe } from "../../src/core/index.ts";
import { sameBuild } from "../../src/state/history/sameBuild.ts";
import { snapshotKey, workbenchSnapshot } from "../../src/state/history/workbenchSnapshot.ts";
import { initialState } from "../../src/state/store.ts";

// a made-up recipe; only its shape matters here
const recipe: Recipe = {
  shoalRecipe: 1, writtenBy: "shoal 0.1.0", input: { name: "t.csv", bytes: 10, sha256: "0".repeat(64) },
  reading: { delimiter: null, decimal: null, encoding: null, ragged: "reject" },
  columns: { features: ["x"], id: null, outcomes: ["y"], oneHot: [], weights: {} },
  missing: "drop", scale: "zscore", metric: "euclidean", radius: 1, landmarks: { rule: "greedy-file-order", seed: 1 },
  colour: { kind: "none", name: null, level: null }, regions: [],
};
const hotspots = { column: "y", direction: "high", maxNodes: 8, replicates: 999, score: "auto", scanSeed: 1, stabilitySeeds: 0 } as const;

describe("workbenchSnapshot", () => {
  it("keeps the recipe without its hotspot settings, the selection and the active region by name", () => {
    const state = { ...initialState, selection: [1, 3], regions: [{ id: 7, name: "north", rows: Uint32Array.of(0) }], activeRegionId: 7 };
    const snapshot = workbenchSnapshot(state, () => ({ ...recipe, hotspots }));
    expect(snapshot).toEqual({ recipe, selection: [1, 3], activeRegion: "north" });
  });

  it("a scan adds no step: the snapshot with and without hotspot settings has one key", () => {
    const withScan = workbenchSnapshot(initialState, () => ({ ...recipe, hotspots }))!;
    const without = workbenchSnapshot(initialState, () => recipe)!;
    expect(snapshotKey(withScan)).toBe(snapshotKey(without));
  });

  it("is null while there is no recipe", () => {
    expect(workbenchSnapshot(initialState, () => null)).toBeNull();
  });
});

describe("sameBuild", () => {
  it("colour, regions, hotspot settings and the writer differ: the same build; a radius or a role differs: not", () => {
    const drawn = { ...recipe, writtenBy: "shoal 9", colour: { kind: "column", name: "y", level: null }, regions: [{ name: "A", records: [1] }], hotspots } as const;
    expect(sameBuild(recipe, drawn)).toBe(true);
    expect(sameBuild(recipe, { ...recipe, radius: 2 })).toBe(false);
    expect(sameBuild(recipe, { ...recipe, columns: { ...recipe.columns, outcomes: [] } })).toBe(false);
  });
});
