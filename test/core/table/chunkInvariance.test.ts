import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { readInPieces } from "./readerSupport.ts";

// Cells that exercise quoting, line breaks inside quotes, decimal commas, tokens and text.
const cell = fc.oneof(
  fc.integer({ min: -1000, max: 1000 }).map(String),
  fc.double({ noNaN: true, noDefaultInfinity: true }).map(String),
  fc.constantFrom("", "NA", "Inf", "1,5", "x", "None", " 7 "),
  fc.string({ unit: fc.constantFrom("a", "b", ",", ";", "\t", '"', "\n", "\r", " ", "1") }),
);
const quote = (text: string): string => (/[,;\t|"\r\n]/.test(text) || text.trim() !== text ? `"${text.replaceAll('"', '""')}"` : text);

const table = fc
  .record({
    delimiter: fc.constantFrom(",", ";", "\t", "|"),
    lineEnd: fc.constantFrom("\n", "\r\n", "\r"),
    bom: fc.boolean(),
    width: fc.integer({ min: 1, max: 5 }),
    rows: fc.integer({ min: 0, max: 30 }),
  })
  .chain((shape) =>
    fc.record({
      shape: fc.constant(shape),
      cells: fc.array(fc.array(cell, { minLength: shape.width, maxLength: shape.width }), { minLength: shape.rows + 1, maxLength: shape.rows + 1 }),
      blankAfter: fc.array(fc.boolean(), { minLength: shape.rows + 1, maxLength: shape.rows + 1 }),
    }),
  )
  .map(({ shape, cells, blankAfter }) => {
    const lines = cells.map((record, r) => record.map(quote).join(shape.delimiter) + shape.lineEnd + (blankAfter[r] ? shape.lineEnd : ""));
    return (shape.bom ? "\ufeff" : "") + lines.join("");
  });

describe("createTableReader: chunk invariance", () => {
  it("the same text in any chunking gives an identical table and report, or the identical error", () => {
    fc.assert(
      fc.property(table, fc.array(fc.nat(), { maxLength: 12 }), (text, cuts) => {
        const whole = readInPieces(text);
        const pieces = readInPieces(text, cuts.map((c) => c % (text.length + 1)));
        expect(pieces).toEqual(whole);
      }),
      { numRuns: 300 },
    );
  });

  it("one character at a time gives the same outcome as one push, across the 64 Ki characters held for detection", () => {
    const row = 'a;"b;1\n2";3,25;NA;x\r\n';
    const text = `h1;h2;h3;h4;h5\r\n${row.repeat(3400)}`; // 68,015 characters
    const cuts = Array.from({ length: text.length }, (_, i) => i);
    expect(readInPieces(text, cuts)).toEqual(readInPieces(text));
  });
});
