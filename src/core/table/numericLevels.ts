import { missingCode } from "./finishColumn.ts";
import type { Categories } from "./types.ts";

/** A numeric column with at most this many distinct values may be coloured as categories (class codes such as 0/1/2; common practice, no source). */
export const maxNumericLevels = 12;

/**
 * A numeric column read as categories: its distinct present values, ascending, as levels (each
 * written in its shortest round-trip form, `String(x)`), and per row the code of its level
 * (missingCode for NaN). Null when there are more than `maxLevels` distinct values or none.
 * Stops at the first value beyond `maxLevels`. O(n · maxLevels).
 * @example numericLevels(Float64Array.of(2, 0, NaN, 2))!.levels // => ["0", "2"]
 */
export function numericLevels(values: Float64Array, maxLevels = maxNumericLevels): Categories | null {
  const distinct: number[] = [];
  for (const value of values) {
    if (value !== value || distinct.includes(value)) continue;
    if (distinct.length === maxLevels) return null;
    distinct.push(value);
  }
  if (distinct.length === 0) return null;
  distinct.sort((a, b) => a - b);
  const codes = new Uint32Array(values.length);
  for (let i = 0; i < values.length; ++i) {
    const value = values[i]!;
    codes[i] = value === value ? distinct.indexOf(value) : missingCode;
  }
  return { codes, levels: distinct.map(String) };
}
