import type { ParsedTable, TableColumn } from "../core/index.ts";
import type { ColumnRole } from "./slices/paramsSlice.ts";

/** Roles a dataset may bring with it (the demo does); anything unnamed gets the default rule. */
export interface RoleHints {
  readonly id?: string;
  readonly outcomes?: readonly string[];
}

/**
 * Default roles: named hints first; otherwise the first text column whose values are all
 * distinct and present is the identifier, numeric columns are features, other text columns are
 * ignored. Outcomes are never guessed from names: the user picks them.
 */
export function defaultRoles(table: ParsedTable, hints: RoleHints = {}): Record<string, ColumnRole> {
  const roles: Record<string, ColumnRole> = {};
  let id = hints.id ?? null;
  if (id === null) id = table.columns.find((c) => c.kind === "text" && c.missing === 0 && isUnique(c))?.name ?? null;
  for (const column of table.columns) {
    if (column.name === id) roles[column.name] = "id";
    else if (hints.outcomes?.includes(column.name)) roles[column.name] = "outcome";
    else roles[column.name] = column.kind === "numeric" ? "feature" : "ignore";
  }
  return roles;
}

function isUnique(column: TableColumn): boolean {
  if (column.type !== undefined) return column.type === "identifier" && (column.categories?.levels.length ?? new Set(column.texts).size) === column.numbers.length;
  return new Set(column.texts).size === column.numbers.length;
}
