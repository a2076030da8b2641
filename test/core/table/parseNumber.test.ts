import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { isMissingToken, parseNumber } from "../../../src/core/index.ts";
import { boundaryText, decimalText, printedDouble } from "./decimalTexts.ts";
import { bitsOf, exactDecimalText } from "./exactDecimal.ts";

describe("parseNumber", () => {
  it.each([
    ["42", 42],
    [" 2.5 ", 2.5],
    ["-0.125", -0.125],
    ["+3", 3],
    [".5", 0.5],
    ["5.", 5],
    ["1e3", 1000],
    ["6.02E-1", 0.602],
    ["1e+21", 1e21],
  ])("reads the decimal %j as %d", (cell, value) => {
    expect(parseNumber(cell)).toBe(value); // worked by hand
  });

  it.each(["", "abc", "0x10", "Infinity", "-Infinity", "NaN", "1,5", "1.2.3", "e5", "1e", "--1", "1e400", "12 kg"])(
    "reads %j as NaN (not a finite plain decimal)",
    (cell) => {
      expect(parseNumber(cell)).toBeNaN();
    },
  );
});

describe("parseNumber with a decimal comma", () => {
  it.each([
    ["12,5", 12.5],
    [" -0,125 ", -0.125],
    [",5", 0.5],
    ["5,", 5],
    ["42", 42],
    ["6,02E-1", 0.602],
  ])("reads %j as %d", (cell, value) => {
    expect(parseNumber(cell, ",")).toBe(value); // worked by hand
  });

  it.each(["12.5", "1.234,5", "1,2,3", "", "Inf"])("reads %j as NaN (a point or a second comma is not read)", (cell) => {
    expect(parseNumber(cell, ",")).toBeNaN();
  });
});

describe("isMissingToken", () => {
  it.each(["", "  ", "NA", "na", " n/a ", "NaN", "null", "NULL", "-", "?", "Inf", "-inf", "+Infinity", "#N/A", "#DIV/0!", "#VALUE!"])("treats %j as missing", (cell) => {
    expect(isMissingToken(cell)).toBe(true);
  });

  it.each(["0", "None", "none yet", "--", "N", "x", "infinite"])("does not treat %j as missing", (cell) => {
    expect(isMissingToken(cell)).toBe(false);
  });
});

/** Number() as the reader defines a number: finite, else NaN (a missing value). */
const finiteOrNaN = (value: number): number => (Number.isFinite(value) ? value : NaN);

describe("parseNumber: bit for bit what Number() gives (reference: Number(), correctly rounded in V8 per ECMAScript StringToNumber)", () => {
  it("random plain decimals (up to 40 digits, leading zeros, signs, exponents near ±22 and ±308) read with the bits of Number()", () => {
    fc.assert(
      fc.property(decimalText, ({ text }) => {
        expect(bitsOf(parseNumber(text))).toBe(bitsOf(finiteOrNaN(Number(text))));
      }),
      { numRuns: 20_000, seed: 1990 },
    );
  });

  it("decimals of 14 to 17 significant digits with powers of ten from −25 to 25 (the fast path's edges) read with the bits of Number()", () => {
    fc.assert(
      fc.property(boundaryText, (text) => {
        expect(bitsOf(parseNumber(text))).toBe(bitsOf(Number(text)));
      }),
      { numRuns: 20_000, seed: 15 },
    );
  });

  it("every double printed shortest, with 17 significant digits or in exponent form (subnormals, −0, extremes) reads back with the bits of Number()", () => {
    fc.assert(
      fc.property(printedDouble, (text) => {
        expect(bitsOf(parseNumber(text))).toBe(bitsOf(finiteOrNaN(Number(text))));
      }),
      { numRuns: 20_000, seed: 53 },
    );
  });

  it("with white space around it, a decimal still reads with the bits of Number()", () => {
    fc.assert(
      fc.property(decimalText, fc.constantFrom(" ", "\t", "  "), ({ text }, space) => {
        expect(bitsOf(parseNumber(`${space}${text}${space}`))).toBe(bitsOf(finiteOrNaN(Number(text))));
      }),
      { numRuns: 5_000, seed: 2 },
    );
  });

  it("with a decimal comma, a decimal reads with the bits Number() gives for it written with a point", () => {
    fc.assert(
      fc.property(fc.oneof(decimalText.map((d) => d.text), boundaryText, printedDouble), (text) => {
        expect(bitsOf(parseNumber(text.replace(".", ","), ","))).toBe(bitsOf(finiteOrNaN(Number(text))));
      }),
      { numRuns: 20_000, seed: 44 },
    );
  });

  it.each([
    ["4.9e-324", "0x1"], // the smallest subnormal, 2^−1074 (IEEE 754 binary64)
    ["2.4703282292062328e-324", "0x1"], // just above half of 2^−1074: rounds up to it (IEEE 754 round to nearest)
    ["2.2250738585072011e-308", "0xfffffffffffff"], // the largest subnormal (IEEE 754 binary64)
    ["2.2250738585072014e-308", "0x10000000000000"], // the smallest normal, 2^−1022 (IEEE 754 binary64)
    ["1.7976931348623157e308", "0x7fefffffffffffff"], // the largest double (IEEE 754 binary64)
    ["9007199254740993", "0x4340000000000000"], // 2^53 + 1 ties to the even 2^53 (IEEE 754 round half to even)
    ["0.1", "0x3fb999999999999a"], // 1/10 (IEEE 754 binary64, from memory)
    ["-0", "0x8000000000000000"], // negative zero (ECMAScript StringToNumber)
    ["0e400", "0x0"], // zero with any exponent is zero, worked by hand
  ])("reads %j with the bits %s", (text, hex) => {
    expect(bitsOf(parseNumber(text))).toBe(BigInt(hex));
    expect(bitsOf(Number(text))).toBe(BigInt(hex)); // the same from Number()
    expect(bitsOf(exactDecimalText(text))).toBe(BigInt(hex)); // the same from exact BigInt rounding (exactDecimal.ts)
  });

  it.each(["1.7976931348623159e308", "1e309", "-1e400"])("reads %j, past the largest double, as NaN (Number() gives ±Infinity)", (text) => {
    expect(parseNumber(text)).toBeNaN();
  });
});

describe("parseNumber against the plain pattern (the reader's definition of a number, written out here)", () => {
  // Reference: the anchored pattern with white space around, then Number(), finite only (the reader before the fast path).
  const reference = (cell: string, decimal: "." | ","): number => {
    const pattern = decimal === "," ? /^\s*[+-]?(?:\d+,?\d*|,\d+)(?:[eE][+-]?\d+)?\s*$/ : /^\s*[+-]?(?:\d+\.?\d*|\.\d+)(?:[eE][+-]?\d+)?\s*$/;
    if (!pattern.test(cell)) return NaN;
    const value = Number(decimal === "," ? cell.replace(",", ".") : cell);
    return Number.isFinite(value) ? value : NaN;
  };
  const unit = fc.constantFrom(..."0123456789", "+", "-", ".", ",", "e", "E", "x", " ", "\t", "\u00a0", "\ufeff", "I", "n");

  it("random strings of digits, signs, marks, exponents, letters and white space (ASCII and not) read with the reference's bits in both modes", () => {
    fc.assert(
      fc.property(fc.string({ unit, maxLength: 12 }), fc.constantFrom("." as const, "," as const), (cell, decimal) => {
        expect(bitsOf(parseNumber(cell, decimal))).toBe(bitsOf(reference(cell, decimal)));
      }),
      { numRuns: 30_000, seed: 1234 },
    );
  });
});
