import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { selectFeatures } from "../../../src/core/table/selectFeatures.ts";
import { readInPieces } from "./readerSupport.ts";

// Raw pieces with no quoting discipline: stray quotes, huge and tiny numbers, tokens, line ends.
const piece = fc.oneof(
  { weight: 4, arbitrary: fc.integer({ min: -99_999, max: 99_999 }).map(String) },
  { weight: 2, arbitrary: fc.constantFrom("1e308", "-1e308", "1e400", "4.9e-324", "123456789012345678901234567890", "0.1", "-0", "1,5", "12,75") },
  { weight: 2, arbitrary: fc.constantFrom("", "NA", "NaN", "Inf", "-inf", "#N/A", "?", "-", "null", " ") },
  { weight: 2, arbitrary: fc.string({ unit: fc.constantFrom("a", "z", "é", " ", "'", "=") , maxLength: 6 }) },
  { weight: 1, arbitrary: fc.constantFrom('"', '""', '"x"', '"a,b"', '"p\nq"', 'x"y', '"open') },
);
const delimiter = fc.constantFrom(",", ";", "\t", "|");
const lineEnd = fc.constantFrom("\n", "\r\n", "\r");

/** A file as a list of records of raw pieces, joined with random delimiters per record and random line ends. */
const file = fc
  .record({
    bom: fc.boolean(),
    delimiter,
    otherDelimiter: delimiter,
    records: fc.array(fc.record({ cells: fc.array(piece, { maxLength: 7 }), end: lineEnd, blank: fc.nat(3), odd: fc.nat(9) }), { maxLength: 14 }),
    trailingEnd: fc.boolean(),
  })
  .map(({ bom, delimiter, otherDelimiter, records, trailingEnd }) => {
    const body = records
      .map((r) => r.cells.join(r.odd === 0 ? otherDelimiter : delimiter) + r.end + r.end.repeat(r.blank === 0 ? 1 : 0))
      .join("");
    return (bom ? "\ufeff" : "") + (trailingEnd ? body : body.replace(/[\r\n]+$/, ""));
  });

const options = fc.record({ ragged: fc.constantFrom("reject" as const, "pad" as const) }, { requiredKeys: [] });

describe("createTableReader: fuzz", () => {
  it("2,000 generated files each end in a complete table and report, or one plain Error with a lowercase message; read = used + dropped", () => {
    let tables = 0;
    const errors = new Map<string, number>();
    fc.assert(
      fc.property(file, options, fc.array(fc.nat(), { maxLength: 6 }), (text, readOptions, cuts) => {
        const result = readInPieces(text, cuts.map((c) => c % (text.length + 1)), readOptions); // rethrows anything but a plain Error
        expect(result).toEqual(readInPieces(text, [], readOptions)); // and any chunking reads the same
        if ("error" in result) {
          errors.set(result.error.replace(/[\d"].*$/, ""), (errors.get(result.error.replace(/[\d"].*$/, "")) ?? 0) + 1);
          expect(result.error).toMatch(/^[^A-Z\s]/);
          return;
        }
        tables++;
        const { table, report } = result;
        expect(report.rows).toBe(table.rows);
        expect(report.columns.map((c) => c.name)).toEqual(table.columns.map((c) => c.name));
        for (const [j, column] of table.columns.entries()) {
          expect(column.numbers.length).toBe(table.rows);
          if (column.texts) expect(column.texts.length).toBe(table.rows);
          if (column.categories) expect(column.categories.codes.length).toBe(table.rows);
          expect(report.columns[j]!.missing).toBe(column.missing);
          if (column.kind === "numeric") expect(column.numbers.filter(Number.isNaN).length).toBe(column.missing);
        }
        const numeric = table.columns.filter((c) => c.kind === "numeric").map((c) => c.name);
        for (const policy of ["drop", "median", "mean"] as const) {
          if (numeric.length === 0) break;
          const { missing, usedRows, droppedRows } = selectFeatures(table, numeric, policy);
          expect(missing.read).toBe(missing.used + missing.dropped);
          expect(usedRows.length + droppedRows.length).toBe(table.rows);
        }
      }),
      { numRuns: 2000 },
    );
    expect(tables).toBeGreaterThan(100); // the generator must also make readable files
    if (process.env.SHOAL_FUZZ_STATS) console.log(tables, errors);
  });
});
