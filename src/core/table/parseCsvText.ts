import Papa from "papaparse";
import type { ParsedTable, TableColumn } from "./types.ts";
import { isMissingToken, parseNumber } from "./parseNumber.ts";

/**
 * Parses delimited text (RFC 4180 quoting; delimiter detected by papaparse among , ; tab |)
 * into a column-major table. The first record is the header. A column is numeric when every
 * non-missing cell is a decimal number; otherwise it is text. A byte-order mark is dropped.
 * Throws one clear error for an empty file, a header without data, or ragged records.
 */
export function parseCsvText(text: string): ParsedTable {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const parsed = Papa.parse<string[]>(body, { skipEmptyLines: true, header: false });
  const records = parsed.data;
  const header = records[0];
  if (!header || header.every((cell) => cell.trim() === "")) throw new Error("the file is empty");
  if (records.length < 2) throw new Error("the file has a header but no data records");
  const width = header.length;
  const ragged: number[] = [];
  for (let r = 1; r < records.length; ++r) if (records[r]!.length !== width) ragged.push(r);
  if (ragged.length > 0) {
    const shown = ragged.slice(0, 5).map((r) => `row ${r} has ${records[r]!.length} fields`).join(", ");
    throw new Error(`ragged records: the header has ${width} fields but ${shown}${ragged.length > 5 ? ` and ${ragged.length - 5} more` : ""}`);
  }
  const rows = records.length - 1;
  const names = uniqueNames(header);
  const columns: TableColumn[] = names.map((name, j) => readColumn(name, records, j, rows));
  return { rows, columns };
}

function readColumn(name: string, records: readonly string[][], j: number, rows: number): TableColumn {
  const numbers = new Float64Array(rows);
  const texts: string[] = new Array<string>(rows);
  let missing = 0;
  let nonNumeric = 0;
  for (let i = 0; i < rows; ++i) {
    const cell = records[i + 1]![j]!;
    texts[i] = cell;
    if (isMissingToken(cell)) {
      numbers[i] = NaN;
      missing++;
      continue;
    }
    const value = parseNumber(cell);
    numbers[i] = value;
    if (Number.isNaN(value)) nonNumeric++;
  }
  const isNumeric = nonNumeric === 0 && missing < rows;
  return { name, kind: isNumeric ? "numeric" : "text", numbers, texts: isNumeric ? null : texts, missing };
}

// Empty or repeated names get a suffix so that no two columns are merged (common practice, no source).
function uniqueNames(header: readonly string[]): string[] {
  const seen = new Set<string>();
  return header.map((raw, j) => {
    const base = raw.trim() === "" ? `column_${j + 1}` : raw.trim();
    let name = base;
    for (let k = 2; seen.has(name); ++k) name = `${base}_${k}`;
    seen.add(name);
    return name;
  });
}
