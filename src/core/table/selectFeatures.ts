import type { MissingPolicy } from "../params.ts";
import { mean } from "../stats/mean.ts";
import { quantileSorted } from "../stats/quantileSorted.ts";
import type { NumericTable, ParsedTable, TableColumn } from "./types.ts";

/** Dropped row numbers listed in the missing-value report. */
export const shownDroppedRows = 10; // our choice, no source

/** What the missing-value policy did to one feature column. */
export interface FeatureMissing {
  readonly name: string;
  /** Missing cells in the column (all rows). */
  readonly missing: number;
  /** Rows left out with this column missing (a row missing in two columns counts in both; 0 unless "drop"). */
  readonly dropped: number;
  /** Values filled in (0 under "drop"). */
  readonly imputed: number;
  /** The value filled in (NaN under "drop"). */
  readonly fill: number;
}

/** The missing-value report. Invariant: read = used + dropped. */
export interface MissingReport {
  readonly policy: MissingPolicy;
  readonly read: number;
  readonly used: number;
  readonly dropped: number;
  /** The first dropped rows as 1-based data-record numbers (at most 10). */
  readonly firstDropped: readonly number[];
  readonly columns: readonly FeatureMissing[];
}

export interface FeatureSelection {
  /** The rows that enter the build, features in the order given. */
  readonly table: NumericTable;
  /** For each row of `table`, its 0-based row in the parsed table (ascending). */
  readonly usedRows: Uint32Array;
  /** Parsed-table rows left out because a feature value is missing (ascending; empty unless the policy is "drop"). */
  readonly droppedRows: Uint32Array;
  /** Values filled in per feature (only under "median" or "mean"). */
  readonly imputed: Readonly<Record<string, number>>;
  readonly missing: MissingReport;
}

/**
 * Copies the chosen numeric columns into a row-major matrix. Missing values are handled by
 * `policy`: "drop" leaves out every row with a missing feature (returned, never lost);
 * "median" (Hyndman–Fan type 7) or "mean" fills each column's gaps from its present values.
 * A column with no value at all (type "empty") cannot be a feature. `onStep` is called every
 * 65,536 rows (a chance to cancel by throwing). O(rows · features).
 */
export function selectFeatures(parsed: ParsedTable, features: readonly string[], policy: MissingPolicy = "drop", onStep?: () => void): FeatureSelection {
  if (features.length === 0) throw new Error("choose at least one feature column");
  const columns = features.map((name) => featureColumn(parsed, name));
  const d = columns.length;
  const n = parsed.rows;
  const fill = columns.map((column) => (policy === "drop" ? NaN : fillValue(column.numbers, policy)));
  const imputed: Record<string, number> = {};
  const complete = new Uint8Array(n).fill(1);
  for (const column of columns) {
    if (policy !== "drop") imputed[column.name] = column.missing;
    else for (let i = 0; i < n; ++i) if (Number.isNaN(column.numbers[i]!)) complete[i] = 0;
  }
  let used = 0;
  for (let i = 0; i < n; ++i) used += complete[i]!;
  const usedRows = new Uint32Array(used);
  const droppedRows = new Uint32Array(n - used);
  const values = new Float64Array(used * d);
  for (let i = 0, u = 0, x = 0; i < n; ++i) {
    if ((i & 0xffff) === 0xffff) onStep?.();
    if (!complete[i]) {
      droppedRows[x++] = i;
      continue;
    }
    for (let j = 0; j < d; ++j) {
      const value = columns[j]!.numbers[i]!;
      values[u * d + j] = Number.isNaN(value) ? fill[j]! : value;
    }
    usedRows[u++] = i;
  }
  const report: MissingReport = {
    policy,
    read: n,
    used,
    dropped: n - used,
    firstDropped: Array.from(droppedRows.subarray(0, shownDroppedRows), (row) => row + 1),
    columns: columns.map((column, j) => ({ name: column.name, missing: column.missing, dropped: policy === "drop" ? column.missing : 0, imputed: policy === "drop" ? 0 : column.missing, fill: fill[j]! })),
  };
  return { table: { rows: used, columns: d, names: [...features], values }, usedRows, droppedRows, imputed, missing: report };
}

function fillValue(numbers: Float64Array, policy: "median" | "mean"): number {
  if (policy === "mean") return mean(numbers);
  const present = numbers.filter((x) => !Number.isNaN(x)).sort();
  return quantileSorted(present, 0.5);
}

function featureColumn(parsed: ParsedTable, name: string): TableColumn {
  const column = parsed.columns.find((c) => c.name === name);
  if (!column) throw new Error(`unknown column: ${name}`);
  if (column.type === "empty" || (parsed.rows > 0 && column.missing === parsed.rows)) throw new Error(`column has no values: ${name}`);
  if (column.kind !== "numeric") throw new Error(`not a numeric column: ${name}`);
  return column;
}
