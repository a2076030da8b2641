import { GrowableFloat64, GrowableUint32 } from "./growableArray.ts";
import { cellKind, CellKind, detach, type KeptCell } from "./cellKind.ts";
import { scanDecimal, scannedValue } from "./scanDecimal.ts";
import { SpanLevels } from "./spanLevels.ts";
import { distinctCap, numericShare, shownCells, type DecimalMark } from "./readOptions.ts";

/** Raw code of an empty cell: not a dictionary entry. */
export const emptyCode = 0xffffffff;

/**
 * Accumulates one column while the records stream by, without holding the records. Every cell
 * is parsed once into `numbers` (NaN unless a number). The cell texts are kept in the cheapest
 * form that may still be needed:
 * - "dictionary" while at most 10,000 distinct texts: a level per row (repeats parse once);
 * - then "list" (every text) if the column looks like text, or "sparse" (only the cells that
 *   are not numbers) if at least 95% of its present cells are numbers, so a long numeric column
 *   costs 8 bytes a row; a "list" column turns "sparse" when it comes to look numeric
 *   (checked every 4,096 rows);
 * - "numbers" (no text at all) for Parquet number columns.
 * In "sparse" form an integer written otherwise than in its shortest form (`007`, `+5`, or more
 * than 15 digits, such as an id past 2^53) is kept too, so a numeric id can be written back
 * exactly as read (`originalTexts` in `finishColumn`).
 */
export class ColumnBuilder {
  rows = 0;
  readonly numbers = new GrowableFloat64();
  empty = 0;
  tokens = 0;
  notNumbers = 0;
  numeric = 0;
  /** Number cells whose value is not an integer. */
  nonIntegers = 0;
  min = Infinity;
  max = -Infinity;
  dictionary: Map<string, number> | null;
  rawLevels: string[] = [];
  /** The dictionary's levels found by span (`pushSpan`), while there is a dictionary. */
  private spanLevels: SpanLevels | null;
  levelValues: number[] = [];
  levelKinds: CellKind[] = [];
  rawCodes: GrowableUint32 | null;
  list: string[] | null = null;
  sparseRows: GrowableUint32 | null = null;
  sparseTexts: string[] | null = null;
  /** Distinct numbers outside dictionary mode, up to the cap. */
  numberSet: Set<number> | null = null;
  /** False once `numberSet` holds `distinctCap` numbers (so a full set is not asked its size per cell). */
  private collecting = true;
  readonly firstValues: string[] = [];
  readonly firstNumbers: string[] = [];
  readonly firstTokens: KeptCell[] = [];
  readonly firstNotNumbers: KeptCell[] = [];
  /** Char code of the decimal mark, for `scanDecimal`. */
  private readonly mark: number;
  /** True once `takeNumberAt` may count cells without their text: "sparse" form, first cells kept. */
  private inPlace = false;

  constructor(readonly decimal: DecimalMark, numbersOnly = false) {
    this.mark = decimal === "," ? 44 : 46;
    this.dictionary = numbersOnly ? null : new Map();
    this.spanLevels = numbersOnly ? null : new SpanLevels(this.rawLevels);
    this.rawCodes = numbersOnly ? null : new GrowableUint32();
    if (numbersOnly) this.numberSet = new Set();
  }

  /** Adds the next cell of the column, read from the record that starts on `line` (0: no line). */
  push(cell: string, line: number): void {
    const row = this.rows++;
    if (this.dictionary) {
      let code = cell === "" ? emptyCode : this.dictionary.get(cell);
      if (code === undefined) {
        code = this.rawLevels.length;
        const text = detach(cell);
        const kind = cellKind(text, this.decimal);
        this.dictionary.set(text, code);
        this.rawLevels.push(text);
        this.levelKinds.push(kind.kind);
        this.levelValues.push(kind.value);
        this.spanLevels!.add(code);
      }
      this.rawCodes!.push(code);
      if (code === emptyCode) this.count(CellKind.blank, NaN, cell, row, line);
      else this.count(this.levelKinds[code]!, this.levelValues[code]!, cell, row, line);
      if (this.rawLevels.length > distinctCap) this.leaveDictionary();
      return;
    }
    const { kind, value } = cellKind(cell, this.decimal);
    this.count(kind, value, cell, row, line);
    if (this.list) this.list.push(detach(cell));
    else if (this.sparseRows && keepsText(kind, value, cell)) {
      this.sparseRows.push(row);
      this.sparseTexts!.push(detach(cell));
    }
    if (this.list && (row & 4095) === 4095 && this.looksNumeric()) this.leaveList();
    if (this.sparseRows) this.inPlace = this.firstNumbers.length === shownCells && this.firstValues.length === shownCells;
  }

  /**
   * Adds the cell text[start, end) as `push` does; in "dictionary" form a text already seen is
   * found from its span (`SpanLevels`) and counted as `push` counts a repeat, without cutting the
   * cell out of the text. Borrows `text` for the call only.
   */
  pushSpan(text: string, start: number, end: number, line: number): void {
    if (this.spanLevels !== null && end > start) {
      const code = this.spanLevels.find(text, start, end);
      if (code !== -1) {
        this.rawCodes!.push(code);
        this.count(this.levelKinds[code]!, this.levelValues[code]!, this.rawLevels[code]!, this.rows++, line);
        return;
      }
    }
    this.push(text.slice(start, end), line);
  }

