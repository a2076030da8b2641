import type { ParsedTable } from "../../../src/core/index.ts";

/**
 * A parsed table built directly from numbers, row by row (NaN marks a missing cell), for builds on
 * hand-made point sets without going through CSV text. Every column is numeric.
 */
export function parsedTable(names: readonly string[], rows: readonly (readonly number[])[]): ParsedTable {
  return {
    rows: rows.length,
    columns: names.map((name, j) => {
      const numbers = Float64Array.from(rows, (row) => row[j]!);
      return { name, kind: "numeric" as const, numbers, texts: null, missing: numbers.filter(Number.isNaN).length };
    }),
  };
}
