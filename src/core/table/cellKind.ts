import { isMissingToken, parseNumber } from "./parseNumber.ts";
import type { DecimalMark } from "./readOptions.ts";

/** What a cell holds: a number, nothing (empty or white space), a missing token (NA, Inf…), or other text. */
export const CellKind = { number: 0, blank: 1, token: 2, text: 3 } as const;
export type CellKind = (typeof CellKind)[keyof typeof CellKind];

/** A cell kept for the report: 0-based row, 1-based line (0 when there is none), text. */
export interface KeptCell {
  readonly row: number;
  readonly line: number;
  readonly text: string;
}

/**
 * Classifies one cell and parses it: numbers first (no number is a missing token), then blank,
 * then the missing tokens of `isMissingToken`; `value` is NaN unless the kind is number.
 * @example cellKind(" Inf ", ".") // => { kind: CellKind.token, value: NaN }
 */
export function cellKind(cell: string, decimal: DecimalMark): { kind: CellKind; value: number } {
  if (cell === "") return { kind: CellKind.blank, value: NaN };
  const value = parseNumber(cell, decimal);
  if (value === value) return { kind: CellKind.number, value };
  const trimmed = cell.length > 9 ? cell.trim() : cell;
  // The longest missing token ("+infinity", "-infinity") has 9 characters.
  if (trimmed.length > 9) return { kind: CellKind.text, value };
  if (trimmed.trim() === "") return { kind: CellKind.blank, value };
  return { kind: isMissingToken(trimmed) ? CellKind.token : CellKind.text, value };
}

/**
 * A copy of a string that no longer points into the chunk it was cut from: engines keep long
 * substrings as views of their parent, which would keep every chunk alive.
 */
export function detach(text: string): string {
  return text.length < 13 ? text : (" " + text).slice(1); // V8 makes views of substrings from 13 characters (SlicedString::kMinLength)
}
