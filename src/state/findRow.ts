import { cellText, type CoverResult, type ParsedTable } from "../core/index.ts";
import { nodesHoldingRow } from "../core/index.ts";

export type FindMode = "label" | "record";

/**
 * Where a row is in the build: its nodes, or why it is not there. `row` is 0-based (record number − 1).
 * `note` says when a label names several rows and which one is shown.
 */
export type RowPlace =
  | { readonly kind: "found"; readonly row: number; readonly nodes: readonly number[]; readonly note?: string }
  | { readonly kind: "left-out"; readonly row: number; readonly reason: string; readonly note?: string }
  | { readonly kind: "unknown"; readonly reason: string };

/**
 * The parsed-table row that a query names: a 1-based record number (as in the exports; decimal
 * digits only, so "0x10" or "1e1" is no record number), or the text of the row-label column (the
 * first row with that label). Returns the reason when no row matches.
 */
export function rowOfQuery(table: ParsedTable, labelColumn: string | null, query: string, mode: FindMode): number | { readonly reason: string } {
  const found = queryRows(table, labelColumn, query, mode);
  return "reason" in found ? found : found.row;
}

/** The row a query names and how many rows it matches (more than one only for a label). */
function queryRows(table: ParsedTable, labelColumn: string | null, query: string, mode: FindMode): { readonly row: number; readonly matches: number } | { readonly reason: string } {
  const text = query.trim();
  if (text === "") return { reason: "type a record number or a row label" };
  if (mode === "record") {
    if (!/^\d+$/.test(text)) return { reason: `not a record number: ${text}` }; // Number() would also take 0x10, 1e1, +4
    const record = Number(text);
    if (record < 1 || record > table.rows) return { reason: `no record ${text}: the table has records 1 to ${table.rows}` };
    return { row: record - 1, matches: 1 };
  }
  const column = table.columns.find((c) => c.name === labelColumn);
  if (!column) return { reason: "no column has the role row label" };
  let first = -1;
  let matches = 0;
  for (let row = 0; row < table.rows; ++row) {
    if (cellText(column, row) !== text) continue;
    if (matches++ === 0) first = row;
  }
  return matches === 0 ? { reason: `no row labelled ${text} in ${column.name}` } : { row: first, matches };
}

/** Where the queried row is in the build: its nodes, or left out with the reason (missing value, undefined distance). */
export function findRow(table: ParsedTable, result: CoverResult, labelColumn: string | null, query: string, mode: FindMode): RowPlace {
  const found = queryRows(table, labelColumn, query, mode);
  if ("reason" in found) return { kind: "unknown", reason: found.reason };
  const { row } = found;
  const note = found.matches > 1 ? { note: `label matches ${found.matches} rows; showing record ${row + 1}` } : {};
  if (result.droppedRows.includes(row)) return { kind: "left-out", row, reason: "a feature column has a missing value in this row", ...note };
  if (result.undefinedRows.includes(row)) return { kind: "left-out", row, reason: `the ${result.params.metric} distance is undefined for this row`, ...note };
  const nodes = nodesHoldingRow(result.members, row);
  if (nodes.length === 0) return { kind: "left-out", row, reason: "the row lies in no ball of this build", ...note };
  return { kind: "found", row, nodes, ...note };
}
