import type { StepHook } from "../control.ts";
import { maybeMetric } from "../metric/metrics.ts";
import { scaleTable } from "./scaleTable.ts";
import { oneHot } from "../table/oneHot.ts";
import { selectFeatures } from "../table/selectFeatures.ts";
import type { NumericTable, ParsedTable, TableColumn } from "../table/types.ts";
import { excludeUndefinedRows } from "./excludeUndefinedRows.ts";
import { maybeMissingPolicy, type CoverParams } from "../params.ts";

export interface PreparedFeatures {
  /** Row-major: the scaled and weighted numeric features, then the one-hot indicators. */
  readonly table: NumericTable;
  readonly usedRows: Uint32Array;
  /** Rows left out for a missing value in a feature or a one-hot column (policy "drop"). */
  readonly droppedRows: Uint32Array;
  readonly undefinedRows: Uint32Array;
  readonly imputed: Readonly<Record<string, number>>;
  readonly constantColumns: readonly string[];
}

/** The parameters the rows depend on: features, scaling, weights, one-hot columns, the missing-value policy (default "drop") and the metric. */
export type PreparedParams = Pick<CoverParams, "features" | "scale" | "metric"> & Partial<Pick<CoverParams, "weights" | "oneHot" | "missing">>;

/**
 * The radius-free start of every build, shared by buildCover and the sweep: select the numeric
 * features under the missing-value policy, scale them and apply their weights; then append one
 * indicator column per level of each `oneHot` column, worth its weight (default 1) and never
 * scaled (z-scoring indicators would stretch rare levels); a missing level drops the row under
 * "drop" and gives all-zero indicators (counted as filled) otherwise; finally leave out rows on
 * which the metric is undefined. `onStep` is called now and then (a chance to cancel by
 * throwing). O(n · (d + levels)) plus the scaling.
 */
export function prepareFeatures(parsed: ParsedTable, params: PreparedParams, onStep?: StepHook): PreparedFeatures {
  const metric = maybeMetric(params.metric);
  const missing = maybeMissingPolicy(params.missing ?? "drop");
  const encoded = (params.oneHot ?? []).map((name) => categoricalColumn(parsed, name));
  if (params.features.length === 0 && encoded.length === 0) throw new Error("choose at least one feature column");
  const numericWeights = Object.fromEntries(Object.entries(params.weights ?? {}).filter(([name]) => params.features.includes(name)));
  const selection = params.features.length > 0 ? selectFeatures(parsed, params.features, missing, onStep) : allRows(parsed);
  let usedRows = selection.usedRows;
  let droppedRows = selection.droppedRows;
  const imputed: Record<string, number> = { ...selection.imputed };
  // selectFeatures made this table for us alone: scale it in place rather than beside a copy
  const scaled = params.features.length > 0 ? scaleTable(selection.table, params.scale, numericWeights, { overwrite: true, ...(onStep ? { onStep } : {}) }) : { table: selection.table, constantColumns: [] };
  let table = scaled.table;
  if (encoded.length > 0) {
    const keep = new Uint8Array(usedRows.length).fill(1);
    for (const column of encoded) {
      if (missing === "drop") usedRows.forEach((row, i) => column.categories!.codes[row] === 0xffffffff && (keep[i] = 0));
      else imputed[column.name] = column.missing;
    }
    const kept = keepRows(table, usedRows, keep);
    droppedRows = Uint32Array.from([...droppedRows, ...usedRows.filter((_, i) => !keep[i])]).sort();
    usedRows = kept.usedRows;
    table = encoded.reduce((left, column) => joinColumns(left, oneHot(column.categories!, { name: column.name, weight: params.weights?.[column.name] ?? 1, rows: usedRows })), kept.table);
  }
  onStep?.();
  const defined = excludeUndefinedRows(table, metric, usedRows);
  return { table: defined.table, usedRows: defined.usedRows, droppedRows, undefinedRows: defined.undefinedRows, imputed, constantColumns: scaled.constantColumns };
}

function categoricalColumn(parsed: ParsedTable, name: string): TableColumn {
  const column = parsed.columns.find((c) => c.name === name);
  if (!column) throw new Error(`unknown column: ${name}`);
  if (!column.categories) throw new Error(`not a categorical column: ${name}`);
  return column;
}

function allRows(parsed: ParsedTable): { table: NumericTable; usedRows: Uint32Array; droppedRows: Uint32Array; imputed: Record<string, number> } {
  return { table: { rows: parsed.rows, columns: 0, names: [], values: new Float64Array(0) }, usedRows: Uint32Array.from({ length: parsed.rows }, (_, i) => i), droppedRows: new Uint32Array(0), imputed: {} };
}

function keepRows(table: NumericTable, usedRows: Uint32Array, keep: Uint8Array): { table: NumericTable; usedRows: Uint32Array } {
  if (keep.every((k) => k === 1)) return { table, usedRows };
  const d = table.columns;
  const rows: number[] = [];
  keep.forEach((k, i) => k && rows.push(i));
  const values = new Float64Array(rows.length * d);
  rows.forEach((i, k) => values.set(table.values.subarray(i * d, i * d + d), k * d));
  return { table: { ...table, rows: rows.length, values }, usedRows: Uint32Array.from(rows, (i) => usedRows[i]!) };
}

// Side by side: the rows of `right` follow those of `left` (equal row counts). NaN indicators (a missing level kept by imputation) become 0.
function joinColumns(left: NumericTable, right: NumericTable): NumericTable {
  const d = left.columns + right.columns;
  const values = new Float64Array(left.rows * d);
  for (let i = 0; i < left.rows; ++i) {
    values.set(left.values.subarray(i * left.columns, (i + 1) * left.columns), i * d);
    for (let j = 0; j < right.columns; ++j) {
      const v = right.values[i * right.columns + j]!;
      values[i * d + left.columns + j] = Number.isNaN(v) ? 0 : v;
    }
  }
  return { rows: left.rows, columns: d, names: [...left.names, ...right.names], values };
}
