/** Bytes examined for NUL bytes. */
export const binaryProbeBytes = 1024; // common practice (git and diff look for NUL in the first few KiB), no exact source

/**
 * True when the first 1 KiB holds a NUL byte, which no text file in UTF-8 or Windows-1252 has
 * (spreadsheets, archives, images and Parquet files do). O(1 KiB).
 * @example looksBinary(Uint8Array.of(0x50, 0x4b, 0x03, 0x04, 0x00)) // => true
 */
export function looksBinary(head: Uint8Array): boolean {
  return head.subarray(0, binaryProbeBytes).includes(0);
}
