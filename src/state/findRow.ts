import { cellText, type CoverResult, type ParsedTable } from "../core/index.ts";
import { nodesHoldingRow } from "../core/index.ts";

export type FindMode = "label" | "record";

/** Where a row is in the build: its nodes, or why it is not there. `row` is 0-based (record number − 1). */
export type RowPlace =
  | { readonly kind: "found"; readonly row: number; readonly nodes: readonly number[] }
  | { readonly kind: "left-out"; readonly row: number; readonly reason: string }
  | { readonly kind: "unknown"; readonly reason: string };

/**
 * The parsed-table row that a query names: a 1-based record number (as in the exports), or the
 * text of the row-label column (the first row with that label). Returns an "unknown" place with
 * the reason when no row matches.
 */
export function rowOfQuery(table: ParsedTable, labelColumn: string | null, query: string, mode: FindMode): number | { readonly reason: string } {
  const text = query.trim();
  if (text === "") return { reason: "type a record number or a row label" };
  if (mode === "record") {
    const record = Number(text);
    if (!Number.isInteger(record)) return { reason: `not a record number: ${text}` };
    if (record < 1 || record > table.rows) return { reason: `no record ${text}: the table has records 1 to ${table.rows}` };
    return record - 1;
  }
  const column = table.columns.find((c) => c.name === labelColumn);
  if (!column) return { reason: "no column has the role row label" };
  for (let row = 0; row < table.rows; ++row) if (cellText(column, row) === text) return row;
  return { reason: `no row labelled ${text} in ${column.name}` };
}

/** Where the queried row is in the build: its nodes, or left out with the reason (missing value, undefined distance). */
export function findRow(table: ParsedTable, result: CoverResult, labelColumn: string | null, query: string, mode: FindMode): RowPlace {
  const row = rowOfQuery(table, labelColumn, query, mode);
  if (typeof row !== "number") return { kind: "unknown", reason: row.reason };
  if (result.droppedRows.includes(row)) return { kind: "left-out", row, reason: "a feature column has a missing value in this row" };
  if (result.undefinedRows.includes(row)) return { kind: "left-out", row, reason: `the ${result.params.metric} distance is undefined for this row` };
  const nodes = nodesHoldingRow(result.members, row);
  if (nodes.length === 0) return { kind: "left-out", row, reason: "the row lies in no ball of this build" };
  return { kind: "found", row, nodes };
}
