import Papa from "papaparse";
import { maxRecordLength, type Delimiter } from "./readOptions.ts";

/** Receives the complete records of one chunk; `mayHoldLineBreaks` is false when no field can contain "\n". */
export type TakeRecords = (records: readonly string[][], malformed: readonly number[], mayHoldLineBreaks: boolean) => void;

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
 * O(text length) plus one re-parse of each record cut by a chunk boundary.
 */
export function chunkParser(delimiter: Delimiter, sink: TakeRecords, nextLine: () => number): ChunkParser {
  const parser = new Papa.Parser({ delimiter, newline: "\n" });
  let carry = "";
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
    carry = last ? "" : text.slice(parsed.meta.cursor);
    if (carry.length > maxRecordLength) {
      throw new Error(`a record is longer than ${maxRecordLength} characters from line ${nextLine()}: is a quote left open, or are there no line breaks?`);
    }
  };
  return {
    push(text) {
      if (text !== "") run(carry + text, false);
    },
    finish() {
      run(carry, true);
    },
  };
}
