import { rename, rm } from "node:fs/promises";
import { writeTextFile, type FileText } from "./writeTextFile.ts";

/**
 * Writes one output file whole or not at all: the text goes to a staging file beside it, which is
 * renamed over the target only once complete (a rename within one folder replaces atomically on
 * POSIX file systems), so a reader never sees half a file and a failure leaves the old one.
 * Pieces of text are written as they come (`writeTextFile`).
 */
export async function writeFileWhole(path: string, text: FileText | Uint8Array): Promise<void> {
  const staging = `${path}.partial-${process.pid}`;
  try {
    await writeTextFile(staging, text instanceof Uint8Array ? [text] : text);
    await rename(staging, path);
  } catch (error) {
    await rm(staging, { force: true });
    throw new Error(`cannot write ${path}: ${error instanceof Error ? error.message : String(error)}`, { cause: error });
  }
}
