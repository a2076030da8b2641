import { coverExportChunks, coverSummary, graphml, regionRowsCsv } from "../core/index.ts";
import { buildFromFile } from "./buildFromFile.ts";
import type { BuildCommand } from "./parseBuildArgs.ts";
import { chosenRows } from "./regionArgs.ts";
import { readRegionTexts } from "./readRegionTexts.ts";
import { writeFileSet } from "./writeFileSet.ts";
import { recipeOfRun, recipeRegionRows, recipeToSave, saveRecipe } from "./recipeOfRun.ts";

/**
 * Reads the table through the same core parser as the workbench, builds, and writes the same
 * nodes.csv, members.csv, edges.csv and summary.json (the tables streamed piece by piece), and with
 * --region-nodes region-rows.csv (the region's rows with their cells read again from the file), and
 * with --graphml graph.graphml (the graph with nodes.csv's columns as attributes, and the regions'
 * flags when there are some). The files replace the previous set of
 * Shoal's files in the folder as a whole (`writeFileSet`), so a failure leaves the old set complete
 * and a run without a region removes an earlier region-rows.csv.
 */
export async function runBuild(command: BuildCommand): Promise<string> {
  const { table, report, fileName, fileSize, radius, result, reading, fingerprint, elapsed, readMs } = await buildFromFile(command);
  const kept = recipeRegionRows(command.recipe, result.rowsRead);
  if (command.region && kept.some((r) => r.name === command.region!.name)) throw new Error(`--region-name is the name of a region of the recipe: ${command.region.name}`);
  const regions = [...kept, ...(command.region ? [{ name: command.region.name, rows: chosenRows(command.region.choice, result) }] : [])];
  const context = { fileName, fileSize, idColumn: command.idColumn, outcomes: command.outcomes, reading, regions };
  const files = coverExportChunks(table, result, context);
  const summary = { ...coverSummary(result, context), timingsMs: { read: readMs, ...result.timings, total: elapsed } };
  const regionFiles: Record<string, string> = {};
  if (regions.length > 0) {
    const texts = await readRegionTexts(command.input, regions.flatMap((region) => Array.from(region.rows)), report.format, command.read);
    const decimal = report.format.kind === "delimited" ? report.format.decimal : ".";
    regionFiles["region-rows.csv"] = regionRowsCsv(regions, table.columns.map((c) => c.name), texts, decimal);
  }

  const recipe = recipeToSave(command.recipe, () => recipeOfRun(command, { fileName, fingerprint: fingerprint!, read: command.read, params: result.params, regions }));
  await writeFileSet(command.outDir, {
    "nodes.csv": files["nodes.csv"](),
    "members.csv": files["members.csv"](),
    "edges.csv": files["edges.csv"](),
    "summary.json": `${JSON.stringify(summary, null, 2)}\n`,
    ...regionFiles,
    ...(command.graphml ? { "graph.graphml": graphml(table, result, { outcomes: command.outcomes, regions }) } : {}),
  });
  const saved = await saveRecipe(command.recipe, recipe);
  const loops = result.betti ? `, b1 ${result.betti.b1}` : "";
  const count = (n: number, word: string): string => `${n} ${word}${n === 1 ? "" : "s"}`;
  const region = regions.map((r) => `; region ${r.name}: ${count(r.rows.length, "row")}`).join("");
  return `${count(result.landmarks.length, "node")}, ${count(result.edges.source.length, "edge")}, ${count(result.componentCount, "component")} (b0), cycle rank ${result.cycleRank}${loops} at radius ${radius}; rows used ${result.usedRows.length} of ${result.rowsRead}${region}; wrote ${command.outDir}${saved}`;
}
