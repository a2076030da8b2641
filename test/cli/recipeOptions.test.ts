import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { recipeToJson } from "../../src/core/index.ts";
import { commonOptionSpec } from "../../src/cli/commonOptions.ts";
import { parseHotspotArgs } from "../../src/cli/parseHotspotArgs.ts";
import { parseSweepArgs } from "../../src/cli/parseSweepArgs.ts";
import { argsWithRecipe, recipeValues } from "../../src/cli/recipeOptions.ts";
import { strictArgs } from "../../src/cli/strictArgs.ts";
import { sampleRecipe } from "../core/recipe/sampleRecipe.ts";

const scratch = mkdtempSync(join(tmpdir(), "shoal-recipe-options-"));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));
const recipeFile = join(scratch, "r.json");
writeFileSync(recipeFile, recipeToJson({ ...sampleRecipe, metric: "cosine", scale: "robust" }));

describe("typed options and defaults can be told apart", () => {
  // before the fix the spec carried `default: "zscore"` (and "euclidean", "1", …), so an untyped option read as typed
  it("an option not typed is undefined after parsing, not its default", () => {
    const { values } = strictArgs(["data.csv"], commonOptionSpec);
    expect([values.scale, values.metric, values.landmarks, values.seed, values.missing]).toEqual([undefined, undefined, undefined, undefined, undefined]);
  });

  it("defaults still apply when neither the command line nor a recipe gives a value: sweep steps 24, scale zscore", () => {
    const command = parseSweepArgs(["data.csv"]);
    expect(command.steps).toBe(24); // the README's default
    expect(command.params).toMatchObject({ scale: "zscore", metric: "euclidean", landmarks: "greedy-file-order", seed: 1, missing: "drop" });
  });

  it("a switch takes no value: --allow-other-file before --seed -3 leaves the seed to --seed", () => {
    const { flags, values } = strictArgs(["x", "--allow-other-file", "--seed", "-3"], { "allow-other-file": { type: "boolean" }, seed: { type: "string" } });
    expect([...flags]).toEqual(["allow-other-file"]);
    expect(values.seed).toBe("-3");
  });
});

describe("argsWithRecipe", () => {
  it("fills the options not typed from the recipe and keeps the typed ones", () => {
    const { values, recipe } = argsWithRecipe(["data.csv", "--recipe", recipeFile, "--metric", "manhattan"], { ...commonOptionSpec, radius: { type: "string" } });
    expect(values).toMatchObject({ metric: "manhattan", scale: "robust", radius: "0.5", columns: "a,b", id: "name", outcome: "y", "one-hot": "kind", weights: "b=2" });
    expect(recipe).toMatchObject({ recipeFile, saveTo: null, allowOtherFile: false });
    expect(recipe.recipe?.metric).toBe("cosine"); // the recipe itself is kept as read
  });

  it("fills only the options the command has: sweep takes no radius, only hotspots takes the scan settings", () => {
    expect(parseSweepArgs(["data.csv", "--recipe", recipeFile])).not.toHaveProperty("radius");
    const hotspots = parseHotspotArgs(["data.csv", "--recipe", recipeFile, "--out", "o", "--replicates", "99"]);
    expect(hotspots).toMatchObject({ scan: "y", direction: "high", maxNodes: 8, replicates: 99, score: null, scanSeed: 1, stabilitySeeds: 0, radius: 0.5 });
  });

  it("a recipe column with a comma cannot be carried and says so", () => {
    expect(() => recipeValues({ ...sampleRecipe, columns: { ...sampleRecipe.columns, features: ["a,b"], weights: {} } })).toThrow("the recipe names a column with a comma, which the command line cannot carry: a,b");
  });

  it("--save-recipe with an empty name is refused", () => {
    expect(() => argsWithRecipe(["data.csv", "--save-recipe", ""], commonOptionSpec)).toThrow("invalid --save-recipe: an empty file name");
  });
});
