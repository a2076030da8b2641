import { createTableReader } from "./createTableReader.ts";
import type { ReadOptions } from "./readOptions.ts";
import type { ReadOutcome } from "./tableReport.ts";

/**
 * Reads a whole delimited text at once: `createTableReader(options)`, one push, finish.
 * Throws one clear error for bad input.
 * @example readTableText("a;b\n1,5;2\n").report.format // => { kind: "delimited", delimiter: ";", decimal: ",", … }
 */
export function readTableText(text: string, options: ReadOptions = {}): ReadOutcome {
  const reader = createTableReader(options);
  reader.push(text);
  return reader.finish();
}
