import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { distinctCap } from "../../../src/core/table/readOptions.ts";
import { bitsOf } from "./exactDecimal.ts";
import { readInPieces, type Result } from "./readerSupport.ts";

// The reader splits quote-free lines itself and reads numbers where they lie (RecordSink.takePlain,
// ColumnBuilder.takeNumberAt); createTableReader(options, false) sends every record through papaparse
// and every cell through ColumnBuilder.push. These tests hold the two to the same outcome.

// A long first part puts columns in each of the builder's forms before the random part comes:
// "decimal" and "integer" columns pass distinctCap distinct numbers and keep only odd texts ("sparse"),
// where cells are read in place; "text" keeps every text ("list"); "few" (numbers) and "category"
// (texts) stay dictionaries, where repeated texts are found from their spans.
const prefixKinds = ["decimal", "integer", "text", "few", "category"] as const;
type PrefixKind = (typeof prefixKinds)[number];
const prefixRows = distinctCap + 50;

function prefixCell(kind: PrefixKind, row: number, column: number, comma: boolean): string {
  if (kind === "decimal") return `${row - 5000}${comma ? "," : "."}${column}25`;
  if (kind === "integer") return String(row * 3 - 7000);
  if (kind === "text") return `id-${row}`;
  if (kind === "category") return ["north", "south", "NA", "", "east-by-north-east"][row % 5]!;
  return String(row % 7);
}

// Random cells: numbers the fast path reads, ones it leaves to Number(), integers not in shortest form,
// white space, tokens, text, quoted fields (with delimiters and line breaks inside), empty cells.
const cell = (comma: boolean) =>
  fc.oneof(
    { weight: 4, arbitrary: fc.double({ noNaN: true, noDefaultInfinity: true, min: -1e6, max: 1e6 }).map((x) => (comma ? String(x).replace(".", ",") : String(x))) },
    { weight: 2, arbitrary: fc.double({ noNaN: true }).map((x) => (comma ? x.toPrecision(17).replace(".", ",") : x.toPrecision(17))) },
    { weight: 2, arbitrary: fc.integer({ min: -100_000, max: 100_000 }).map(String) },
    { weight: 2, arbitrary: fc.constantFrom("007", "+5", "-0", "0", "1e5", "1E400", "-1e-400", " 7 ", "12345678901234567890", "5.", ".5", "1,5", "1.5", "0x10", "1e", "+", "") },
    { weight: 2, arbitrary: fc.constantFrom("NA", "Inf", "-inf", "#N/A", "?", "-", "null", "None", "abc", "é", "  ") },
    { weight: 1, arbitrary: fc.constantFrom('"1.5"', '"a,b"', '"p\nq"', '"x;y"', '""', 'x"y', '"say ""hi"""') },
  );

const file = fc
  .record({
    delimiter: fc.constantFrom(",", ";", "\t", "|"),
    comma: fc.boolean(),
    kinds: fc.array(fc.constantFrom(...prefixKinds), { minLength: 1, maxLength: 5 }),
    lineEnd: fc.constantFrom("\n", "\r\n"),
  })
  .chain((shape) =>
    fc.record({
      shape: fc.constant(shape),
      tail: fc.array(
        fc.record({
          cells: fc.array(cell(shape.comma && shape.delimiter !== ","), { minLength: Math.max(0, shape.kinds.length - 1), maxLength: shape.kinds.length + 1 }),
          blankAfter: fc.nat(5),
        }),
        { maxLength: 40 },
      ),
      at: fc.nat(prefixRows),
      finalEnd: fc.boolean(),
    }),
  )
  .map(({ shape, tail, at, finalEnd }) => {
    const comma = shape.comma && shape.delimiter !== ",";
    const lines = [shape.kinds.map((_, j) => `h${j + 1}`).join(shape.delimiter)];
    for (let row = 0; row < prefixRows; ++row) lines.push(shape.kinds.map((kind, j) => prefixCell(kind, row, j, comma)).join(shape.delimiter));
    // The random records go at the end and, in some files, also in the middle of the long part.
    const records = tail.flatMap((r) => [r.cells.join(shape.delimiter), ...(r.blankAfter === 0 ? [""] : [])]);
    lines.splice(at % 2 === 0 ? lines.length : 1 + (at % prefixRows), 0, ...records);
    return { text: lines.join(shape.lineEnd) + (finalEnd ? shape.lineEnd : ""), options: { delimiter: shape.delimiter, decimal: comma ? "," : "." } as const };
  });

function expectSameOutcome(plain: Result, reference: Result): void {
  expect(plain).toEqual(reference);
  if ("error" in plain || "error" in reference) return;
  for (const [j, column] of plain.table.columns.entries()) {
    const other: Float64Array = reference.table.columns[j]!.numbers;
    for (let i = 0; i < column.numbers.length; ++i) if (bitsOf(column.numbers[i]!) !== bitsOf(other[i]!)) expect.fail(`row ${i} of column ${column.name}: ${column.numbers[i]} read in place, ${other[i]} by papaparse`);
  }
}

describe("createTableReader: quote-free lines read in place", () => {
  it("random tables (quoted, ragged, missing, mixed kinds, 17-digit and odd numbers; columns in every form) read in random pieces give the outcome papaparse gives, to the bit", () => {
    fc.assert(
      fc.property(file, fc.constantFrom("reject" as const, "pad" as const), fc.array(fc.nat(), { maxLength: 5 }), ({ text, options }, ragged, cuts) => {
        const plain = readInPieces(text, cuts.map((c) => c % (text.length + 1)), { ...options, ragged });
        expectSameOutcome(plain, readInPieces(text, [], { ...options, ragged }, false));
      }),
      { numRuns: 20, seed: 4180 },
    );
  });

  it("with the delimiter and decimal mark detected, a 17-digit numeric column reads in place with the bits of Number() for every cell", () => {
    const values = Array.from({ length: prefixRows }, (_, i) => (Math.sin(i + 1) * 10 ** ((i % 9) - 4)).toPrecision(17));
    const text = `a;b\n${values.map((v, i) => `${v.replace(".", ",")};${i}`).join("\n")}\n`;
    const result = readInPieces(text);
    if ("error" in result) throw new Error(result.error);
    const numbers = result.table.columns[0]!.numbers;
    for (let i = 0; i < values.length; ++i) if (bitsOf(numbers[i]!) !== bitsOf(Number(values[i]))) expect.fail(`row ${i}: ${numbers[i]} for ${values[i]}`); // reference: Number()
    expectSameOutcome(result, readInPieces(text, [], {}, false));
  });

  it("with a comma both as delimiter and as decimal mark, 1,5 is two cells in place as in papaparse", () => {
    const text = `a,b\n${Array.from({ length: prefixRows }, (_, i) => `${i},${2 * i}`).join("\n")}\n1,5\n`;
    const plain = readInPieces(text, [], { delimiter: ",", decimal: "," });
    expectSameOutcome(plain, readInPieces(text, [], { delimiter: ",", decimal: "," }, false));
    if ("error" in plain) throw new Error(plain.error);
    expect(plain.table.columns[1]!.numbers.at(-1)).toBe(5); // the last record's second cell, worked by hand
  });
});
