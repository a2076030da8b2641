import { nodeRows, type CoverResult } from "../core/index.ts";

/** A set of rows named on the command line: by 1-based node numbers or by 1-based record numbers. */
export type RowChoice = { readonly by: "nodes"; readonly numbers: readonly number[] } | { readonly by: "rows"; readonly numbers: readonly number[] };

/** A comma-separated list of whole numbers ≥ 1 for `flag`; throws one clear message for anything else. */
export function numberList(flag: string, text: string): number[] {
  const parts = text.split(",").map((s) => s.trim());
  const numbers = parts.map(Number);
  const bad = parts.findIndex((part, k) => !/^\d+$/.test(part) || !(numbers[k]! >= 1));
  if (bad !== -1) throw new Error(`invalid ${flag}: ${parts[bad] === "" ? text : parts[bad]} (expected numbers from 1, separated by commas)`);
  return numbers;
}

/** One of `--X-nodes` / `--X-rows` (or neither when optional); both is an error. */
export function rowChoice(nodesFlag: string, nodes: string | undefined, rowsFlag: string, rows: string | undefined): RowChoice | null {
  if (nodes !== undefined && rows !== undefined) throw new Error(`give ${nodesFlag} or ${rowsFlag}, not both`);
  if (nodes !== undefined) return { by: "nodes", numbers: numberList(nodesFlag, nodes) };
  if (rows !== undefined) return { by: "rows", numbers: numberList(rowsFlag, rows) };
  return null;
}

/**
 * The 0-based table rows of a choice after the build: the union of the nodes' members, or the
 * records themselves. A node or record number out of range is one error naming the first such
 * number and the range.
 */
export function chosenRows(choice: RowChoice, result: CoverResult): Uint32Array {
  if (choice.by === "nodes") {
    const count = result.landmarks.length;
    const bad = choice.numbers.find((n) => n > count);
    if (bad !== undefined) throw new Error(`node out of range: ${bad} (the graph has nodes 1 to ${count})`);
    return nodeRows(result.members, choice.numbers.map((n) => n - 1));
  }
  const bad = choice.numbers.find((n) => n > result.rowsRead);
  if (bad !== undefined) throw new Error(`record out of range: ${bad} (the file has records 1 to ${result.rowsRead})`);
  return Uint32Array.from(new Set(choice.numbers.map((n) => n - 1))).sort();
}
