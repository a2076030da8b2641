import { ColumnBuilder } from "./columnBuilder.ts";
import { shownCells, type DecimalMark } from "./readOptions.ts";

/** A record whose field count differs from the header's: 1-based row and line, field count. */
export interface RaggedRecord {
  readonly row: number;
  readonly line: number;
  readonly fields: number;
}

/**
 * The reader's record-by-record state: line numbers, the header, one column builder per header
 * field, and the first ragged and malformed records. A record starts on `line` and takes one line
 * plus the line breaks inside its fields. An empty line is decided by the header's width:
 * - before the header, or in a file of several columns: not a record, counted in `emptyLines`;
 * - in a file of one column: a record whose one cell is empty (a missing value), since that is
 *   how a spreadsheet saves an empty cell there; skipping it would shift every later row number.
 */
export class RecordSink {
  /** The 1-based line on which the next record starts. */
  line = 1;
  rows = 0;
  header: string[] | null = null;
  builders: ColumnBuilder[] = [];
  readonly ragged: RaggedRecord[] = [];
  raggedCount = 0;
  readonly malformed: { row: number; line: number }[] = [];
  malformedCount = 0;
  /** Wholly empty lines that are not records (see above). */
  emptyLines = 0;

  constructor(private readonly decimal: DecimalMark) {}

  /**
   * Takes the records of text[from, to), which holds no quote character: each line up to a "\n"
   * (and the rest, if `to` is not after one) is one record, its fields split at `delimiter`, exactly
   * the records `take` would get from the chunk parser, but without a string per numeric cell:
   * each builder first tries to read its cell in place (`ColumnBuilder.takeNumberAt`), and a
   * dictionary finds a repeated text from its span (`ColumnBuilder.pushSpan`).
   * O(to − from); borrows `text` for the call only.
   */
  takePlain(text: string, from: number, to: number, delimiter: string): void {
    const separator = delimiter.charCodeAt(0);
    let start = from;
    while (start < to) {
      let stop = text.indexOf("\n", start);
      if (stop === -1 || stop > to) stop = to;
      const line = this.line++;
      if (start === stop && this.builders.length !== 1) {
        this.emptyLines++;
      } else if (this.header === null) {
        this.header = text.slice(start, stop).split(delimiter);
        this.builders = this.header.map(() => new ColumnBuilder(this.decimal));
      } else {
        const row = ++this.rows;
        const builders = this.builders;
        const width = builders.length;
        let fields = 0;
        for (let p = start; ; ++fields) {
          const builder = fields < width ? builders[fields]! : null;
          let end = builder ? builder.takeNumberAt(text, p, stop, separator) : -1;
          if (end === -1) {
            end = p;
            while (end < stop && text.charCodeAt(end) !== separator) end++;
            if (builder) builder.pushSpan(text, p, end, line);
          }
          if (end === stop) break;
          p = end + 1;
        }
        fields++;
        for (let j = fields; j < width; ++j) builders[j]!.push("", line);
        if (fields !== width && this.raggedCount++ < shownCells) this.ragged.push({ row, line, fields });
      }
      start = stop + 1;
    }
  }

  /** Takes the complete records of one chunk (see ChunkParser). */
  take(records: readonly string[][], malformed: readonly number[], mayHoldLineBreaks: boolean): void {
    for (let k = 0; k < records.length; ++k) {
      const record = records[k]!;
      const line = this.line;
      this.line += mayHoldLineBreaks ? lineCount(record) : 1;
      if (record.length === 1 && record[0] === "" && this.builders.length !== 1) {
        this.emptyLines++;
        continue;
      }
      if (this.header === null) {
        this.header = record;
        this.builders = record.map(() => new ColumnBuilder(this.decimal));
        continue;
      }
      const row = ++this.rows;
      const builders = this.builders;
      const width = builders.length;
      if (record.length !== width && this.raggedCount++ < shownCells) this.ragged.push({ row, line, fields: record.length });
      for (let j = 0; j < width; ++j) builders[j]!.push(record[j] ?? "", line);
      if (malformed.length > 0 && malformed.includes(k) && this.malformedCount++ < shownCells) this.malformed.push({ row, line });
    }
  }
}

function lineCount(record: readonly string[]): number {
  let lines = 1;
  for (const field of record) {
    for (let at = field.indexOf("\n"); at !== -1; at = field.indexOf("\n", at + 1)) lines++;
  }
  return lines;
}
