import type { ParsedTable } from "../table/types.ts";
import type { Recipe } from "./types.ts";

/**
 * What keeps a recipe from applying to a loaded table, one message each: a named column that the
 * table lacks, a feature that is not numeric, a one-hot column that is (the workbench makes a
 * numeric column a plain feature), a colour column that is gone, and a region record past the
 * table's last record. Empty when the recipe fits. O(columns named · columns + records).
 */
export function recipeTableProblems(recipe: Recipe, table: ParsedTable): string[] {
  const problems: string[] = [];
  const kind = new Map(table.columns.map((c) => [c.name, c.kind]));
  const { features, id, outcomes, oneHot } = recipe.columns;
  const named: [string, readonly string[]][] = [["feature", features], ["one-hot column", oneHot], ["outcome", outcomes], ["id column", id === null ? [] : [id]]];
  for (const [role, names] of named) for (const name of names) if (!kind.has(name)) problems.push(`the table has no column ${JSON.stringify(name)} (the recipe's ${role})`);
  for (const name of features) if (kind.get(name) === "text") problems.push(`feature ${JSON.stringify(name)} is not a numeric column in this table`);
  for (const name of oneHot) if (kind.get(name) === "numeric") problems.push(`one-hot column ${JSON.stringify(name)} is numeric in this table`);
  const { colour } = recipe;
  if ((colour.kind === "column" || colour.kind === "levels") && colour.name !== null && !kind.has(colour.name)) {
    problems.push(`the table has no column ${JSON.stringify(colour.name)} (the recipe's colour)`);
  }
  for (const region of recipe.regions) {
    const last = region.records[region.records.length - 1];
    if (last !== undefined && last > table.rows) problems.push(`region ${JSON.stringify(region.name)} names record ${last}, past the table's last record (${table.rows})`);
  }
  return problems;
}
