import type { RegionTable } from "../regions/regionTable.ts";
import { csvLine, csvNumber, csvText } from "./csvCell.ts";

export const regionTableHeader = ["column", "kind", "test", "n_inside", "n_outside", "mean_inside", "mean_outside", "median_inside", "median_outside", "d", "statistic", "p", "p_adj"] as const;

/**
 * The region table as CSV, one line per tested column in the table's order: numbers in shortest
 * round-trip form, an empty cell where a figure does not apply (means, medians and d of a
 * categorical column) or is undefined (NaN).
 * @example regionTableCsv(table).split("\n")[0] // => "column,kind,test,n_inside,n_outside,mean_inside,mean_outside,median_inside,median_outside,d,statistic,p,p_adj"
 */
export function regionTableCsv(table: RegionTable): string {
  const lines = [csvLine(regionTableHeader)];
  for (const line of table.lines) {
    const numeric = line.kind === "numeric" ? [line.meanInside, line.meanOutside, line.medianInside, line.medianOutside, line.d].map(csvNumber) : ["", "", "", "", ""];
    lines.push(csvLine([csvText(line.column), line.kind, line.test, String(line.nInside), String(line.nOutside), ...numeric, csvNumber(line.statistic), csvNumber(line.p), csvNumber(line.pAdjusted)]));
  }
  return lines.join("");
}
