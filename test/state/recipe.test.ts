import { createHash } from "node:crypto";
import { describe, expect, it } from "vitest";
import { recipeToJson, type Recipe } from "../../src/core/index.ts";
import { createActions } from "../../src/state/actions.ts";
import { levelsColor } from "../../src/state/colorChoices.ts";
import { createRecipeActions } from "../../src/state/recipeActions.ts";
import { recipeFromState } from "../../src/state/recipeFromState.ts";
import { createWorkbenchStore, type WorkbenchState } from "../../src/state/store.ts";
import { inThreadClient, noDemo, steppingClock } from "./support.ts";

const csv = "name,x,y,kind,out\nn1,0,0,a,0\nn2,1,0,b,1\nn3,0,1,a,0\nn4,5,5,b,1\nn5,6,5,a,1\nn6,5,6,b,0\n";
const csvSha = createHash("sha256").update(csv).digest("hex"); // node:crypto, reference library

async function loaded() {
  const store = createWorkbenchStore();
  const base = createActions(store, { client: inThreadClient(), fetchDemo: noDemo, now: steppingClock() });
  let regionId = 100;
  const recipes = createRecipeActions(store, { takeRegionId: () => regionId++, reload: base.reload, setRadius: base.setRadius });
  await base.loadText(csv, { fileName: "t.csv", fileSize: csv.length, isDemo: false });
  return { store, base, recipes };
}

/** The parts of the state a recipe decides (region ids are the session's own, so only names and rows). */
const decided = (s: WorkbenchState) => ({
  roles: s.roles, scale: s.scale, metric: s.metric, radius: s.radius, landmarks: s.landmarks, seed: s.seed, missing: s.missing, weights: s.weights,
  colorLevel: s.colorLevel, regions: s.regions.map((r) => [r.name, Array.from(r.rows)]),
});

