import { isValidUtf8 } from "./isValidUtf8.ts";
import { looksBinary } from "./looksBinary.ts";

/** Text encodings Shoal reads; both are valid TextDecoder labels. */
export type TextEncodingName = "utf-8" | "windows-1252";

export interface DetectedEncoding {
  readonly encoding: TextEncodingName;
  /** Bytes of the byte-order mark to skip (3 for UTF-8 with a BOM, else 0). */
  readonly bomLength: number;
}

/** Bytes to pass to `detectEncoding`: the start of the file. */
export const encodingProbeBytes = 65_536; // common practice, no source

/**
 * Detects the encoding of a text file from its first bytes (pass up to 64 KiB):
 * a UTF-8 byte-order mark → UTF-8; otherwise well-formed UTF-8 (pure ASCII included) → UTF-8;
 * otherwise Windows-1252, the usual encoding of spreadsheets saved on Western Windows systems.
 * Throws for a UTF-16 or UTF-32 byte-order mark, for NUL bytes in the first 1 KiB (binary),
 * and for an empty head. With `isWholeFile` false (the default) a multi-byte sequence cut off
 * by the end of `head` is accepted. O(head length).
 * @example detectEncoding(Uint8Array.of(0x61, 0x3b, 0x80)) // => { encoding: "windows-1252", bomLength: 0 }
 */
export function detectEncoding(head: Uint8Array, isWholeFile = false): DetectedEncoding {
  if (head.length === 0) throw new Error("the file is empty");
  const [b0, b1, b2] = head;
  if (b0 === 0xef && b1 === 0xbb && b2 === 0xbf) return { encoding: "utf-8", bomLength: 3 };
  if ((b0 === 0xff && b1 === 0xfe) || (b0 === 0xfe && b1 === 0xff) || (b0 === 0 && b1 === 0 && b2 === 0xfe)) {
    throw new Error("utf-16 and utf-32 text are not supported: save the file as utf-8");
  }
  if (looksBinary(head)) throw new Error("this looks like a binary file: it has NUL bytes in its first 1 KiB");
  return { encoding: isValidUtf8(head, !isWholeFile) ? "utf-8" : "windows-1252", bomLength: 0 };
}

/** Normalises an encoding chosen by the user (utf-8, utf8, windows-1252, cp1252); throws for anything else. */
export function maybeEncoding(name: string): TextEncodingName {
  const key = name.trim().toLowerCase();
  if (key === "utf-8" || key === "utf8") return "utf-8";
  if (key === "windows-1252" || key === "cp1252" || key === "win-1252") return "windows-1252";
  throw new Error(`invalid encoding: ${JSON.stringify(name)}`);
}
