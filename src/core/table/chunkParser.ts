import Papa from "papaparse";
import { maxRecordLength, type Delimiter } from "./readOptions.ts";

/** Receives the complete records of one chunk; `mayHoldLineBreaks` is false when no field can contain "\n". */
export type TakeRecords = (records: readonly string[][], malformed: readonly number[], mayHoldLineBreaks: boolean) => void;

/** Receives the records of text[from, to), which holds no quote: one per line, fields split at the delimiter. */
export type TakePlainRecords = (text: string, from: number, to: number) => void;

export interface ChunkParser {
  push(text: string): void;
  /** Parses what is left; throws for a quote that is never closed. */
  finish(): void;
}

interface PapaError {
  readonly code: string;
  readonly row?: number;
}

/**
 * RFC 4180 records from text arriving in chunks (line ends already "\n"), through papaparse's
 * low-level Parser exactly as its own ChunkStreamer uses it: each chunk is parsed after the
 * carried partial record with `ignoreLastRow`, and the text after the last complete record
 * (`meta.cursor`) is carried to the next chunk. An empty line is passed on as a record of one
 * empty field (the sink decides what it means); the empty "record" papaparse reports after a
 * final line break is not. A record longer than `maxRecordLength` is an
 * error, since it means an unclosed quote or a file without line breaks.
 * With `plain`, the lines before the first quote character of the text are not parsed here but
 * handed to `plain` as one span: without quotes a record is a line and a field what lies between
 * delimiters, so the caller can split them without a string per field (the records are the same;
 * test/core/table/plainScan.test.ts compares the two ways on random tables).
 * O(text length) plus one re-parse of each record cut by a chunk boundary.
 */
export function chunkParser(delimiter: Delimiter, sink: TakeRecords, nextLine: () => number, plain?: TakePlainRecords): ChunkParser {
  const parser = new Papa.Parser({ delimiter, newline: "\n" });
  let carry = "";
  const keep = (rest: string): void => {
    carry = rest;
    if (carry.length > maxRecordLength) {
      throw new Error(`a record is longer than ${maxRecordLength} characters from line ${nextLine()}: is a quote left open, or are there no line breaks?`);
    }
  };
  const run = (text: string, last: boolean): void => {
    const parsed = parser.parse(text, 0, !last) as { data: string[][]; errors: PapaError[]; meta: { cursor: number } };
    const records = parsed.data;
    // At the end, papaparse returns one empty record after a final line break: there is no line there.
    const tail = records[records.length - 1];
    if (last && (text === "" || text.endsWith("\n")) && tail?.length === 1 && tail[0] === "") records.pop();
    const unclosed = last ? parsed.errors.find((e) => e.code === "MissingQuotes") : undefined;
    if (unclosed) {
      sink(records.slice(0, unclosed.row ?? 0), [], true);
      throw new Error(`a quoted field is never closed: the record that starts on line ${nextLine()} runs to the end of the file`);
    }
    // Papa reports quote errors by record index; those at or past records.length belong to the carried record.
    const malformed = parsed.errors.filter((e) => e.code === "InvalidQuotes" && e.row !== undefined && e.row < records.length).map((e) => e.row!);
    if (records.length > 0) sink(records, [...new Set(malformed)], text.includes('"'));
    keep(last ? "" : text.slice(parsed.meta.cursor));
  };
  // Lines of text[from…] before the first quote go to `plain`; from the line holding it on, papaparse reads.
  const split = (text: string, from: number, last: boolean): void => {
    const quote = text.indexOf('"', from);
    const cut = Math.max(from, quote === -1 ? (last ? text.length : text.lastIndexOf("\n") + 1) : text.lastIndexOf("\n", quote) + 1);
    if (cut > from) plain!(text, from, cut);
    if (quote === -1) keep(text.slice(cut));
    else run(text.slice(cut), last);
  };
  // The carried partial line is completed apart, so that a long chunk is read where it lies rather than copied.
  const pushPlain = (text: string): void => {
    const lineEnd = text.indexOf("\n");
    if (carry === "" || lineEnd === -1 || carry.includes('"') || text.lastIndexOf('"', lineEnd) !== -1) return split(carry + text, 0, false);
    const head = carry + text.slice(0, lineEnd + 1);
    carry = "";
    plain!(head, 0, head.length);
    split(text, lineEnd + 1, false);
  };
  return {
    push(text) {
      if (text === "") return;
      if (plain) pushPlain(text);
      else run(carry + text, false);
    },
    finish() {
      if (plain) split(carry, 0, true);
      else run(carry, true);
    },
  };
}
