import { RecipeError } from "./recipeError.ts";
import type { Recipe } from "./types.ts";
import { validateRecipe } from "./validateRecipe.ts";

/** A recipe file's text, parsed and checked; a damaged file is one `RecipeError` naming where JSON.parse stopped. */
export function parseRecipe(text: string): Recipe {
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch (error) {
    throw new RecipeError([`not readable as JSON (${error instanceof Error ? error.message : String(error)})`]);
  }
  return validateRecipe(json);
}
