// Bytes 0x80–0x9F of Windows-1252 (WHATWG Encoding Standard, index-windows-1252); every other
// byte is the Latin-1 code point of the same number. The five bytes Windows leaves unassigned
// (0x81, 0x8D, 0x8F, 0x90, 0x9D) map to the C1 controls, as in the standard.
const high = [
  0x20ac, 0x0081, 0x201a, 0x0192, 0x201e, 0x2026, 0x2020, 0x2021, 0x02c6, 0x2030, 0x0160, 0x2039, 0x0152, 0x008d, 0x017d, 0x008f,
  0x0090, 0x2018, 0x2019, 0x201c, 0x201d, 0x2022, 0x2013, 0x2014, 0x02dc, 0x2122, 0x0161, 0x203a, 0x0153, 0x009d, 0x017e, 0x0178,
];

/**
 * Decodes Windows-1252 bytes to text, as TextDecoder("windows-1252") does in browsers (Node 20's
 * TextDecoder maps 0x80–0x9F to C1 controls instead, so the headless command needs this).
 * Stateless: chunks may be decoded one by one. O(bytes).
 * @example decodeWindows1252(Uint8Array.of(0x80, 0x31, 0x32, 0xe9)) // => "€12é"
 */
export function decodeWindows1252(bytes: Uint8Array): string {
  const units = new Uint16Array(bytes.length);
  for (let i = 0; i < bytes.length; ++i) {
    const b = bytes[i]!;
    units[i] = b >= 0x80 && b <= 0x9f ? high[b - 0x80]! : b;
  }
  let text = "";
  for (let i = 0; i < units.length; i += 8192) text += String.fromCharCode(...units.subarray(i, i + 8192));
  return text;
}
