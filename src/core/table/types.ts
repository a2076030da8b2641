/**
 * What the reader decided a column holds (rules in `finishColumn.ts`):
 * numeric (at least 95% of the present cells are numbers), categorical (text with repeats and at
 * most 10,000 levels), identifier (text whose present values are all distinct, or too many
 * levels to colour by) or empty (every cell missing).
 */
export type ColumnType = "numeric" | "categorical" | "identifier" | "empty";

/** Level codes of a categorical column: row i has level `levels[codes[i]]`, or none when `codes[i] === missingCode`. */
export interface Categories {
  readonly codes: Uint32Array;
  /** Distinct present cell texts in order of first appearance. */
  readonly levels: readonly string[];
}

/** Cells of a numeric column written otherwise than as their number's shortest form: `texts[k]` is row `rows[k]`'s text, rows ascending. */
export interface OriginalTexts {
  readonly rows: Uint32Array;
  readonly texts: readonly string[];
}

/** One column of a parsed table. `numbers` holds NaN wherever a cell is missing or not a number. */
export interface TableColumn {
  readonly name: string;
  /** Coarse kind: "numeric" exactly when `type` is "numeric"; every other type is "text". */
  readonly kind: "numeric" | "text";
  readonly numbers: Float64Array;
  /** Raw cell text, kept for text columns only (ids, categories; "" for an empty cell). */
  readonly texts: readonly string[] | null;
  /**
   * Numeric columns only: the cells whose text is not their number's shortest form, as written
   * (`007`, `12345678901234567890123`), so a numeric row label can be written back exactly; see `cellText`.
   */
  readonly originalTexts?: OriginalTexts;
  /** Cells counted as missing (in a numeric column this includes cells that are not numbers). */
  readonly missing: number;
  /** The reader's finer type; absent in tables built by hand. */
  readonly type?: ColumnType;
  /** Level codes, for categorical columns only. */
  readonly categories?: Categories;
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
