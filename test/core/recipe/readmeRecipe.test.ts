import { createHash } from "node:crypto";
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { recipeToJson, validateRecipe } from "../../../src/core/index.ts";
import { sampleRecipe } from "./sampleRecipe.ts";

// The README's "Recipes" section documents the schema: its table names every field, and its example is a valid recipe of the demo file.
const readme = readFileSync(new URL("../../../README.md", import.meta.url), "utf8");
const section = readme.slice(readme.indexOf("## Recipes\n"), readme.indexOf("\n## ", readme.indexOf("## Recipes\n") + 1));

describe("README: Recipes", () => {
  it("the field table lists the recipe's top-level fields in the file's order", () => {
    const fields = [...section.matchAll(/^\| `(\w+)` \|/gm)].map((m) => m[1]);
    expect(fields).toEqual(Object.keys(JSON.parse(recipeToJson(sampleRecipe))));
  });

  it("the example is a valid recipe whose fingerprint is the demo file's (node:crypto)", () => {
    const example = /```json\n([\s\S]*?)```/.exec(section)![1]!;
    const recipe = validateRecipe(JSON.parse(example));
    const demo = readFileSync(new URL("../../../public/demo/pump-fleet.csv", import.meta.url));
    expect(recipe.input).toEqual({ name: "pump-fleet.csv", bytes: demo.length, sha256: createHash("sha256").update(demo).digest("hex") });
  });
});
