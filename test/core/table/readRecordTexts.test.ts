import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { cellText } from "../../../src/core/table/cellText.ts";
import { readRecordTexts } from "../../../src/core/table/readRecordTexts.ts";
import { readTableBytes, type ByteSource } from "../../../src/core/table/readTableBytes.ts";

const utf8 = () => {
  const decoder = new TextDecoder("utf-8", { fatal: true });
  return (bytes: Uint8Array, last: boolean) => decoder.decode(bytes, { stream: !last });
};
const sourceOf = (bytes: Uint8Array): ByteSource => ({ size: bytes.length, read: async (start, end) => bytes.subarray(start, end) });
const every = (n: number): number[] => Array.from({ length: n }, (_, k) => k);

// Blank lines before the header and between records, a quoted line break, CRLF ends, a quoted comma,
// and cells a number reader would reformat: 007, 20 digits, -5, +3.2, a formula.
const text =
  "\r\n\r\nid,code,note,value\r\n" +
  'a,007,"two\r\nlines",-5\r\n' +
  "\r\n" +
  'b,12345678901234567890,"x, y",+3.2\r\n' +
  "\r\n\r\n" +
  "c,=1+1,plain,1e3\r\n" +
  'd,08,"three\nline\nnote",NA\r\n';

describe("readRecordTexts", () => {
  it("numbers records as the build's reader does: record k is table row k − 1 (its text cells agree), for every chunk size", async () => {
    const bytes = new TextEncoder().encode(text);
    const { table } = await readTableBytes(sourceOf(bytes), {}, { utf8 });
    expect(table.rows).toBe(4);
    for (const chunkBytes of [1, 3, 7, 64, 1 << 22]) {
      const texts = await readRecordTexts(sourceOf(bytes), every(4), { delimiter: "," }, { utf8, chunkBytes });
      for (let row = 0; row < 4; ++row) {
        // text columns keep their cells whole in the table; numeric cells are checked as written below
        const textColumns = table.columns.flatMap((c, j) => (c.kind === "text" ? [j] : []));
        expect(textColumns.length).toBe(3);
        expect(textColumns.map((j) => texts.get(row)![j]), `row ${row} in chunks of ${chunkBytes}`).toEqual(textColumns.map((j) => cellText(table.columns[j]!, row)));
      }
    }
  });

  it("keeps each cell exactly as written: 007, all 20 digits, -5, +3.2, =1+1, and a quoted line break as \\n", async () => {
    const texts = await readRecordTexts(sourceOf(new TextEncoder().encode(text)), [0, 1, 2], { delimiter: "," }, { utf8 });
    expect(texts.get(0)).toEqual(["a", "007", "two\nlines", "-5"]);
    expect(texts.get(1)).toEqual(["b", "12345678901234567890", "x, y", "+3.2"]);
    expect(texts.get(2)).toEqual(["c", "=1+1", "plain", "1e3"]);
  });

  it("returns only the wanted rows, skips rows past the end, and stops reading after the last wanted row", async () => {
    const bytes = new TextEncoder().encode(`x,y\n${every(1000).map((k) => `${k},${k}`).join("\n")}\n`);
    let reads = 0;
    const source: ByteSource = { size: bytes.length, read: async (start, end) => (reads++, bytes.subarray(start, end)) };
    const texts = await readRecordTexts(source, [2, 5, 4000], { delimiter: "," }, { utf8, chunkBytes: 16 });
    expect([...texts.keys()].sort()).toEqual([2, 5]);
    expect(texts.get(5)).toEqual(["5", "5"]);
    reads = 0;
    const stopping = await readRecordTexts(source, [2], { delimiter: "," }, { utf8, chunkBytes: 16 });
    expect(stopping.get(2)).toEqual(["2", "2"]);
    expect(reads).toBeLessThan(10); // the encoding probe and the 16-byte chunks up to record 3 (with its carry), not the ~560 of the file
  });

  it("in a file of one column an empty line is a record (a missing value), as the reader counts it", async () => {
    const bytes = new TextEncoder().encode("x\n1\n\n3\n");
    const { table } = await readTableBytes(sourceOf(bytes), {}, { utf8 });
    const texts = await readRecordTexts(sourceOf(bytes), every(3), { delimiter: "," }, { utf8 });
    expect(table.rows).toBe(3);
    expect([texts.get(0), texts.get(1), texts.get(2)]).toEqual([["1"], [""], ["3"]]);
  });

  it("pads a short record with empty cells and cuts a long one, as the pad policy reads them", async () => {
    const texts = await readRecordTexts(sourceOf(new TextEncoder().encode("a,b\n1\n2,3,4\n")), [0, 1], { delimiter: "," }, { utf8 });
    expect([texts.get(0), texts.get(1)]).toEqual([["1", ""], ["2", "3"]]);
  });

  it("reads a Windows-1252 file with semicolons and decimal commas as the reader does (fixture)", async () => {
    const bytes = new Uint8Array(readFileSync(new URL("../../fixtures/semicolon-decimal-comma-1252.csv", import.meta.url)));
    const { table, report } = await readTableBytes(sourceOf(bytes), {}, { utf8 });
    const delimiter = report.format.kind === "delimited" ? report.format.delimiter : ",";
    const texts = await readRecordTexts(sourceOf(bytes), every(table.rows), { delimiter }, { utf8, chunkBytes: 5 });
    for (let row = 0; row < table.rows; ++row) {
      expect(texts.get(row)!.filter((_, j) => table.columns[j]!.kind === "text")).toEqual(table.columns.filter((c) => c.kind === "text").map((c) => cellText(c, row)));
    }
    expect(texts.get(0)!.some((cell) => /^\d+,\d+$/.test(cell))).toBe(true); // a decimal comma kept as written
  });

  it("for Parquet gives each value in its shortest exact form, the table's cellText (fixture)", async () => {
    const bytes = new Uint8Array(readFileSync(new URL("../../fixtures/mixed-columns.parquet", import.meta.url)));
    const { table } = await readTableBytes(sourceOf(bytes), {}, { utf8 });
    const texts = await readRecordTexts(sourceOf(bytes), every(table.rows), { delimiter: "," }, { utf8 });
    for (let row = 0; row < table.rows; ++row) expect(texts.get(row)).toEqual(table.columns.map((c) => cellText(c, row)));
    expect(texts.get(0)![table.columns.findIndex((c) => c.name === "depth")]).toBe("1.5"); // the fixture's README: depth of s1 is 1.5
  });

  it("a shouldStop that answers true stops with Cancelled", async () => {
    await expect(readRecordTexts(sourceOf(new TextEncoder().encode(text)), [0], { delimiter: "," }, { utf8, shouldStop: () => true })).rejects.toThrow("reading the rows again was cancelled");
  });
});
