import { describe, expect, it } from "vitest";
import { readTableText, recipeTableProblems } from "../../../src/core/index.ts";
import { sampleRecipe } from "./sampleRecipe.ts";

const table = readTableText("name,a,b,kind,y\nn1,1,2,x,0\nn2,2,3,y,1\nn3,3,1,x,0\nn4,4,4,y,1\n", {}).table;

describe("recipeTableProblems", () => {
  it("a recipe whose columns and records the table has fits: no problems", () => {
    expect(recipeTableProblems(sampleRecipe, table)).toEqual([]);
  });

  it("names each missing column with its role in the recipe", () => {
    const recipe = { ...sampleRecipe, columns: { ...sampleRecipe.columns, features: ["a", "c"], outcomes: ["y", "z"] } };
    expect(recipeTableProblems(recipe, table)).toEqual(['the table has no column "c" (the recipe\'s feature)', 'the table has no column "z" (the recipe\'s outcome)']);
  });

  it("a text feature and a numeric one-hot column are refused", () => {
    const recipe = { ...sampleRecipe, columns: { ...sampleRecipe.columns, features: ["a", "kind"], oneHot: ["b"], weights: {} } };
    expect(recipeTableProblems(recipe, table)).toEqual(['feature "kind" is not a numeric column in this table', 'one-hot column "b" is numeric in this table']);
  });

  it("a region record past the last record (5 of 4) is refused", () => {
    const recipe = { ...sampleRecipe, regions: [{ name: "R", records: [2, 5] }] };
    expect(recipeTableProblems(recipe, table)).toEqual(['region "R" names record 5, past the table\'s last record (4)']);
  });
});
