// Plain decimal with optional sign, fraction and exponent; hex, "Infinity" and "" are not numbers.
const decimal = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?$/;

/** Parses one cell as a finite decimal number, or returns NaN (a missing value). */
export function parseNumber(cell: string): number {
  const text = cell.trim();
  if (!decimal.test(text)) return NaN;
  const value = Number(text);
  return Number.isFinite(value) ? value : NaN;
}

/** Cells that mean "no value" in common exports (common practice, no source). */
export function isMissingToken(cell: string): boolean {
  const text = cell.trim().toLowerCase();
  return text === "" || text === "na" || text === "n/a" || text === "nan" || text === "null" || text === "none" || text === "-" || text === "?";
}
