import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { csvLine, csvNumber, csvText, parseCsvText, parseNumber } from "../../../src/core/index.ts";

describe("csvNumber", () => {
  it("writes the shortest round-trip form and NaN as an empty cell", () => {
    expect(csvNumber(0.1)).toBe("0.1");
    expect(csvNumber(-2.5)).toBe("-2.5"); // numbers are never prefixed
    expect(csvNumber(1e21)).toBe("1e+21");
    expect(csvNumber(NaN)).toBe("");
  });

  it("reads back exactly: Number(csvNumber(x)) === x for random finite doubles, negatives included", () => {
    fc.assert(
      fc.property(fc.double({ noNaN: true, noDefaultInfinity: true }), (x) => {
        expect(Number(csvNumber(x)) === x).toBe(true); // −0 is written "0", which === −0
      }),
    );
  });

  it("reads back exactly through Shoal's own parseNumber too", () => {
    fc.assert(
      fc.property(fc.double({ noNaN: true, noDefaultInfinity: true }), (x) => {
        expect(parseNumber(csvNumber(x)) === x).toBe(true);
      }),
    );
  });
});

// OWASP, "CSV Injection" (owasp.org/www-community/attacks/CSV_Injection): a cell starting with
// =, +, -, @, tab or carriage return may run as a formula, so it is prefixed with a single quote.
describe("csvText neutralises formula starts (OWASP, CSV Injection)", () => {
  it.each([
    ["=1+2", "'=1+2"],
    ["+1", "'+1"],
    ["-1", "'-1"],
    ["@SUM(A1)", "'@SUM(A1)"],
    ["\tcmd", "'\tcmd"],
  ])("%j becomes %j", (cell, written) => {
    expect(csvText(cell)).toBe(written);
  });

  it("a carriage return at the start is neutralised and, being a line break, quoted", () => {
    expect(csvText("\rcmd")).toBe("\"'\rcmd\"");
  });

  it("leaves plain text and a formula sign later in the cell alone", () => {
    expect(csvText("abc")).toBe("abc");
    expect(csvText("a=b")).toBe("a=b");
    expect(csvText("")).toBe("");
  });
});

describe("csvText quoting (RFC 4180)", () => {
  it("quotes commas, quotes (doubled) and newlines", () => {
    expect(csvText("a,b")).toBe('"a,b"');
    expect(csvText('say "hi"')).toBe('"say ""hi"""');
    expect(csvText("two\nlines")).toBe('"two\nlines"');
  });

  it("neutralises then quotes: =a,b becomes \"'=a,b\"", () => {
    expect(csvText("=a,b")).toBe("\"'=a,b\"");
  });

  it("a quoted cell reads back through parseCsvText as the same text (after the neutralising quote)", () => {
    fc.assert(
      fc.property(fc.string({ unit: fc.constantFrom("a", "b", ",", '"', "\n", " ", "=", "-", "1") }), (text) => {
        const cell = csvText(text);
        // a second record "word" keeps the column a text column, so the raw cell text is kept
        const read = parseCsvText(`h,k\n${cell},z\nword,z\n`).columns[0]!;
        const expected = /^[=+\-@\t\r]/.test(text) ? `'${text}` : text;
        expect(read.texts?.[0]).toBe(expected);
      }),
    );
  });
});

describe("csvLine", () => {
  it("joins cells with commas and ends with a newline", () => {
    expect(csvLine(["a", "1", ""])).toBe("a,1,\n");
  });
});
