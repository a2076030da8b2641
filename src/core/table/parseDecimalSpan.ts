// 10^0 … 10^22: every one is exact in binary64, since 5^22 < 2^53 (Clinger 1990, section 5).
const powersOfTen = Array.from({ length: 23 }, (_, k) => Number(`1e${k}`));
const maxDigits = 15; // 10^15 − 1 < 2^53, so the integer of up to 15 significant digits is exact

/**
 * Clinger's fast path for reading a decimal: the value of text[start, end) when that span is
 *   [+-]? digits [mark digits] [(e|E) [+-]? digits]   (at least one digit before the exponent)
 * with at most 15 significant digits w and a net power of ten p (exponent minus fraction digits)
 * with |p| ≤ 22. Then w and 10^|p| are both exact doubles and one IEEE multiplication (p ≥ 0) or
 * division (p < 0) rounds the exact quotient once, to nearest even: the value is bit for bit
 * what `Number()` gives for the same text.
 * Source: W. D. Clinger, "How to read floating point numbers accurately", PLDI 1990, pp. 92–101
 * (the fast path of section 5). O(end − start), no allocation.
 * Anything else (white space, more digits, a larger exponent, another character) returns NaN,
 * meaning "not decided here": the caller falls back to `Number()` on the text. `mark` is the
 * char code of the decimal mark (46 for ".", 44 for ","). A zero mantissa gives 0 or −0.
 * @example parseDecimalSpan("x;0,1;y", 2, 5, 44) // => 0.1
 */
export function parseDecimalSpan(text: string, start: number, end: number, mark: number): number {
  if (start >= end) return NaN;
  let p = start;
  let c = text.charCodeAt(p);
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
  if (digits === 0 || significant > maxDigits) return NaN;
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
  if (p !== end) return NaN;
  const power = exponent - fraction;
  let value: number;
  if (mantissa === 0) value = 0;
  else if (power >= 0 && power <= 22) value = mantissa * powersOfTen[power]!;
  else if (power < 0 && power >= -22) value = mantissa / powersOfTen[-power]!;
  else return NaN;
  return negative ? -value : value;
}
