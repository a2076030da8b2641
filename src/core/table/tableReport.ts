import type { DecimalMark, Delimiter } from "./readOptions.ts";
import type { ColumnType, ParsedTable } from "./types.ts";

/** A non-empty cell counted as missing: a token such as NA or Inf, or text in a numeric column. */
export interface FlaggedCell {
  /** 1-based data-record number (the first record after the header is row 1). */
  readonly row: number;
  /** 1-based line of the file where the record starts; null for Parquet. */
  readonly line: number | null;
  readonly column: string;
  readonly text: string;
  readonly reason: "missing-token" | "not-a-number";
}

/** What the reader found in one column. */
export interface ColumnReport {
  /** The column's name in the table (after renaming). */
  readonly name: string;
  /** The header cell as written in the file. */
  readonly header: string;
  readonly type: ColumnType;
  /** Cells counted as missing: empty cells, tokens, and in a numeric column text that is not a number. */
  readonly missing: number;
  /** Distinct present values (numbers compared as numbers, text as written), exact unless `distinctAtLeast`. */
  readonly distinct: number;
  /** True when counting stopped at the cap: there are at least `distinct` values. */
  readonly distinctAtLeast: boolean;
  /** Smallest and largest number of a numeric column; NaN for other types. */
  readonly min: number;
  readonly max: number;
  /** The first few present values, as written. */
  readonly firstValues: readonly string[];
  /** The first few non-empty cells counted as missing, in row order. */
  readonly flagged: readonly FlaggedCell[];
  /** How many non-empty cells were counted as missing in all. */
  readonly flaggedCount: number;
  /**
   * A numeric column that looks like a row number or a numeric id (rule in `looksLikeRowNumber`:
   * distinct integers, consecutive after sorting or written with leading zeros or past 15 digits):
   * better the row label than a feature.
   */
  readonly looksLikeRowNumber: boolean;
}

export type NoticeCode = "renamed-column" | "ragged-records" | "one-row" | "no-numeric-column" | "malformed-quotes" | "texts-reformatted" | "skipped-column" | "large-integers" | "row-number-column" | "empty-lines";

/** Something the reader changed or wants the user to know; the message is lowercase and names the values. */
export interface Notice {
  readonly code: NoticeCode;
  readonly message: string;
}

export type TableFormat =
  | { readonly kind: "delimited"; readonly delimiter: Delimiter; readonly decimal: DecimalMark; readonly delimiterDetected: boolean; readonly decimalDetected: boolean }
  | { readonly kind: "parquet" };

/** The column report after loading: format, counts per column, notices. */
export interface TableReport {
  readonly format: TableFormat;
  /** Data records read (= table rows). */
  readonly rows: number;
  /** Lines of text read, blank lines and quoted line breaks included; null for Parquet. */
  readonly lines: number | null;
  /**
   * Wholly empty lines that were not records (before the header, or anywhere in a file of several
   * columns); absent for Parquet. In a one-column file an empty line is a record with a missing value.
   */
  readonly emptyLines?: number;
  readonly columns: readonly ColumnReport[];
  readonly notices: readonly Notice[];
}

/** A loaded table and its report. Bad input never yields an outcome: it throws one Error instead. */
export interface ReadOutcome {
  readonly table: ParsedTable;
  readonly report: TableReport;
}
