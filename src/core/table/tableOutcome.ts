import { finishColumn } from "./finishColumn.ts";
import type { RaggedPolicy } from "./readOptions.ts";
import type { RecordSink } from "./recordSink.ts";
import type { ColumnReport, Notice, ReadOutcome, TableFormat } from "./tableReport.ts";
import type { TableColumn } from "./types.ts";
import { uniqueNames } from "./uniqueNames.ts";

/**
 * The end of a read: checks the whole-file conditions and turns the column builders into the
 * table and its report. Decisions:
 * - no record, or a blank header with no data → "the file is empty";
 * - a header and no data record → error; one data record → a table, with a notice;
 * - ragged records → error under "reject" (rows and lines named), padded or cut with a notice under "pad";
 * - no numeric column → a table, with a notice (features can still come from categories).
 */
export function tableOutcome(sink: RecordSink, format: TableFormat, ragged: RaggedPolicy): ReadOutcome {
  const header = sink.header;
  if (header === null || (sink.rows === 0 && header.every((cell) => cell.trim() === ""))) throw new Error("the file is empty");
  if (sink.rows === 0) throw new Error("the file has a header but no data records");
  const width = header.length;
  const notices: Notice[] = [];
  if (sink.raggedCount > 0) {
    const shown = sink.ragged.map((r) => `row ${r.row} has ${r.fields} fields`).join(", ");
    const more = sink.raggedCount > sink.ragged.length ? ` and ${sink.raggedCount - sink.ragged.length} more` : "";
    const lines = `(line${sink.ragged.length > 1 ? "s" : ""} ${sink.ragged.map((r) => r.line).join(", ")})`;
    if (ragged === "reject") throw new Error(`ragged records: the header has ${width} fields but ${shown}${more} ${lines}`);
    notices.push({ code: "ragged-records", message: `padded short records with empty cells and cut long ones to the header's ${width} fields: ${shown}${more} ${lines}` });
  }
  if (sink.emptyLines > 0) {
    const lines = `${sink.emptyLines} wholly empty line${sink.emptyLines === 1 ? "" : "s"}`;
    notices.push({ code: "empty-lines", message: `skipped ${lines}: not records, so record k is on spreadsheet row k + 1 plus the empty lines above it` });
  }
  const named = uniqueNames(header);
  notices.push(...named.notices);
  if (sink.malformedCount > 0) {
    const where = sink.malformed.map((m) => `row ${m.row} (line ${m.line})`).join(", ");
    notices.push({ code: "malformed-quotes", message: `a quote inside an unquoted field or after a closing quote was read as text in ${where}${sink.malformedCount > sink.malformed.length ? ` and ${sink.malformedCount - sink.malformed.length} more` : ""}` });
  }
  const columns: TableColumn[] = [];
  const reports: ColumnReport[] = [];
  for (let j = 0; j < width; ++j) {
    const finished = finishColumn(sink.builders[j]!, named.names[j]!, header[j]!);
    columns.push(finished.column);
    reports.push(finished.report);
    if (finished.reformatted) notices.push({ code: "texts-reformatted", message: `column ${finished.column.name} became text after many numbers: its numbers are shown in shortest form` });
  }
  notices.push(...tableNotices(sink.rows, reports, format));
  return { table: { rows: sink.rows, columns }, report: { format, rows: sink.rows, lines: sink.line - 1, emptyLines: sink.emptyLines, columns: reports, notices } };
}

/** Notices about the table as a whole, shared with the Parquet reader. */
export function tableNotices(rows: number, reports: readonly ColumnReport[], format: TableFormat): Notice[] {
  const notices: Notice[] = [];
  if (rows === 1) notices.push({ code: "one-row", message: "the table has one data record: it can be shown, but scaling and a graph need at least two" });
  const rowNumbers = reports.filter((r) => r.looksLikeRowNumber).map((r) => r.name);
  if (rowNumbers.length > 0) {
    const which = rowNumbers.length === 1 ? `column ${rowNumbers[0]} looks` : `columns ${rowNumbers.join(", ")} look`;
    notices.push({ code: "row-number-column", message: `${which} like a row number or numeric id (distinct whole numbers): suggested role "row label", not a feature` });
  }
  if (!reports.some((r) => r.type === "numeric")) {
    const read = format.kind === "delimited" ? ` (read with delimiter ${JSON.stringify(format.delimiter)} and decimal mark ${JSON.stringify(format.decimal)})` : "";
    notices.push({ code: "no-numeric-column", message: `no numeric column among ${reports.map((r) => r.name).join(", ")}${read}` });
  }
  return notices;
}
