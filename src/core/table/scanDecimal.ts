// 10^0 … 10^22: every one is exact in binary64, since 5^22 < 2^53 (Clinger 1990, section 5).
const powersOfTen = Array.from({ length: 23 }, (_, k) => Number(`1e${k}`));
const maxDigits = 15; // 10^15 − 1 < 2^53, so an integer of up to 15 significant digits is exact

/** Where the last `scanDecimal` stopped: the index after the decimal it read, or −1 when the text there is none. */
export const scanned = { end: -1 };

/**
 * Reads the plain decimal that starts at text[start] and ends before `end` or at the first
 * character that cannot continue it:
 *   [+-]? digits [mark digits] [(e|E) [+-]? digits]   (at least one digit before the exponent)
 * and sets `scanned.end` to the index after it (−1 when there is no such decimal at `start`).
 * The value is returned by Clinger's fast path when the decimal has at most 15 significant digits
 * w and a net power of ten p (exponent minus fraction digits) with |p| ≤ 22: w and 10^|p| are then
 * exact doubles, and one IEEE multiplication (p ≥ 0) or division (p < 0) rounds the exact value
 * once, to nearest even, so the result is bit for bit what `Number()` gives for the same text.
 * Otherwise it returns NaN with `scanned.end` still set: a decimal, but not decided here (more
 * digits, a larger exponent); the caller then asks `Number()`. A zero mantissa gives 0 or −0.
 * Source: W. D. Clinger, "How to read floating point numbers accurately", PLDI 1990, pp. 92–101
 * (the fast path of section 5). `mark` is the char code of the decimal mark (46 ".", 44 ",").
 * O(length of the decimal), no allocation; writes only `scanned`.
 * @example scanDecimal("x;0,1;y", 2, 7, 44) // => 0.1 (and scanned.end is 5)
 */
export function scanDecimal(text: string, start: number, end: number, mark: number): number {
  scanned.end = -1;
  let p = start;
  let c = p < end ? text.charCodeAt(p) : 0;
  let negative = false;
  if (c === 45 || c === 43) {
    negative = c === 45; // "-"
    c = ++p < end ? text.charCodeAt(p) : 0;
  }
  let mantissa = 0;
  let significant = 0;
  let fraction = 0;
  let digits = 0;
  while (c >= 48 && c <= 57) {
    digits++;
    if (significant > 0 || c !== 48) {
      mantissa = mantissa * 10 + (c - 48);
      significant++;
    }
    c = ++p < end ? text.charCodeAt(p) : 0;
  }
  if (c === mark) {
    c = ++p < end ? text.charCodeAt(p) : 0;
    while (c >= 48 && c <= 57) {
      digits++;
      fraction++;
      if (significant > 0 || c !== 48) {
        mantissa = mantissa * 10 + (c - 48);
        significant++;
      }
      c = ++p < end ? text.charCodeAt(p) : 0;
    }
  }
  if (digits === 0) return NaN;
  let exponent = 0;
  if (c === 101 || c === 69) {
    c = ++p < end ? text.charCodeAt(p) : 0;
    let exponentNegative = false;
    if (c === 45 || c === 43) {
      exponentNegative = c === 45;
      c = ++p < end ? text.charCodeAt(p) : 0;
    }
    const first = p;
    while (c >= 48 && c <= 57) {
      if (exponent < 1e6) exponent = exponent * 10 + (c - 48);
      c = ++p < end ? text.charCodeAt(p) : 0;
    }
    if (p === first) return NaN;
    if (exponentNegative) exponent = -exponent;
  }
  scanned.end = p;
  if (significant > maxDigits) return NaN;
  const power = exponent - fraction;
  let value: number;
  if (mantissa === 0) value = 0;
  else if (power >= 0 && power <= 22) value = mantissa * powersOfTen[power]!;
  else if (power < 0 && power >= -22) value = mantissa / powersOfTen[-power]!;
  else return NaN;
  return negative ? -value : value;
}
