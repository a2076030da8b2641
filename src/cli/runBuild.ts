import { coverExportChunks, coverSummary, regionRowsCsv } from "../core/index.ts";
import { buildFromFile } from "./buildFromFile.ts";
import type { BuildCommand } from "./parseBuildArgs.ts";
import { chosenRows } from "./regionArgs.ts";
import { readRegionTexts } from "./readRegionTexts.ts";
import { writeFileSet } from "./writeFileSet.ts";

/**
 * Reads the table through the same core parser as the workbench, builds, and writes the same
 * nodes.csv, members.csv, edges.csv and summary.json (the tables streamed piece by piece), and with --region-nodes region-rows.csv (the
 * region's rows with their cells read again from the file). The files replace the previous set of
 * Shoal's files in the folder as a whole (`writeFileSet`), so a failure leaves the old set complete
 * and a run without a region removes an earlier region-rows.csv.
 */
export async function runBuild(command: BuildCommand): Promise<string> {
  const { table, report, fileName, fileSize, radius, result, reading, elapsed, readMs } = await buildFromFile(command);
  const regions = command.region ? [{ name: command.region.name, rows: chosenRows(command.region.choice, result) }] : [];
  const context = { fileName, fileSize, idColumn: command.idColumn, outcomes: command.outcomes, reading, regions };
  const files = coverExportChunks(table, result, context);
  const summary = { ...coverSummary(result, context), timingsMs: { read: readMs, ...result.timings, total: elapsed } };
  const regionFiles: Record<string, string> = {};
  if (regions.length > 0) {
    const texts = await readRegionTexts(command.input, regions.flatMap((region) => Array.from(region.rows)), report.format, command.read);
    const decimal = report.format.kind === "delimited" ? report.format.decimal : ".";
    regionFiles["region-rows.csv"] = regionRowsCsv(regions, table.columns.map((c) => c.name), texts, decimal);
  }

  await writeFileSet(command.outDir, {
    "nodes.csv": files["nodes.csv"](),
    "members.csv": files["members.csv"](),
    "edges.csv": files["edges.csv"](),
    "summary.json": `${JSON.stringify(summary, null, 2)}\n`,
    ...regionFiles,
  });
  const loops = result.betti ? `, b1 ${result.betti.b1}` : "";
  const count = (n: number, word: string): string => `${n} ${word}${n === 1 ? "" : "s"}`;
  const region = regions[0] ? `; region ${regions[0].name}: ${count(regions[0].rows.length, "row")}` : "";
  return `${count(result.landmarks.length, "node")}, ${count(result.edges.source.length, "edge")}, ${count(result.componentCount, "component")} (b0), cycle rank ${result.cycleRank}${loops} at radius ${radius}; rows used ${result.usedRows.length} of ${result.rowsRead}${region}; wrote ${command.outDir}`;
}
