import { cellText, csvLine, csvNumber, csvQuoted, csvText, exportChunkLength, type HotspotScan, type ParsedTable } from "../core/index.ts";

export const hotspotsHeader = ["rank", "nodes", "n_inside", "n_outside", "inside", "outside", "difference", "ci_low", "ci_high", "score", "p", "seed_share", "search"] as const;

/** hotspots.csv: one line per hotspot, best first; nodes 1-based separated by spaces; numbers in their shortest round-trip form; seed_share empty when not run. */
export function hotspotsCsv(scan: HotspotScan): string {
  const lines = [csvLine([...hotspotsHeader])];
  for (const h of scan.hotspots) {
    const nodes = Array.from(h.nodes, (node) => node + 1).join(" ");
    lines.push(csvLine([String(h.rank), nodes, String(h.nInside), String(h.nOutside), ...[h.inside, h.outside, h.difference, h.ciLow, h.ciHigh, h.score, h.p].map(csvNumber), h.seedShare === null ? "" : csvNumber(h.seedShare), h.search]));
  }
  return lines.join("");
}

/**
 * hotspot-rows.csv: `rank, row` and the row label column when one is chosen, one line per scanned
 * row of each hotspot; row = record number (0-based row + 1); a numeric label is written as read,
 * a text label as safe text (as members.csv does). Pieces of about `exportChunkLength` characters, for `writeFileSet`.
 */
export function hotspotRowsCsv(scan: HotspotScan, parsed: ParsedTable, idColumn: string | null): Iterable<string> {
  const column = idColumn === null ? null : parsed.columns.find((c) => c.name === idColumn);
  if (idColumn !== null && !column) throw new Error(`unknown column: ${idColumn}`);
  const label = column ? (row: number): string => (column.texts ? csvText(column.texts[row]!) : csvQuoted(cellText(column, row))) : null;
  return (function* pieces(): Generator<string> {
    // streamed in pieces (half the rows of a large table can be in hotspots), never one string
    let text = csvLine(["rank", "row", ...(column ? [csvText(column.name)] : [])]);
    for (const h of scan.hotspots) {
      for (const row of h.rows) {
        text += csvLine([String(h.rank), String(row + 1), ...(label ? [label(row)] : [])]);
        if (text.length >= exportChunkLength) {
          yield text;
          text = "";
        }
      }
    }
    yield text;
  })();
}
