/**
 * Lines of unsigned integers written straight into bytes (ASCII digits, "," and "\n"), for the
 * export tables that hold only counts and numbers of nodes and rows: about twice as fast as
 * building the same text as strings, which matters for members.csv of millions of lines.
 * `integers` are whole numbers in [0, 2^32); each is written in decimal without leading zeros,
 * as `String(value)` writes it. Pieces are handed out once they reach `pieceBytes`; each is a
 * fresh array the caller may keep.
 * @example [...asciiLines(2, 2, 16, (k, cells) => { cells[0] = k + 1; cells[1] = 10 * k; })] // => one piece, the bytes of "1,0\n2,10\n"
 */
export function* asciiLines(count: number, width: number, pieceBytes: number, line: (k: number, cells: Uint32Array) => void): Generator<Uint8Array> {
  const cells = new Uint32Array(width);
  const widest = width * 11; // 10 digits and a separator per cell
  let buffer = new Uint8Array(pieceBytes + widest);
  let used = 0;
  for (let k = 0; k < count; ++k) {
    line(k, cells);
    for (let c = 0; c < width; ++c) {
      used = writeDigits(buffer, used, cells[c]!);
      buffer[used++] = c + 1 < width ? 44 : 10; // "," or "\n"
    }
    if (used >= pieceBytes) {
      yield buffer.subarray(0, used);
      buffer = new Uint8Array(pieceBytes + widest);
      used = 0;
    }
  }
  if (used > 0) yield buffer.subarray(0, used);
}

// Digits of a whole number below 2^32, most significant first; `>>> 0` truncates the quotient exactly in that range.
function writeDigits(buffer: Uint8Array, at: number, value: number): number {
  const digits = value < 10 ? 1 : value < 100 ? 2 : value < 1e3 ? 3 : value < 1e4 ? 4 : value < 1e5 ? 5 : value < 1e6 ? 6 : value < 1e7 ? 7 : value < 1e8 ? 8 : value < 1e9 ? 9 : 10;
  let rest = value;
  for (let i = at + digits - 1; i >= at; --i) {
    const next = (rest / 10) >>> 0;
    buffer[i] = 48 + rest - 10 * next; // "0" is 48
    rest = next;
  }
  return at + digits;
}
