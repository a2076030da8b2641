import fc from "fast-check";

/** A plain decimal text and its parts: sign, digits (leading zeros kept), point position, exponent. */
interface DecimalText {
  readonly text: string;
  readonly negative: boolean;
  readonly digits: bigint;
  readonly power: number;
}

const digitString = (min: number, max: number) => fc.string({ unit: fc.constantFrom(..."0123456789"), minLength: min, maxLength: max });
const exponentPart = fc.oneof(
  fc.constant(""),
  fc.record({ e: fc.constantFrom("e", "E"), sign: fc.constantFrom("", "+", "-"), value: fc.oneof(fc.integer({ min: 0, max: 30 }), fc.integer({ min: 280, max: 330 }), fc.integer({ min: 0, max: 400 })), zeros: fc.constantFrom("", "0", "00") })
    .map(({ e, sign, value, zeros }) => `${e}${sign}${zeros}${value}`),
);
/** Random plain decimals: up to 25 digits around the point, leading zeros, signs, exponents near ±22 and ±308. */
export const decimalText: fc.Arbitrary<DecimalText> = fc
  .record({ sign: fc.constantFrom("", "+", "-"), whole: digitString(0, 20), point: fc.boolean(), fraction: digitString(0, 20), exponent: exponentPart })
  .filter(({ whole, point, fraction }) => whole.length + (point ? fraction.length : 0) > 0)
  .map(({ sign, whole, point, fraction, exponent }) => {
    const fractionDigits = point ? fraction : "";
    const text = `${sign}${whole}${point ? "." : ""}${fractionDigits}${exponent}`;
    const exponentValue = exponent === "" ? 0 : Number(exponent.slice(1));
    return { text, negative: sign === "-", digits: BigInt(whole + fractionDigits || "0"), power: exponentValue - fractionDigits.length };
  });

/** Decimals with 14 to 17 significant digits (the first digit not zero) and a power of ten from −25 to 25: the fast path's edges. */
export const boundaryText: fc.Arbitrary<string> = fc
  .record({ sign: fc.constantFrom("", "-"), first: fc.integer({ min: 1, max: 9 }), rest: fc.integer({ min: 13, max: 16 }).chain((n) => digitString(n, n)), point: fc.nat(17), exponent: fc.integer({ min: -25, max: 25 }) })
  .map(({ sign, first, rest, point, exponent }) => {
    const digits = `${first}${rest}`;
    const at = Math.min(point, digits.length);
    return `${sign}${digits.slice(0, at)}.${digits.slice(at)}e${exponent}`;
  });

/** Any double (subnormals, −0, extremes) written the ways programs write them: shortest, 17 significant digits, exponent form. */
export const printedDouble: fc.Arbitrary<string> = fc
  .record({ value: fc.double({ noNaN: true, noDefaultInfinity: true }), form: fc.constantFrom("shortest", "precision17", "exponential16", "fixed") })
  .map(({ value, form }) => {
    if (form === "precision17") return value.toPrecision(17);
    if (form === "exponential16") return value.toExponential(16);
    if (form === "fixed" && Math.abs(value) < 1e21) return value.toFixed(20);
    return String(value);
  });
