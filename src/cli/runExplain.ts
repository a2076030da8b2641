import { rename, rm, writeFile } from "node:fs/promises";
import { regionSides, regionTable, regionTableCsv } from "../core/index.ts";
import { buildFromFile } from "./buildFromFile.ts";
import type { ExplainCommand } from "./parseExplainArgs.ts";
import { chosenRows } from "./regionArgs.ts";

/**
 * Builds as `shoal build` does, then writes the region table (`regionTable`) of the chosen rows
 * against the rest of the used rows, or against a second set: the CSV on standard output, or with
 * --out a one-line account after the CSV is written beside the destination and moved into place.
 * The region is chosen by looking at the data, so its p-values describe; they do not confirm.
 */
export async function runExplain(command: ExplainCommand): Promise<string> {
  const { table, result } = await buildFromFile(command);
  const region = chosenRows(command.region, result);
  const versus = command.versus ? chosenRows(command.versus, result) : undefined;
  const sides = regionSides(result.rowsRead, result.usedRows, region, versus);
  const explained = regionTable(table, sides, { labelColumn: command.idColumn });
  const csv = regionTableCsv(explained);
  const notes = [
    `${explained.rowsInside} rows inside, ${explained.rowsOutside} ${command.versus ? "in the second set" : "outside"}`,
    ...(explained.inBoth > 0 ? [`${explained.inBoth} rows in both left out`] : []),
    `${explained.rowsUnused} rows left out of the build${explained.regionRowsUnused > 0 ? ` (${explained.regionRowsUnused} of them chosen)` : ""}`,
    ...(explained.skipped.length > 0 ? [`not tested: ${explained.skipped.map((s) => `${s.column} (${s.reason})`).join(", ")}`] : []),
  ].join("; ");
  if (command.outFile === null) {
    console.error(`shoal: ${notes}`);
    return csv;
  }
  const staging = `${command.outFile}.partial-${process.pid}`;
  try {
    await writeFile(staging, csv);
    await rename(staging, command.outFile);
  } catch (error) {
    await rm(staging, { force: true });
    throw new Error(`cannot write ${command.outFile}: ${error instanceof Error ? error.message : String(error)}`, { cause: error });
  }
  return `${explained.lines.length} columns compared; ${notes}; wrote ${command.outFile}\n`;
}