describe("recipes in the workbench state", () => {
  it("the load answer's fingerprint is the file's SHA-256 and size", async () => {
    const { store } = await loaded();
    expect(store.getState().inputFingerprint).toEqual({ bytes: csv.length, sha256: csvSha });
  });

  it("recipeFromState writes what is on screen: roles, parameters, colour, regions by record number", async () => {
    const { store, base } = await loaded();
    await base.setRole("out", "outcome");
    await base.setRole("kind", "feature");
    await base.setWeight("x", 2);
    await base.setRadius(1.5);
    base.setColorBy("out");
    base.selectNode(0, true);
    base.keepSelectionAsRegion();
    const recipe = recipeFromState(store.getState())!;
    expect(recipe).toMatchObject({
      shoalRecipe: 1,
      input: { name: "t.csv", bytes: csv.length, sha256: csvSha },
      reading: { delimiter: null, decimal: null, encoding: null, ragged: "reject" },
      columns: { features: ["x", "y"], id: "name", outcomes: ["out"], oneHot: ["kind"], weights: { x: 2 } },
      radius: 1.5,
      landmarks: { rule: "greedy-file-order", seed: 1 },
      colour: { kind: "column", name: "out", level: null },
    });
    expect(recipe.regions[0]!.name).toBe("Region A");
    expect(recipe.regions[0]!.records).toEqual(Array.from(store.getState().regions[0]!.rows, (r) => r + 1));
    expect(recipe).not.toHaveProperty("hotspots"); // no scan was run
  });

  it("state → recipe → apply on a fresh load → the same state and the same recipe bytes", async () => {
    const first = await loaded();
    await first.base.setRole("out", "outcome");
    await first.base.setMetric("manhattan");
    await first.base.setRadius(2.5);
    await first.base.setLandmarks("maximin");
    await first.base.setSeed(7);
    first.base.setColorBy(levelsColor("out"));
    first.base.selectNode(0, true);
    first.base.keepSelectionAsRegion();
    const recipe = recipeFromState(first.store.getState())!;

    const second = await loaded();
    expect(await second.recipes.applyRecipe(recipe)).toEqual({ kind: "applied" });
    expect(decided(second.store.getState())).toEqual(decided(first.store.getState()));
    expect(second.store.getState().colorBy).toBe(levelsColor("out"));
    expect(second.store.getState().result!.params).toEqual(first.store.getState().result!.params);
    expect(recipeToJson(recipeFromState(second.store.getState())!)).toBe(recipeToJson(recipe));
  });

  it("a colour by a region's share follows the region to its new id", async () => {
    const { store, base, recipes } = await loaded();
    await base.setRadius(1.5);
    const recipe: Recipe = { ...recipeFromState(store.getState())!, regions: [{ name: "east", records: [4, 5] }], colour: { kind: "region", name: "east", level: null } };
    expect(await recipes.applyRecipe(recipe)).toEqual({ kind: "applied" });
    const s = store.getState();
    expect(s.colorBy).toBe(`@region:${s.regions[0]!.id}`);
    expect(recipeFromState(s)!.colour).toEqual({ kind: "region", name: "east", level: null });
  });

  it("all or nothing: a recipe naming a missing column changes nothing and names the column", async () => {
    const { store, base, recipes } = await loaded();
    await base.setRadius(1.5);
    const before = store.getState();
    const recipe: Recipe = { ...recipeFromState(before)!, metric: "chebyshev", radius: 9, columns: { features: ["x", "depth"], id: "name", outcomes: [], oneHot: [], weights: {} } };
    expect(await recipes.applyRecipe(recipe)).toEqual({ kind: "refused", message: 'invalid recipe: the table has no column "depth" (the recipe\'s feature)' });
    expect(store.getState()).toBe(before);
  });

  it("a recipe made on other bytes is held back with both fingerprints, and applied when allowed", async () => {
    const { store, base, recipes } = await loaded();
    await base.setRadius(1.5);
    const other = "0".repeat(64);
    const recipe: Recipe = { ...recipeFromState(store.getState())!, input: { name: "old.csv", bytes: 10, sha256: other }, radius: 3 };
    const before = store.getState();
    expect(await recipes.applyRecipe(recipe)).toEqual({
      kind: "other-file",
      line: `the recipe was made on old.csv (sha256 ${other}, 10 bytes), not on this file t.csv (sha256 ${csvSha}, ${csv.length} bytes)`,
    });
    expect(store.getState()).toBe(before);
    expect(await recipes.applyRecipe(recipe, { allowOtherFile: true })).toEqual({ kind: "applied" });
    expect(store.getState().radius).toBe(3);
  });

  it("a recipe with other reading options reads the file again with them first", async () => {
    const { store, base, recipes } = await loaded();
    await base.setRadius(1.5);
    const recipe: Recipe = { ...recipeFromState(store.getState())!, reading: { delimiter: "comma", decimal: ".", encoding: null, ragged: "pad" } };
    expect(await recipes.applyRecipe(recipe)).toEqual({ kind: "applied" });
    expect(store.getState().readOptions).toEqual({ delimiter: ",", decimal: ".", ragged: "pad" });
    expect(recipeFromState(store.getState())!.reading).toEqual(recipe.reading);
  });

  it("with no table loaded the recipe asks for its file", async () => {
    const store = createWorkbenchStore();
    const recipes = createRecipeActions(store, { takeRegionId: () => 1, reload: async () => {}, setRadius: async () => {} });
    const recipe = { input: { name: "pumps.csv" } } as Recipe;
    expect(await recipes.applyRecipe(recipe)).toEqual({ kind: "refused", message: "no table is loaded: open pumps.csv first, then the recipe" });
  });
});

describe("recipes whose reading options fail", () => {
  it("a reading the file does not survive is refused, and the table is read back as it was, with its settings", async () => {
    const { store, base, recipes } = await loaded();
    await base.setRole("out", "outcome");
    await base.setRadius(1.5);
    const before = recipeFromState(store.getState())!;
    // a semicolon delimiter makes the header one column, so the recipe's columns are gone
    const recipe: Recipe = { ...before, reading: { ...before.reading, delimiter: "semicolon" } };
    const outcome = await recipes.applyRecipe(recipe);
    expect(outcome.kind).toBe("refused");
    expect(store.getState().readOptions).toEqual({});
    expect(recipeToJson(recipeFromState(store.getState())!)).toBe(recipeToJson(before));
  });
});