  /**
   * Adds the cell that starts at text[start] and ends at `stop` or at the first `separator`, if it
   * need not be kept as text, and returns the index where it ends; otherwise adds nothing and
   * returns −1 (the caller cuts the cell out and calls `push`). A cell need not be kept when the
   * column is in "sparse" form with its first cells kept for the report, and the cell is a plain
   * decimal (`scanDecimal`; `Number()` on its text when its digits reach 2^53 or its power of ten
   * passes ±22) that is finite and not an integer written otherwise than in its shortest form.
   * Such a cell is counted exactly as `push` would count it. Borrows `text` for the call only.
   */
  takeNumberAt(text: string, start: number, stop: number, separator: number): number {
    if (!this.inPlace) return -1;
    const end = scanDecimal(text, start, stop, this.mark === separator ? -1 : this.mark);
    if (end === -1 || (end !== stop && text.charCodeAt(end) !== separator)) return -1;
    let value = scannedValue[0]!;
    if (value !== value) {
      const cell = text.slice(start, end);
      value = Number(this.mark === 44 ? cell.replace(",", ".") : cell);
      if (!Number.isFinite(value)) return -1;
    }
    const integer = Number.isInteger(value);
    if (integer && !isPlainInteger(text, start, end)) return -1;
    this.rows++;
    this.numbers.push(value);
    this.numeric++;
    if (!integer) this.nonIntegers++;
    if (value < this.min) this.min = value;
    if (value > this.max) this.max = value;
    if (this.collecting) this.collect(value);
    return end;
  }

  /** Adds a number read as a number (Parquet); NaN and ±Infinity count as missing tokens. */
  pushNumber(value: number): void {
    const finite = Number.isFinite(value);
    this.count(finite ? CellKind.number : CellKind.token, finite ? value : NaN, String(value), this.rows++, 0);
  }

  /** Adds an empty cell (a Parquet null). */
  pushEmpty(): void {
    this.push("", 0);
  }

  looksNumeric(): boolean {
    return this.numeric > 0 && this.numeric >= numericShare * (this.numeric + this.notNumbers);
  }

  private count(kind: CellKind, value: number, cell: string, row: number, line: number): void {
    this.numbers.push(value);
    if (kind === CellKind.number) {
      this.numeric++;
      if (!Number.isInteger(value)) this.nonIntegers++;
      if (value < this.min) this.min = value;
      if (value > this.max) this.max = value;
      if (this.firstNumbers.length < shownCells) this.firstNumbers.push(detach(cell));
      if (this.collecting) this.collect(value);
    } else if (kind === CellKind.blank) {
      this.empty++;
      return;
    } else if (kind === CellKind.token) {
      this.tokens++;
      if (this.firstTokens.length < shownCells) this.firstTokens.push({ row, line, text: detach(cell) });
      return;
    } else {
      this.notNumbers++;
      if (this.firstNotNumbers.length < shownCells) this.firstNotNumbers.push({ row, line, text: detach(cell) });
    }
    if (this.firstValues.length < shownCells) this.firstValues.push(detach(cell));
  }

  private collect(value: number): void {
    if (!this.numberSet) return;
    if (this.numberSet.size < distinctCap) this.numberSet.add(value);
    else this.collecting = false;
  }

  // More distinct texts than the cap: keep a list of texts, or only the non-number cells.
  private leaveDictionary(): void {
    const codes = this.rawCodes!;
    this.numberSet = new Set(this.levelValues.filter((x) => x === x).slice(0, distinctCap));
    if (this.looksNumeric()) {
      this.sparseRows = new GrowableUint32();
      this.sparseTexts = [];
      for (let r = 0; r < this.rows; ++r) {
        const code = codes.get(r);
        if (code === emptyCode || !keepsText(this.levelKinds[code]!, this.levelValues[code]!, this.rawLevels[code]!)) continue;
        this.sparseRows.push(r);
        this.sparseTexts.push(this.rawLevels[code]!);
      }
    } else {
      this.list = new Array<string>(this.rows);
      for (let r = 0; r < this.rows; ++r) this.list[r] = codes.get(r) === emptyCode ? "" : this.rawLevels[codes.get(r)]!;
    }
    this.dictionary = null;
    this.spanLevels = null;
    this.rawCodes = null;
    this.rawLevels = [];
    this.levelKinds = [];
    this.levelValues = [];
  }

  // A text-looking column that came to look numeric: keep only its non-number cells.
  private leaveList(): void {
    const list = this.list!;
    this.sparseRows = new GrowableUint32();
    this.sparseTexts = [];
    for (let r = 0; r < list.length; ++r) {
      const { kind, value } = cellKind(list[r]!, this.decimal);
      if (!keepsText(kind, value, list[r]!)) continue;
      this.sparseRows.push(r);
      this.sparseTexts.push(list[r]!);
    }
    this.list = null;
  }
}

/** True for a cell whose text a sparse column keeps: a token, text, or an integer not written in its shortest form. */
export function keepsText(kind: CellKind, value: number, cell: string): boolean {
  if (kind === CellKind.token || kind === CellKind.text) return true;
  return kind === CellKind.number && Number.isInteger(value) && !isPlainInteger(cell, 0, cell.length) && cell !== String(value);
}

// text[start, end) is digits with an optional minus sign, no leading zero, at most 15 digits: exactly String(value) for such an integer.
function isPlainInteger(text: string, start: number, end: number): boolean {
  const first = start < end && text.charCodeAt(start) === 45 ? start + 1 : start; // "-"
  const digits = end - first;
  if (digits < 1 || digits > 15) return false;
  if (text.charCodeAt(first) === 48) return digits === 1 && first === start; // "0" alone
  for (let k = first; k < end; ++k) {
    const c = text.charCodeAt(k);
    if (c < 48 || c > 57) return false;
  }
  return true;
}
