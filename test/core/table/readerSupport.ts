import { createTableReader } from "../../../src/core/table/createTableReader.ts";
import type { ReadOptions } from "../../../src/core/table/readOptions.ts";
import type { ReadOutcome } from "../../../src/core/table/tableReport.ts";

/** The outcome of a read, or the message of the one error it threw (any other throw fails the test). */
export type Result = ReadOutcome | { readonly error: string };

/**
 * Reads `text` pushed in pieces cut at the given positions (sorted, deduplicated, clipped);
 * `plainScan` false reads every record through papaparse (see createTableReader).
 */
export function readInPieces(text: string, cuts: readonly number[] = [], options: ReadOptions = {}, plainScan = true): Result {
  const at = [...new Set(cuts.map((c) => Math.max(0, Math.min(text.length, c))))].sort((a, b) => a - b);
  const reader = createTableReader(options, plainScan);
  try {
    let from = 0;
    for (const to of [...at, text.length]) {
      reader.push(text.slice(from, to));
      from = to;
    }
    return reader.finish();
  } catch (error) {
    if (!(error instanceof Error) || error.constructor !== Error) throw error;
    return { error: error.message };
  }
}

/** Reads `text` in pieces of `size` characters. */
export function readInChunksOf(text: string, size: number, options: ReadOptions = {}): Result {
  const cuts: number[] = [];
  for (let at = size; at < text.length; at += size) cuts.push(at);
  return readInPieces(text, cuts, options);
}

/** The outcome, or a test failure naming the error. */
export function outcomeOf(result: Result): ReadOutcome {
  if ("error" in result) throw new Error(`expected a table, got the error: ${result.error}`);
  return result;
}
