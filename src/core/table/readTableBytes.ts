import { Cancelled } from "../control.ts";
import { decodeWindows1252 } from "../encoding/decodeWindows1252.ts";
import { detectEncoding, encodingProbeBytes, type TextEncodingName } from "../encoding/detectEncoding.ts";
import { isParquet } from "./parquet/isParquet.ts";
import { readParquet } from "./parquet/readParquet.ts";
import { checkInputSize } from "./checkInputSize.ts";
import { createTableReader } from "./createTableReader.ts";
import type { ReadOptions } from "./readOptions.ts";
import type { ReadOutcome } from "./tableReport.ts";

/** A file as the worker (a File) or the headless command (a file handle) can offer it. */
export interface ByteSource {
  readonly size: number;
  /** Bytes [start, end) of the file. */
  read(start: number, end: number): Promise<Uint8Array>;
}

/** A streaming UTF-8 decoder from the platform (TextDecoder with fatal: true, stream: true); core has none of its own. */
export type Utf8Decoder = (bytes: Uint8Array, last: boolean) => string;

export interface ByteReadOptions extends ReadOptions {
  /** Text encoding; detected from the first 64 KiB when absent. */
  readonly encoding?: TextEncodingName;
}

export interface ByteReadControl {
  readonly utf8: () => Utf8Decoder;
  /** Share of bytes read (0..1) and data records so far. */
  readonly onProgress?: (fraction: number, rows: number) => void;
  readonly shouldStop?: () => boolean;
  readonly chunkBytes?: number;
  /** Sees every byte of the file once, in order, as it is read (a fingerprint's hash is fed here). */
  readonly onBytes?: (bytes: Uint8Array) => void;
  /** Largest file read, in bytes (default `maxInputBytes`, 1 GiB; the headless command passes Infinity). Parquet, read whole, keeps 1 GiB. */
  readonly maxBytes?: number;
}

export const readChunkBytes = 1 << 22; // 4 MiB per step: progress and cancellation every few tens of milliseconds

/**
 * Reads a table file the same way everywhere: size check; Parquet when the file starts and ends
 * with PAR1; otherwise text in UTF-8 (with or without a byte-order mark) or Windows-1252, detected
 * from the first 64 KiB unless chosen, decoded chunk by chunk into the incremental reader.
 * A UTF-8 file with an invalid byte later on fails with a hint to choose Windows-1252.
 * Stops with `Cancelled` between chunks when `shouldStop` says so. O(file size).
 */
export async function readTableBytes(source: ByteSource, options: ByteReadOptions, control: ByteReadControl): Promise<ReadOutcome> {
  const { size } = source;
  checkInputSize(size, control.maxBytes);
  if (size === 0) throw new Error("the file is empty");
  const stop = (): void => {
    if (control.shouldStop?.()) throw new Cancelled("reading the file");
  };
  const head = await source.read(0, Math.min(size, encodingProbeBytes));
  if (size >= 12 && isParquet(head.subarray(0, 4)) && isParquet(await source.read(size - 4, size))) {
    const bytes = await source.read(0, size);
    control.onBytes?.(bytes);
    return readParquet(bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength) as ArrayBuffer, { onProgress: (f) => control.onProgress?.(f, 0) });
  }
  const detected = detectEncoding(head, size <= encodingProbeBytes);
  const encoding = options.encoding ?? detected.encoding;
  const decode: Utf8Decoder = encoding === "utf-8" ? control.utf8() : (bytes) => decodeWindows1252(bytes);
  const { encoding: _chosen, ...readOptions } = options;
  const reader = createTableReader(readOptions, true, control.maxBytes);
  const step = control.chunkBytes ?? readChunkBytes;
  control.onBytes?.(head.subarray(0, detected.bomLength));
  for (let start = detected.bomLength; start < size; start += step) {
    stop();
    const end = Math.min(size, start + step);
    let bytes: Uint8Array;
    try {
      bytes = await source.read(start, end);
    } catch (error) {
      throw new Error(`cannot read the file at bytes ${start} to ${end}: ${error instanceof Error ? error.message : String(error)}`, { cause: error });
    }
    control.onBytes?.(bytes);
    let text: string;
    try {
      text = decode(bytes, end === size);
    } catch {
      throw new Error(`the file is not valid utf-8 near byte ${start}: choose windows-1252 if it was saved by a spreadsheet`);
    }
    reader.push(text);
    control.onProgress?.(end / size, reader.rowsRead);
  }
  if (size === detected.bomLength) throw new Error("the file is empty");
  return reader.finish();
}
