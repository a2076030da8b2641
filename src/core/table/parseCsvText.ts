import { readTableText } from "./readTableText.ts";
import type { ParsedTable } from "./types.ts";

/**
 * Parses a whole delimited text into a column-major table with the reader's defaults
 * (delimiter and decimal mark detected, ragged records rejected) and drops the report.
 * Throws one clear error for bad input; see `createTableReader` and `finishColumn` for the rules.
 */
export function parseCsvText(text: string): ParsedTable {
  return readTableText(text).table;
}
