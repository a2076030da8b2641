import type { MissingPolicy } from "../cover/params.ts";
import { mean } from "../stats/mean.ts";
import { quantileSorted } from "../stats/quantileSorted.ts";
import type { NumericTable, ParsedTable, TableColumn } from "./types.ts";

export interface FeatureSelection {
  /** The rows that enter the build, features in the order given. */
  readonly table: NumericTable;
  /** For each row of `table`, its 0-based row in the parsed table (ascending). */
  readonly usedRows: Uint32Array;
  /** Parsed-table rows left out because a feature value is missing (ascending; empty unless the policy is "drop"). */
  readonly droppedRows: Uint32Array;
  /** Values filled in per feature (only under "median" or "mean"). */
  readonly imputed: Readonly<Record<string, number>>;
}

/**
 * Copies the chosen numeric columns into a row-major matrix. Missing values are handled by
 * `policy`: "drop" leaves out every row with a missing feature (returned, never lost);
 * "median" (type 7) or "mean" fills each column's gaps from its present values.
 */
export function selectFeatures(parsed: ParsedTable, features: readonly string[], policy: MissingPolicy = "drop"): FeatureSelection {
  if (features.length === 0) throw new Error("choose at least one feature column");
  const columns = features.map((name) => featureColumn(parsed, name));
  const d = columns.length;
  const fill = columns.map((column) => (policy === "drop" ? NaN : fillValue(column.numbers, policy)));
  const imputed: Record<string, number> = {};
  const complete = new Uint8Array(parsed.rows).fill(1);
  for (let j = 0; j < d; ++j) {
    const column = columns[j]!;
    if (column.missing === parsed.rows) throw new Error(`column has no values: ${column.name}`);
    if (policy !== "drop") {
      imputed[column.name] = column.missing;
      continue;
    }
    for (let i = 0; i < parsed.rows; ++i) if (Number.isNaN(column.numbers[i]!)) complete[i] = 0;
  }
  let used = 0;
  for (let i = 0; i < parsed.rows; ++i) used += complete[i]!;
  const usedRows = new Uint32Array(used);
  const droppedRows = new Uint32Array(parsed.rows - used);
  const values = new Float64Array(used * d);
  for (let i = 0, u = 0, x = 0; i < parsed.rows; ++i) {
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
  return { table: { rows: used, columns: d, names: [...features], values }, usedRows, droppedRows, imputed };
}

function fillValue(numbers: Float64Array, policy: "median" | "mean"): number {
  if (policy === "mean") return mean(numbers);
  const present = numbers.filter((x) => !Number.isNaN(x)).sort();
  return quantileSorted(present, 0.5);
}

function featureColumn(parsed: ParsedTable, name: string): TableColumn {
  const column = parsed.columns.find((c) => c.name === name);
  if (!column) throw new Error(`unknown column: ${name}`);
  if (column.kind !== "numeric") throw new Error(`not a numeric column: ${name}`);
  return column;
}
