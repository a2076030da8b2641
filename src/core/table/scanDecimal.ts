// 10^0 … 10^22: every one is exact in binary64, since 5^22 < 2^53 (Clinger 1990, section 5).
const powersOfTen = Array.from({ length: 23 }, (_, k) => Number(`1e${k}`));
const exactLimit = 2 ** 53; // integers below it are exact in binary64, and so is every step w·10 + d on the way up

/** The value the last `scanDecimal` read, or NaN when it did not decide (a typed array, so that storing it allocates nothing). */
export const scannedValue = new Float64Array(1);

/**
 * Reads the plain decimal that starts at text[start] and ends before `end` or at the first
 * character that cannot continue it:
 *   [+-]? digits [mark digits] [(e|E) [+-]? digits]   (at least one digit before the exponent)
 * and returns the index after it (−1 when there is no such decimal at `start`). Its value is
 * written to `scannedValue[0]` by Clinger's fast path when its digits, read as an integer w, are
 * below 2^53 (every decimal of up to 15 significant digits, most of 16) and its net power of ten p
 * (exponent minus fraction digits) has |p| ≤ 22: w and 10^|p| are then exact doubles, and one IEEE multiplication (p ≥ 0) or division (p < 0) rounds the exact value
 * once, to nearest even, so the result is bit for bit what `Number()` gives for the same text.
 * Otherwise the value is NaN: a decimal, but not decided here (w ≥ 2^53, a larger exponent);
 * the caller then asks `Number()`. A zero mantissa gives 0 or −0.
 * Source: W. D. Clinger, "How to read floating point numbers accurately", PLDI 1990, pp. 92–101
 * (the fast path of section 5). `mark` is the char code of the decimal mark (46 ".", 44 ",").
 * O(length of the decimal), no allocation (a double returned from a call that is not inlined
 * would be boxed); writes only `scannedValue`.
 * @example scanDecimal("x;0,1;y", 2, 7, 44) // => 5 (and scannedValue[0] is 0.1)
 */
export function scanDecimal(text: string, start: number, end: number, mark: number): number {
  scannedValue[0] = NaN;
  let p = start;
  let c = p < end ? text.charCodeAt(p) : 0;
  let negative = false;
  if (c === 45 || c === 43) {
    negative = c === 45; // "-"
    c = ++p < end ? text.charCodeAt(p) : 0;
  }
  let mantissa = 0;
  let fraction = 0;
  let digits = 0;
  while (c >= 48 && c <= 57) {
    digits++;
    mantissa = mantissa * 10 + (c - 48); // leading zeros leave it 0
    c = ++p < end ? text.charCodeAt(p) : 0;
  }
  if (c === mark) {
    c = ++p < end ? text.charCodeAt(p) : 0;
    while (c >= 48 && c <= 57) {
      digits++;
      fraction++;
      mantissa = mantissa * 10 + (c - 48);
      c = ++p < end ? text.charCodeAt(p) : 0;
    }
  }
  if (digits === 0) return -1;
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
    if (p === first) return -1;
    if (exponentNegative) exponent = -exponent;
  }
  // Each step w·10 + d is exact while the result stays below 2^53, and rounding cannot bring a larger
  // result below it, so a final w < 2^53 was computed exactly.
  if (!(mantissa < exactLimit)) return p;
  const power = exponent - fraction;
  let value: number;
  if (mantissa === 0) value = 0;
  else if (power >= 0 && power <= 22) value = mantissa * powersOfTen[power]!;
  else if (power < 0 && power >= -22) value = mantissa / powersOfTen[-power]!;
  else return p;
  scannedValue[0] = negative ? -value : value;
  return p;
}
