/**
 * Reference for the tests, independent of Number() and of the reader: the binary64 nearest to
 * (−1)^negative · digits · 10^exponent, ties to even, by exact rational arithmetic in BigInt.
 * q = the 53-bit (or, below 2^−1022, shorter) quotient of digits·10^exponent·2^k, rounded by
 * comparing twice the remainder with the divisor; the value is q·2^−k (exact in binary64).
 * Past the largest double it gives ±Infinity, as IEEE 754 round-to-nearest does.
 */
export function exactDecimal(negative: boolean, digits: bigint, exponent: number): number {
  if (digits === 0n) return negative ? -0 : 0;
  let numerator = digits;
  let denominator = 1n;
  if (exponent >= 0) numerator *= 10n ** BigInt(exponent);
  else denominator = 10n ** BigInt(-exponent);
  // k such that 2^52 ≤ numerator·2^k / denominator < 2^53, then k ≤ 1074 (subnormals have fewer bits).
  let k = 53 - (bitLength(numerator) - bitLength(denominator));
  const quotient = (shift: number): bigint => (shift >= 0 ? (numerator << BigInt(shift)) / denominator : numerator / (denominator << BigInt(-shift)));
  while (quotient(k) >= 1n << 53n) k--;
  while (quotient(k) < 1n << 52n) k++;
  if (k > 1074) k = 1074;
  const scaledNumerator = k >= 0 ? numerator << BigInt(k) : numerator;
  const scaledDenominator = k >= 0 ? denominator : denominator << BigInt(-k);
  let q = scaledNumerator / scaledDenominator;
  const twiceRemainder = 2n * (scaledNumerator - q * scaledDenominator);
  if (twiceRemainder > scaledDenominator || (twiceRemainder === scaledDenominator && (q & 1n) === 1n)) q++;
  // q ≤ 2^53 is exact as a double; multiplying by 2^−k in two steps keeps each factor representable.
  const half = Math.trunc(k / 2);
  const value = Number(q) * 2 ** -half * 2 ** -(k - half);
  return negative ? -value : value;
}

function bitLength(n: bigint): number {
  return n.toString(2).length;
}

/** The 64 bits of a double, so that −0 and 0, and NaNs, can be told apart. */
export function bitsOf(value: number): bigint {
  return new BigUint64Array(new Float64Array([value]).buffer)[0]!;
}

/** `exactDecimal` of a plain decimal text ([+-]digits[.digits][e[+-]digits]). */
export function exactDecimalText(text: string): number {
  const match = /^([+-]?)(\d*)(?:\.(\d*))?(?:[eE]([+-]?\d+))?$/.exec(text);
  if (!match) throw new Error(`not a plain decimal: ${text}`);
  const [, sign = "", whole = "", fraction = "", exponent = "0"] = match;
  return exactDecimal(sign === "-", BigInt(whole + fraction || "0"), Number(exponent) - fraction.length);
}
