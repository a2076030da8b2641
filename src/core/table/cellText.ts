import type { TableColumn } from "./types.ts";

/**
 * A cell's text as read: a text column's cell; in a numeric column the original text when it
 * differs from the number's shortest form (`007`), else that form; "" for a missing number.
 * O(1) for text columns, O(log k) for a numeric column with k such cells.
 * @example cellText(readTableText("id\n007\n8\n9\n").table.columns[0]!, 0) // => "007"
 */
export function cellText(column: TableColumn, row: number): string {
  if (column.texts) return column.texts[row]!;
  const original = column.originalTexts;
  if (original) {
    let lo = 0;
    let hi = original.rows.length;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if (original.rows[mid]! < row) lo = mid + 1;
      else hi = mid;
    }
    if (original.rows[lo] === row) return original.texts[lo]!;
  }
  const value = column.numbers[row]!;
  return value === value ? String(value) : "";
}
