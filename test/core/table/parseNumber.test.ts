import { describe, expect, it } from "vitest";
import { isMissingToken, parseNumber } from "../../../src/core/index.ts";

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
