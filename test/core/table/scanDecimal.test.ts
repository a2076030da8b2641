import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { scanDecimal, scannedValue } from "../../../src/core/table/scanDecimal.ts";
import { boundaryText, decimalText } from "./decimalTexts.ts";
import { bitsOf, exactDecimal, exactDecimalText } from "./exactDecimal.ts";

let lastEnd = -1;
/** The value scanDecimal wrote (NaN: not decided), keeping the index it returned in `lastEnd`. */
function scan(text: string, start: number, end: number, mark: number): number {
  lastEnd = scanDecimal(text, start, end, mark);
  return scannedValue[0]!;
}

describe("scanDecimal: Clinger's fast path", () => {
  it("a value it returns has the same 64 bits as Number() and as exact BigInt rounding, for random decimals (many digits, exponents near ±22 and ±308, signs, leading zeros)", () => {
    let decided = 0;
    fc.assert(
      fc.property(decimalText, ({ text, negative, digits, power }) => {
        const value = scan(text, 0, text.length, 46);
        expect(lastEnd).toBe(text.length); // every generated text is a plain decimal
        if (value !== value) return; // not decided here: the reader asks Number()
        decided++;
        expect(bitsOf(value)).toBe(bitsOf(Number(text))); // reference: Number(), correctly rounded in V8
        expect(bitsOf(value)).toBe(bitsOf(exactDecimal(negative, digits, power))); // reference: exact rational rounding (exactDecimal.ts)
      }),
      { numRuns: 20_000, seed: 20261202 },
    );
    expect(decided).toBeGreaterThan(2_000); // the fast path must be exercised, not only declined
  });

  it("on decimals of 14 to 17 significant digits with powers of ten from −25 to 25 (the fast path's edges), a value it returns has the bits of Number() and of exact rounding", () => {
    let decided = 0;
    fc.assert(
      fc.property(boundaryText, (text) => {
        const value = scan(text, 0, text.length, 46);
        expect(lastEnd).toBe(text.length);
        if (value !== value) return;
        decided++;
        expect(bitsOf(value)).toBe(bitsOf(Number(text))); // reference: Number()
        expect(bitsOf(value)).toBe(bitsOf(exactDecimalText(text))); // reference: exact rational rounding (exactDecimal.ts)
      }),
      { numRuns: 20_000, seed: 53 },
    );
    expect(decided).toBeGreaterThan(5_000); // 14, 15 and most 16-digit mantissas within |p| ≤ 22
  });

  it("exact BigInt rounding agrees with Number() bit for bit on the same random decimals (checks the reference itself)", () => {
    fc.assert(
      fc.property(decimalText, ({ text, negative, digits, power }) => {
        expect(bitsOf(exactDecimal(negative, digits, power))).toBe(bitsOf(Number(text)));
      }),
      { numRuns: 5_000, seed: 7 },
    );
  });

  it("decides digits below 2^53 with |power of ten| ≤ 22, and declines 2^53 and above, 17 digits and power 23", () => {
    expect(scan("999999999999999", 0, 15, 46)).toBe(999999999999999); // 15 digits, worked by hand
    expect(scan("9007199254740991", 0, 16, 46)).toBe(9007199254740991); // 2^53 − 1 (16 digits) is exact, worked by hand
    expect(scan("900719925474099.1", 0, 17, 46)).toBe(Number("900719925474099.1")); // the same digits over 10, reference: Number()
    expect(scan("9007199254740992", 0, 16, 46)).toBeNaN(); // 2^53: w·10 + d may have rounded down to it, so left to Number()
    expect(scan("9007199254740993", 0, 16, 46)).toBeNaN(); // 2^53 + 1: left to Number()
    expect(scan("10000000000000000", 0, 17, 46)).toBeNaN(); // 17 digits: left to Number()
    expect(scan("1e22", 0, 4, 46)).toBe(1e22); // 10^22 is exact (5^22 < 2^53), Clinger 1990 section 5
    expect(scan("1e23", 0, 4, 46)).toBeNaN(); // 10^23 is not exact in binary64: left to Number()
    expect(scan("1e-22", 0, 5, 46)).toBe(1e-22); // one division by the exact 10^22
    expect(scan("0.000000000000000000000001", 0, 26, 46)).toBeNaN(); // power −24: left to Number()
    expect(scan("000000000000000000000012.5", 0, 26, 46)).toBe(12.5); // leading zeros are not significant, worked by hand
  });

  it.each([
    ["0.3", "0x3fd3333333333333"], // 3/10 in one division; the naive 3 × 0.1 gives 0x3fd3333333333334 (0.30000000000000004), worked by hand
    ["2.675", "0x4005666666666666"], // 2675/1000, bits from exactDecimal (exact BigInt rounding)
    ["5.61", "0x401670a3d70a3d71"], // 561/100, bits from exactDecimal; the naive loop below gives ...3d70
    ["0.1234567890123", "0x3fbf9add3746e984"], // 1234567890123/10^13, bits from exactDecimal
    ["123456789012345e-22", "0x3e4a831bd731a260"], // 15 digits over 10^22, bits from exactDecimal
    ["-0", "0x8000000000000000"], // negative zero keeps its sign, as Number("-0") does (ECMAScript StringToNumber)
    ["-0.0e5", "0x8000000000000000"], // negative zero, worked by hand
  ])("reads %j with the bits %s, the same as Number() and exact rounding", (text, hex) => {
    const bits = BigInt(hex);
    expect(bitsOf(scan(text, 0, text.length, 46))).toBe(bits);
    expect(bitsOf(Number(text))).toBe(bits); // the same bits from Number()
    const [mantissa = "", exponent = "0"] = text.replace(/^-/, "").split(/e/i);
    const [whole = "", fraction = ""] = mantissa.split(".");
    expect(bitsOf(exactDecimal(text.startsWith("-"), BigInt(whole + fraction), Number(exponent) - fraction.length))).toBe(bits);
  });

  it("a naive digit loop misreads 5.61 (5 + 6·0.1 + 1·0.01 gives 5.609999999999999, worked by hand: each step rounds) where the fast path is exact", () => {
    let value = 5;
    let scale = 1;
    for (const digit of [6, 1]) {
      scale /= 10;
      value += digit * scale;
    }
    expect(value).toBe(5.609999999999999); // worked by hand (and printed by Node)
    expect(scan("5.61", 0, 4, 46)).toBe(Number("5.61"));
  });

  it("a 17-digit mantissa accumulated in a double misreads 0.46185639482223340 (one ulp high), so 17 digits go to Number()", () => {
    const text = "0.46185639482223340";
    let mantissa = 0;
    for (const c of text.slice(2)) mantissa = mantissa * 10 + Number(c); // passes 2^53: the last steps round
    expect(bitsOf(mantissa / 1e17)).toBe(0x3fdd8f0e1fcd6fedn); // computed by Node; one ulp above the exact value
    expect(bitsOf(exactDecimal(false, 46185639482223340n, -17))).toBe(0x3fdd8f0e1fcd6fecn); // reference: exact BigInt rounding
    expect(scan(text, 0, text.length, 46)).toBeNaN(); // declined (17 significant digits)
    expect(bitsOf(Number(text))).toBe(0x3fdd8f0e1fcd6fecn); // what the reader then uses, equal to the exact value
  });

  it("reads with a decimal comma when the mark is 44, and stops at a point there", () => {
    expect(scan("12,5", 0, 4, 44)).toBe(12.5); // worked by hand
    expect(scan("12.5", 0, 4, 44)).toBe(12);
    expect(lastEnd).toBe(2); // the decimal is "12"; the caller sees that the cell goes on
  });

  it("reads a decimal inside a longer text and returns where it ends: 0,1 between semicolons ends at index 5", () => {
    expect(scan("x;0,1;y", 2, 7, 44)).toBe(0.1); // worked by hand
    expect(lastEnd).toBe(5); // worked by hand
  });

  it.each(["", "+", "-", ".", "e5", "1e", "1e+", "x1", " 1"])("finds no decimal at the start of %j (end −1)", (text) => {
    expect(scan(text, 0, text.length, 46)).toBeNaN();
    expect(lastEnd).toBe(-1);
  });

  it("declines 17 significant digits but still finds their end (the reader then asks Number())", () => {
    const text = "0.12345678901234567;";
    expect(scan(text, 0, text.length, 46)).toBeNaN();
    expect(lastEnd).toBe(19); // worked by hand: "0." and 17 digits
  });
});
