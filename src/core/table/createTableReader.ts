import { chunkParser, type ChunkParser } from "./chunkParser.ts";
import { detectDecimalMark, detectDelimiter } from "./detectFormat.ts";
import { lineEnds } from "./lineEnds.ts";
import { RecordSink } from "./recordSink.ts";
import { maxInputBytes, maybeDecimalMark, maybeDelimiter, maybeRaggedPolicy, sniffLength, type ReadOptions } from "./readOptions.ts";
import type { ReadOutcome, TableFormat } from "./tableReport.ts";
import { tableOutcome } from "./tableOutcome.ts";

export interface TableReader {
  /** Reads the next piece of text; throws one clear Error for bad input (and again on every later call). */
  push(text: string): void;
  /** Reads what is left and returns the table with its report (the same object on a second call), or throws one clear Error. */
  finish(): ReadOutcome;
  /** Data records read so far, for progress. */
  readonly rowsRead: number;
}

/**
 * Incremental reader of delimited text (CSV, TSV, ";" with decimal commas; RFC 4180 quoting),
 * fed decoded text in chunks of any size: the same text in any chunking gives the same outcome.
 * The first 64 Ki characters (or all, if shorter) are held back to detect the delimiter and the
 * decimal mark (unless given) and to reject binary input; after that the records stream into
 * per-column builders (`ColumnBuilder`), so the text is never held whole.
 * Row k of the table is data record k (1-based numbering outside, 0-based inside).
 * Lines without quotes are split by the sink itself (`RecordSink.takePlain`), with no string per
 * numeric cell; `plainScan` false sends every record through papaparse instead (the reference
 * path that test/core/table/plainScan.test.ts compares with; the outcome is the same).
 * Text past `maxCharacters` (default `maxInputBytes`) is refused.
 * Cost: O(text length); memory: 8 bytes per numeric cell plus the texts of text columns.
 * @example
 * const reader = createTableReader();
 * reader.push("x;y\n1,5;2\n");
 * reader.finish().table.columns[0]!.numbers // => Float64Array [1.5]
 */
export function createTableReader(options: ReadOptions = {}, plainScan = true, maxCharacters: number = maxInputBytes): TableReader {
  const delimiterOption = options.delimiter === undefined ? undefined : maybeDelimiter(options.delimiter);
  const decimalOption = options.decimal === undefined ? undefined : maybeDecimalMark(options.decimal);
  const ragged = maybeRaggedPolicy(options.ragged ?? "reject");
  const ends = lineEnds();
  let held: string[] = [];
  let heldLength = 0;
  let characters = 0;
  let parser: ChunkParser | null = null;
  let sink: RecordSink | null = null;
  let format: TableFormat | null = null;
  let failure: Error | null = null;
  let outcome: ReadOutcome | null = null;

  const start = (complete: boolean): void => {
    const text = held.join("");
    held = [];
    const sample = text.slice(0, sniffLength);
    if (sample.slice(0, 1024).includes("\u0000")) throw new Error("this looks like a binary file: it has NUL characters in its first 1 KiB");
    const delimiter = delimiterOption ?? detectDelimiter(sample, complete && text.length <= sniffLength);
    const decimal = decimalOption ?? detectDecimalMark(sample, delimiter, complete && text.length <= sniffLength);
    format = { kind: "delimited", delimiter, decimal, delimiterDetected: delimiterOption === undefined, decimalDetected: decimalOption === undefined };
    const records = new RecordSink(decimal);
    sink = records;
    const plain = plainScan ? (t: string, from: number, to: number): void => records.takePlain(t, from, to, delimiter) : undefined;
    parser = chunkParser(delimiter, (r, m, b) => records.take(r, m, b), () => records.line, plain);
    parser.push(text);
  };
  const feed = (text: string): void => {
    if (parser) return parser.push(text);
    held.push(text);
    heldLength += text.length;
    if (heldLength >= sniffLength) start(false);
  };
  const guard = <T>(step: () => T): T => {
    if (failure) throw failure;
    try {
      return step();
    } catch (error) {
      failure = error instanceof Error ? error : new Error(String(error));
      throw failure;
    }
  };

  return {
    push(text) {
      if (outcome) throw new Error("cannot push text after finish");
      guard(() => {
        characters += text.length;
        if (characters > maxCharacters) throw new Error(`the file is too large: more than ${maxCharacters} characters (the limit is ${maxCharacters / 2 ** 30} GiB)`);
        feed(ends.push(text));
      });
    },
    finish() {
      return guard(() => {
        if (outcome) return outcome;
        feed(ends.flush());
        if (!parser) start(true);
        parser!.finish();
        outcome = tableOutcome(sink!, format!, ragged);
        return outcome;
      });
    },
    get rowsRead() {
      return sink?.rows ?? 0;
    },
  };
}
