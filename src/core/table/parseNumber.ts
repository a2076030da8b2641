import { scanDecimal, scannedValue } from "./scanDecimal.ts";
import type { DecimalMark } from "./readOptions.ts";

// Plain decimal with optional sign, fraction and exponent, surrounded by optional white space
// (the same set Number() skips); hex, "Infinity" and "" are not numbers.
const pointDecimal = /^\s*[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?\s*$/;
// The same with a decimal comma; a point anywhere (a thousands separator?) makes it text.
const commaDecimal = /^\s*[+-]?(?:\d+,?\d*|,\d+)(?:[eE][+-]?\d+)?\s*$/;

/**
 * Parses one cell as a finite decimal number, or returns NaN (a missing value).
 * With `decimal` "," the cell must use a comma as its decimal mark ("12,5"); no thousands
 * separators are read in either mode. Numbers beyond ±1.8e308 are NaN.
 * Common cells take Clinger's fast path (`scanDecimal`); the rest go through `Number()`,
 * so every value is exactly what `Number()` gives for the text (with "," read as ".").
 * @example parseNumber("12,5", ",") // => 12.5
 */
export function parseNumber(cell: string, decimal: DecimalMark = "."): number {
  const end = scanDecimal(cell, 0, cell.length, decimal === "," ? 44 : 46);
  if (end === cell.length) {
    const fast = scannedValue[0]!;
    if (fast === fast) return fast;
  } else if (!mayHaveSpaceAtEnds(cell)) {
    return NaN; // without white space around it, the patterns below accept exactly what scanDecimal reads
  }
  if (decimal === ",") {
    if (!commaDecimal.test(cell)) return NaN;
    const value = Number(cell.replace(",", "."));
    return Number.isFinite(value) ? value : NaN;
  }
  if (!pointDecimal.test(cell)) return NaN;
  const value = Number(cell);
  return Number.isFinite(value) ? value : NaN;
}

// False when the first and the last character are printable ASCII other than the space, which \s never matches.
function mayHaveSpaceAtEnds(cell: string): boolean {
  const first = cell.charCodeAt(0);
  const last = cell.charCodeAt(cell.length - 1);
  return !(first > 32 && first < 127 && last > 32 && last < 127);
}

// Lower-cased cells that mean "no value" in common exports and spreadsheets (common practice, no source).
// "None" is not one of them: it is often a real level (damage: None, Minor, …).
const missingTokens = new Set([
  "", "na", "n/a", "nan", "null", "-", "?",
  "inf", "+inf", "-inf", "infinity", "+infinity", "-infinity",
  "#n/a", "#na", "#value!", "#div/0!", "#num!", "#ref!", "#null!", "#name?",
]);

/** Cells that mean "no value": empty, NA, N/A, NaN, null, -, ?, Inf and spreadsheet error values such as #N/A. */
export function isMissingToken(cell: string): boolean {
  return missingTokens.has(cell.trim().toLowerCase());
}
