import { closeSync, openSync, writeSync } from "node:fs";

/**
 * A file's text: one string for a small file, or its pieces in order (strings, or bytes of UTF-8
 * text, as the generators of `coverExportChunks` give), written as they come and never joined into one string.
 */
export type FileText = string | Iterable<string | Uint8Array>;

/** Bytes gathered before one write call. */
export const writeBatchBytes = 1 << 22; // 4 MiB: few system calls, small beside the tables (our choice, no source)

/**
 * Writes a file's text (one string or its pieces in order: strings, written as UTF-8, or bytes) creating or truncating it.
 * The pieces are encoded into one reused buffer of `writeBatchBytes`, written whenever the next
 * piece might not fit, so memory holds one batch and one piece however long the file; a piece longer
 * than the buffer is encoded and written alone. Writes are synchronous calls on one descriptor:
 * the command has nothing else to do meanwhile, and each call returns only once the kernel has the
 * bytes, which is all the backpressure a file needs. A throwing piece closes the file and rethrows.
 */
export async function writeTextFile(path: string, text: FileText): Promise<void> {
  const fd = openSync(path, "w");
  try {
    const buffer = Buffer.allocUnsafe(writeBatchBytes);
    let used = 0;
    for (const piece of typeof text === "string" ? [text] : text) {
      // at most 3 UTF-8 bytes per UTF-16 code unit of a string
      const most = typeof piece === "string" ? 3 * piece.length : piece.length;
      if (used + most > buffer.length) {
        writeAll(fd, buffer.subarray(0, used));
        used = 0;
      }
      if (most > buffer.length) writeAll(fd, typeof piece === "string" ? Buffer.from(piece, "utf8") : piece);
      else if (typeof piece === "string") used += buffer.write(piece, used, "utf8");
      else {
        buffer.set(piece, used);
        used += piece.length;
      }
    }
    writeAll(fd, buffer.subarray(0, used));
  } finally {
    closeSync(fd);
  }
}

function writeAll(fd: number, bytes: Uint8Array): void {
  for (let done = 0; done < bytes.length; ) done += writeSync(fd, bytes, done, bytes.length - done);
}
