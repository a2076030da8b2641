/** A recipe that cannot be used: every problem found, one message each, so nothing is applied halfway. */
export class RecipeError extends Error {
  readonly problems: readonly string[];
  constructor(problems: readonly string[]) {
    super(`invalid recipe: ${problems.join("; ")}`);
    this.name = "RecipeError";
    this.problems = problems;
  }
}
