/**
 * One CSV cell (RFC 4180): numbers are written by JavaScript's shortest round-trip form
 * (ECMA-262 Number::toString), so they read back exactly; NaN (missing) is an empty cell.
 * Text is quoted when it holds a delimiter, quote or line break, and a text cell that starts
 * with =, +, -, @, tab or carriage return is prefixed with ' so that a spreadsheet does not run it
 * as a formula (OWASP, "CSV Injection"). Numbers are never altered.
 * @example csvText("=1+2") // => "'=1+2"
 */
export function csvNumber(value: number): string {
  return Number.isNaN(value) ? "" : String(value);
}

export function csvText(value: string): string {
  return csvQuoted(/^[=+\-@\t\r]/.test(value) ? `'${value}` : value);
}

/** A cell quoted only when it must be (a delimiter, quote or line break), never prefixed: for a number's text as read, such as `-007` or `1,5`. */
export function csvQuoted(value: string): string {
  return /[",\r\n]/.test(value) ? `"${value.replaceAll('"', '""')}"` : value;
}

export function csvLine(cells: readonly string[]): string {
  return `${cells.join(",")}\n`;
}
