import { createHash } from "node:crypto";
import { open, type FileHandle } from "node:fs/promises";
import { basename } from "node:path";
import {
  maybeDecimalMark,
  maybeDelimiter,
  maybeEncoding,
  maybeRaggedPolicy,
  readTableBytes,
  type ByteReadOptions,
  type ByteSource,
  type FileFingerprint,
  type ReadOutcome,
  type Utf8Decoder,
} from "../core/index.ts";

export const readOptionSpec = {
  delimiter: { type: "string" },
  decimal: { type: "string" },
  encoding: { type: "string" },
  ragged: { type: "string" },
} as const;

export const readUsage = `  --delimiter D       comma | semicolon | tab | pipe, or the character , or ; (default: detected)
  --decimal M         . | , (default: detected)
  --encoding E        utf-8 | windows-1252 (default: detected)
  --ragged P          reject | pad: records with too few or too many fields (default reject)`;

/** Reading options from the command line; names as in the workbench's reading panel. */
export function readByteOptions(values: { readonly [K in keyof typeof readOptionSpec]?: string | undefined }): ByteReadOptions {
  const named: Record<string, string> = { tab: "\t", pipe: "|", comma: ",", semicolon: ";" };
  return {
    ...(values.delimiter === undefined ? {} : { delimiter: maybeDelimiter(named[values.delimiter] ?? values.delimiter) }),
    ...(values.decimal === undefined ? {} : { decimal: maybeDecimalMark(values.decimal) }),
    ...(values.encoding === undefined ? {} : { encoding: maybeEncoding(values.encoding) }),
    ...(values.ragged === undefined ? {} : { ragged: maybeRaggedPolicy(values.ragged) }),
  };
}

/**
 * The headless command's file-size limit: none. The workbench stops at 1 GiB (`maxInputBytes`),
 * a browser tab's memory; here the table only has to fit in the machine's memory (8 bytes per
 * numeric cell, plus the texts of text columns). Parquet files, read whole, keep the 1 GiB limit.
 */
export const headlessInputBytes = Number.POSITIVE_INFINITY;

/**
 * Reads a table file through the core pipeline the workbench's worker uses, so both see the same
 * table; `readMs` is the time from open to table. With `fingerprint` (a recipe run) node:crypto's
 * SHA-256 is taken over the bytes as they are read (about 0.4 s per 200 MiB here, so only when
 * asked for); otherwise `fingerprint` is null.
 */
export async function readInput(
  path: string,
  options: ByteReadOptions,
  fingerprint = false,
): Promise<ReadOutcome & { fileName: string; fileSize: number; readMs: number; fingerprint: FileFingerprint | null }> {
  const started = performance.now();
  const handle = await open(path, "r").catch(() => {
    throw new Error(`cannot read input file: ${path}`);
  });
  try {
    const { size } = await handle.stat();
    const hash = fingerprint ? createHash("sha256") : null;
    const outcome = await readTableBytes(fileSource(handle, size), options, { utf8, maxBytes: headlessInputBytes, ...(hash ? { onBytes: (bytes: Uint8Array) => void hash.update(bytes) } : {}) });
    return { ...outcome, fileName: basename(path), fileSize: size, readMs: performance.now() - started, fingerprint: hash ? { bytes: size, sha256: hash.digest("hex") } : null };
  } finally {
    await handle.close();
  }
}

/** Node's streaming UTF-8 decoder for core's reader. */
export function utf8(): Utf8Decoder {
  const decoder = new TextDecoder("utf-8", { fatal: true });
  return (bytes, last) => decoder.decode(bytes, { stream: !last });
}

/** An open file as core's ByteSource. */
export function fileSource(handle: FileHandle, size: number): ByteSource {
  return {
    size,
    read: async (start, end) => {
      const buffer = new Uint8Array(end - start);
      let done = 0;
      while (done < buffer.length) {
        const { bytesRead } = await handle.read(buffer, done, buffer.length - done, start + done);
        if (bytesRead === 0) break;
        done += bytesRead;
      }
      return buffer.subarray(0, done);
    },
  };
}
