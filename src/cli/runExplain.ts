import { regionSides, regionTable, regionTableCsv, type RegionTable } from "../core/index.ts";
import { buildFromFile } from "./buildFromFile.ts";
import type { ExplainCommand } from "./parseExplainArgs.ts";
import { chosenRows } from "./regionArgs.ts";
import { writeFileWhole } from "./writeFileWhole.ts";
import { recipeOfRun, recipeRegionRows, recipeToSave, saveRecipe } from "./recipeOfRun.ts";

/**
 * Builds as `shoal build` does, then writes the region table (`regionTable`) of the chosen rows
 * against the rest of the used rows, or against a second set: the CSV on standard output, or with
 * --out a one-line account after the CSV is written beside the destination and moved into place.
 * The region is chosen by looking at the data, so its p-values describe; they do not confirm.
 */
export async function runExplain(command: ExplainCommand): Promise<string> {
  const { table, result, fileName, fingerprint } = await buildFromFile(command);
  const recipe = recipeToSave(command.recipe, () =>
    recipeOfRun(command, { fileName, fingerprint: fingerprint!, read: command.read, params: result.params, regions: recipeRegionRows(command.recipe, result.rowsRead) }),
  );
  const region = chosenRows(command.region, result);
  const versus = command.versus ? chosenRows(command.versus, result) : undefined;
  const sides = regionSides(result.rowsRead, result.usedRows, region, versus);
  if (versus && (sides.inside.length === 0 || sides.outside.length === 0)) {
    const empty = sides.inside.length === 0 ? (sides.outside.length === 0 ? "both sides are" : "the first set is") : "the second set is";
    throw new Error(`${empty} empty after leaving out the ${rows(sides.inBoth)} in both sets`);
  }
  const explained = regionTable(table, sides, { labelColumn: command.idColumn });
  const csv = regionTableCsv(explained);
  const notes = [
    `${rows(explained.rowsInside)} inside, ${explained.rowsOutside} ${command.versus ? "in the second set" : "outside"}`,
    ...(explained.inBoth > 0 ? [`${rows(explained.inBoth)} in both left out`] : []),
    `${rows(explained.rowsUnused)} left out of the build${explained.regionRowsUnused > 0 ? ` (${explained.regionRowsUnused} of them chosen)` : ""}`,
    ...flagged(explained),
    ...(explained.skipped.length > 0 ? [`not tested: ${explained.skipped.map((s) => `${s.column} (${s.reason})`).join(", ")}`] : []),
  ].join("; ");
  if (command.outFile === null) {
    const saved = await saveRecipe(command.recipe, recipe);
    console.error(`shoal: ${notes}${saved}`);
    return csv;
  }
  await writeFileWhole(command.outFile, csv);
  const saved = await saveRecipe(command.recipe, recipe);
  return `${explained.lines.length} columns compared; ${notes}; wrote ${command.outFile}${saved}\n`;
}

const rows = (n: number): string => `${n} ${n === 1 ? "row" : "rows"}`;

// The CSV has no column for it, so the note names the chi-squared lines whose approximation is poor.
function flagged(table: RegionTable): string[] {
  const names = table.lines.filter((line) => line.kind === "categorical" && line.hasSmallExpected).map((line) => line.column);
  return names.length > 0 ? [`chi-squared with an expected count below 5: ${names.join(", ")}`] : [];
}
