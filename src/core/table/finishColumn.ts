import { CellKind, type KeptCell } from "./cellKind.ts";
import { emptyCode, type ColumnBuilder } from "./columnBuilder.ts";
import { looksLikeRowNumber } from "./looksLikeRowNumber.ts";
import { originalTexts } from "./originalTexts.ts";
import { distinctCap, numericShare, shownCells } from "./readOptions.ts";
import type { ColumnReport, FlaggedCell } from "./tableReport.ts";
import type { ColumnType, TableColumn } from "./types.ts";

/** Code of a missing cell in `Categories.codes`. */
export const missingCode = 0xffffffff;

export interface FinishedColumn {
  readonly column: TableColumn;
  readonly report: ColumnReport;
  /** True when a text column's number cells had to be rewritten from their values (see ColumnBuilder). */
  readonly reformatted: boolean;
}

/**
 * Decides a column's type and turns its builder into a table column and a report.
 * Rule: of the present cells (neither blank nor a missing token such as NA or Inf),
 *   none                                   → "empty";
 *   at least 95% numbers                   → "numeric", the other cells become missing and are flagged;
 *   otherwise text: all distinct (n ≥ 2) or more than 10,000 distinct → "identifier", else "categorical".
 * Distinct values are exact up to 10,000 (numbers compared as numbers), then "at least".
 * Text columns keep every cell's text; categorical ones also get level codes. Numeric columns
 * keep the text of the cells not written as their number's shortest form (`originalTexts`), and
 * the report says whether the column looks like a row number or id (`looksLikeRowNumber`).
 */
export function finishColumn(builder: ColumnBuilder, name: string, header: string): FinishedColumn {
  const present = builder.numeric + builder.notNumbers;
  const numbers = builder.numbers.toArray();
  const flag = (cells: readonly KeptCell[], reason: FlaggedCell["reason"]): FlaggedCell[] =>
    cells.map((c) => ({ row: c.row + 1, line: c.line === 0 ? null : c.line, column: name, text: c.text, reason }));
  const tokens = flag(builder.firstTokens, "missing-token");
  const levels = builder.dictionary ? builder.rawLevels.length : 0;

  if (present > 0 && builder.numeric >= numericShare * present) {
    const flagged = [...tokens, ...flag(builder.firstNotNumbers, "not-a-number")].sort((a, b) => a.row - b.row).slice(0, shownCells);
    const distinct = builder.dictionary ? new Set(builder.levelValues.filter((x) => x === x)).size : builder.numberSet!.size;
    const missing = builder.rows - builder.numeric;
    const original = originalTexts(builder);
    const rowNumber = builder.nonIntegers === 0 && looksLikeRowNumber(numbers, { hasOriginalTexts: original !== null, notNumbers: builder.notNumbers });
    const report: ColumnReport = { name, header, type: "numeric", missing, distinct, distinctAtLeast: !builder.dictionary && distinct >= distinctCap,
      min: builder.min, max: builder.max, firstValues: [...builder.firstNumbers], flagged, flaggedCount: builder.tokens + builder.notNumbers, looksLikeRowNumber: rowNumber };
    const column: TableColumn = { name, kind: "numeric", type: "numeric", numbers, texts: null, missing, ...(original ? { originalTexts: original } : {}) };
    return { column, report, reformatted: false };
  }

  const { texts, codes, reformatted } = cellTexts(builder, numbers);
  const missing = builder.empty + builder.tokens;
  const isPresent = builder.levelKinds.slice(0, levels).map((kind) => kind === CellKind.number || kind === CellKind.text);
  const exact = builder.dictionary !== null;
  const distinct = exact ? isPresent.filter(Boolean).length : distinctCap;
  let type: ColumnType = "categorical";
  if (present === 0) type = "empty";
  else if (!exact || distinct > distinctCap || (distinct === present && present >= 2)) type = "identifier";
  const report: ColumnReport = { name, header, type, missing, distinct, distinctAtLeast: !exact, min: NaN, max: NaN, firstValues: [...builder.firstValues], flagged: tokens, flaggedCount: builder.tokens, looksLikeRowNumber: false };
  const column: TableColumn = { name, kind: "text", type, numbers, texts, missing };
  if (type !== "categorical" || !codes) return { column, report, reformatted };
  return { column: { ...column, categories: levelCodes(codes, builder.rawLevels, isPresent) }, report, reformatted };
}

function cellTexts(builder: ColumnBuilder, numbers: Float64Array): { texts: string[]; codes: Uint32Array | null; reformatted: boolean } {
  const n = builder.rows;
  if (builder.list) return { texts: builder.list, codes: null, reformatted: false };
  const texts = new Array<string>(n);
  if (builder.rawCodes) {
    const codes = builder.rawCodes.toArray();
    for (let i = 0; i < n; ++i) texts[i] = codes[i] === emptyCode ? "" : builder.rawLevels[codes[i]!]!;
    return { texts, codes, reformatted: false };
  }
  // Only the cells that are not numbers were kept: numbers are written back in JavaScript's shortest form.
  for (let i = 0; i < n; ++i) texts[i] = numbers[i] === numbers[i] ? String(numbers[i]) : "";
  const rows = builder.sparseRows?.toArray() ?? new Uint32Array(0);
  for (let k = 0; k < rows.length; ++k) texts[rows[k]!] = builder.sparseTexts![k]!;
  return { texts, codes: null, reformatted: builder.numeric > 0 };
}

// Raw codes (over every distinct text) become codes over the present levels only, in place.
function levelCodes(codes: Uint32Array, rawLevels: readonly string[], isPresent: readonly boolean[]): { codes: Uint32Array; levels: string[] } {
  const levels: string[] = [];
  const remap = new Uint32Array(rawLevels.length);
  for (let k = 0; k < rawLevels.length; ++k) remap[k] = isPresent[k] ? levels.push(rawLevels[k]!) - 1 : missingCode;
  for (let i = 0; i < codes.length; ++i) codes[i] = codes[i] === emptyCode ? missingCode : remap[codes[i]!]!;
  return { codes, levels };
}
