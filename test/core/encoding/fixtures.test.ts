import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { decodeWindows1252 } from "../../../src/core/encoding/decodeWindows1252.ts";
import { detectEncoding } from "../../../src/core/encoding/detectEncoding.ts";
import { createTableReader } from "../../../src/core/table/createTableReader.ts";
import type { ReadOutcome } from "../../../src/core/table/tableReport.ts";
import { assertClose } from "../../assertClose.ts";

/** Bytes to table the way the worker and the headless command are meant to: detect, decode in 16-byte pieces, push. */
function readFixture(name: string): ReadOutcome & { encoding: string } {
  const bytes = new Uint8Array(readFileSync(new URL(`../../fixtures/${name}`, import.meta.url)));
  const { encoding, bomLength } = detectEncoding(bytes.subarray(0, 65_536), bytes.length <= 65_536);
  const utf8 = new TextDecoder("utf-8");
  const reader = createTableReader();
  for (let at = bomLength; at < bytes.length; at += 16) {
    const piece = bytes.subarray(at, at + 16);
    reader.push(encoding === "windows-1252" ? decodeWindows1252(piece) : utf8.decode(piece, { stream: true }));
  }
  if (encoding === "utf-8") reader.push(utf8.decode());
  return { ...reader.finish(), encoding };
}

describe("fixture files, bytes to table", () => {
  it("semicolon-decimal-comma-1252.csv: windows-1252, ';' and ',' detected, accents and € decoded, a quoted CRLF kept as \\n", () => {
    const { table, report, encoding } = readFixture("semicolon-decimal-comma-1252.csv");
    expect(encoding).toBe("windows-1252");
    expect(report.format).toMatchObject({ delimiter: ";", decimal: "," });
    expect(table.columns.map((c) => c.name)).toEqual(["town", "temperature °C", "rain mm", "note"]);
    expect(table.columns[0]!.texts).toEqual(["Kölnbrück", "Düsterau", "Œland", "Zürichsee", "Ålborgby"]); // fixture README
    assertClose(table.columns[1]!.numbers, [12.5, -1.25, 7, NaN, 3.75]);
    assertClose(table.columns[2]!.numbers, [0.8, NaN, 1.5, 2.25, 0]);
    expect(table.columns[3]!.texts).toEqual(["light – showers", "frost; clear", "price € 5", "two\nlines", "ok"]);
    expect(report.columns[1]!.flagged).toEqual([{ row: 4, line: 5, column: "temperature °C", text: "NA", reason: "missing-token" }]);
    expect(report.lines).toBe(7); // 6 records, one of them over two lines (fixture README)
  });

  it("bom-utf8.tsv: the byte-order mark skipped, tab detected, a quoted tab and newline kept", () => {
    const { table, report, encoding } = readFixture("bom-utf8.tsv");
    expect(encoding).toBe("utf-8");
    expect(report.format).toMatchObject({ delimiter: "\t", decimal: "." });
    expect(table.columns.map((c) => c.name)).toEqual(["name", "score", "group"]);
    expect(table.columns[0]!.texts).toEqual(["Amélie", "Bo\tand\nco", "Chloé"]);
    assertClose(table.columns[1]!.numbers, [0.5, 1.25, NaN]);
  });
});
