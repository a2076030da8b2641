import type { RaggedPolicy } from "../table/readOptions.ts";
import { delimiterNames } from "../table/readOptions.ts";
import type { TableFormat } from "../table/tableReport.ts";
import type { ReadingRecord } from "./coverExports.ts";

/**
 * How a table was read, under the names the headless command takes, for `input.reading` in
 * summary.json: the detected or chosen format, and the ragged-row rule (default "reject").
 * One definition for the workbench and the command, so both summaries say the same.
 * @example readingRecord({ kind: "delimited", delimiter: "|", decimal: ".", delimiterDetected: true, decimalDetected: true }) // => { format: "delimited", delimiter: "pipe", decimal: ".", ragged: "reject" }
 */
export function readingRecord(format: TableFormat, ragged: RaggedPolicy = "reject"): ReadingRecord {
  if (format.kind === "parquet") return { format: "parquet" };
  return { format: "delimited", delimiter: delimiterNames[format.delimiter], decimal: format.decimal, ragged };
}
