const magic = [0x50, 0x41, 0x52, 0x31]; // "PAR1" at both ends (Apache Parquet format specification, "File format")

/**
 * True when the bytes start with the Parquet magic "PAR1"; pass the whole file (ArrayBuffer) to
 * check its last four bytes too, or the first bytes alone to route a file before reading it.
 * @example isParquet(Uint8Array.of(0x50, 0x41, 0x52, 0x31)) // => true
 */
export function isParquet(bytes: Uint8Array | ArrayBuffer): boolean {
  const view = bytes instanceof Uint8Array ? bytes : new Uint8Array(bytes);
  const whole = !(bytes instanceof Uint8Array);
  if (view.length < 4 || (whole && view.length < 12)) return false;
  for (let k = 0; k < 4; ++k) {
    if (view[k] !== magic[k]) return false;
    if (whole && view[view.length - 4 + k] !== magic[k]) return false;
  }
  return true;
}
