import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { parseRecipe, recipeToJson, shoalVersion, type Recipe } from "../../../src/core/index.ts";
import { sampleRecipe } from "./sampleRecipe.ts";

describe("recipeToJson", () => {
  it("writes 2-space indented JSON with a trailing newline that reads back to the same recipe", () => {
    const text = recipeToJson(sampleRecipe);
    expect(text.endsWith("}\n")).toBe(true);
    expect(text.split("\n")[1]).toBe('  "shoalRecipe": 1,');
    expect(parseRecipe(text)).toEqual(sampleRecipe);
  });

  it("gives the same bytes whatever order the keys were built in", () => {
    const shuffled = Object.fromEntries(Object.entries(sampleRecipe).reverse()) as unknown as Recipe;
    const weights = { ...sampleRecipe.columns, weights: { kind: 0.5, b: 2 } };
    const reordered = { ...shuffled, columns: { weights: weights.weights, oneHot: weights.oneHot, outcomes: weights.outcomes, id: weights.id, features: weights.features } };
    expect(recipeToJson(reordered)).toBe(recipeToJson({ ...sampleRecipe, columns: weights }));
    expect(Object.keys(JSON.parse(recipeToJson(reordered)).columns.weights)).toEqual(["b", "kind"]); // features first, then one-hot columns
  });

  it("keeps the schema's top-level key order (README's example has it)", () => {
    expect(Object.keys(JSON.parse(recipeToJson(sampleRecipe)))).toEqual([
      "shoalRecipe", "writtenBy", "input", "reading", "columns", "missing", "scale", "metric", "radius", "landmarks", "colour", "regions", "hotspots",
    ]);
  });

  it("leaves hotspots out when no scan was run", () => {
    const { hotspots: _hotspots, ...withoutScan } = sampleRecipe;
    expect(JSON.parse(recipeToJson(withoutScan))).not.toHaveProperty("hotspots");
  });

  it("shoalVersion is package.json's version", () => {
    expect(shoalVersion).toBe(JSON.parse(readFileSync(new URL("../../../package.json", import.meta.url), "utf8")).version);
  });
});
