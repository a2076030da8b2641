/**
 * Checks the frame of a Parquet file before its footer is parsed: the magic "PAR1" at both ends
 * and a footer length (the 4-byte little-endian integer before the last magic) that fits between
 * the two magics (Apache Parquet format specification, "File format"). Throws one plain error
 * naming the problem; returns the footer length. O(1).
 * @example checkParquetFooter(Uint8Array.of(0x50, 0x41, 0x52, 0x31, 9, 1, 0, 0, 0, 0x50, 0x41, 0x52, 0x31).buffer) // => 1
 */
export function checkParquetFooter(buffer: ArrayBuffer): number {
  const view = new DataView(buffer);
  const n = buffer.byteLength;
  if (n < 12 || view.getUint32(0, true) !== 0x31524150 || view.getUint32(n - 4, true) !== 0x31524150) {
    throw new Error("this is not a parquet file: it does not start and end with PAR1"); // "PAR1" read little-endian
  }
  const footerLength = view.getUint32(n - 8, true);
  if (footerLength === 0 || footerLength > n - 12) throw new Error(`invalid parquet footer length: ${footerLength} (the file has ${n} bytes)`);
  return footerLength;
}
