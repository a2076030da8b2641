/** One column of a parsed table. `numbers` holds NaN wherever a cell is missing or not a number. */
export interface TableColumn {
  readonly name: string;
  readonly kind: "numeric" | "text";
  readonly numbers: Float64Array;
  /** Raw cell text, kept for text columns only (ids, categories). */
  readonly texts: readonly string[] | null;
  readonly missing: number;
}

/**
 * A parsed input table, column-major. Row k (0-based) is data record k + 1 of the file:
 * the first record after the header is row 1, blank lines are not records, and a quoted
 * field with a newline does not start a new record.
 */
export interface ParsedTable {
  readonly rows: number;
  readonly columns: readonly TableColumn[];
}

/** Row-major numeric matrix: value (i, j) is values[i * columns + j]. */
export interface NumericTable {
  readonly rows: number;
  readonly columns: number;
  readonly names: readonly string[];
  readonly values: Float64Array;
}
