import { open } from "node:fs/promises";
import { readRecordTexts, type ByteReadOptions, type TableFormat } from "../core/index.ts";
import { fileSource, utf8 } from "./readInput.ts";

/** Reads the cell texts of some rows (0-based) again from the input file, with the format the table was read in. */
export async function readRegionTexts(path: string, rows: ArrayLike<number>, format: TableFormat, read: ByteReadOptions): Promise<Map<number, readonly string[]>> {
  const handle = await open(path, "r").catch(() => {
    throw new Error(`cannot read input file again: ${path}`);
  });
  try {
    const { size } = await handle.stat();
    const delimiter = format.kind === "delimited" ? format.delimiter : ",";
    return await readRecordTexts(fileSource(handle, size), rows, { delimiter, ...(read.encoding === undefined ? {} : { encoding: read.encoding }) }, { utf8 });
  } finally {
    await handle.close();
  }
}
