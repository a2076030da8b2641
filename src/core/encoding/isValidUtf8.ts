/**
 * Well-formed UTF-8 check (Unicode 15, Table 3-7: no overlong forms, no surrogates, nothing
 * above U+10FFFF). With `prefix` true the bytes are the start of a longer file, so a sequence
 * cut off by the last byte is accepted. O(bytes).
 * @example isValidUtf8(Uint8Array.of(0x63, 0x61, 0x66, 0xc3, 0xa9)) // => true ("café")
 */
export function isValidUtf8(bytes: Uint8Array, prefix = false): boolean {
  const n = bytes.length;
  let i = 0;
  while (i < n) {
    const b = bytes[i]!;
    if (b < 0x80) {
      i++;
      continue;
    }
    let length: number;
    let low = 0x80;
    let high = 0xbf;
    if (b >= 0xc2 && b <= 0xdf) length = 2;
    else if (b >= 0xe0 && b <= 0xef) {
      length = 3;
      if (b === 0xe0) low = 0xa0; // overlong
      if (b === 0xed) high = 0x9f; // surrogates
    } else if (b >= 0xf0 && b <= 0xf4) {
      length = 4;
      if (b === 0xf0) low = 0x90; // overlong
      if (b === 0xf4) high = 0x8f; // above U+10FFFF
    } else return false;
    for (let k = 1; k < length; ++k) {
      if (i + k >= n) return prefix;
      const c = bytes[i + k]!;
      if (c < (k === 1 ? low : 0x80) || c > (k === 1 ? high : 0xbf)) return false;
    }
    i += length;
  }
  return true;
}
