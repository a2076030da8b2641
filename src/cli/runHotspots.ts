import { coverExportChunks, coverSummary, scanHotspots } from "../core/index.ts";
import { buildFromFile } from "./buildFromFile.ts";
import { hotspotFileTexts } from "./hotspotSummary.ts";
import type { HotspotCommand } from "./parseHotspotArgs.ts";
import { writeFileSet } from "./writeFileSet.ts";
import { recipeOfRun, recipeRegionRows, recipeToSave, saveRecipe } from "./recipeOfRun.ts";

/**
 * `shoal hotspots`: builds as `shoal build` does (same reader, same four files), scans the
 * --scan outcome for hotspots, and writes hotspots.csv, hotspot-rows.csv and hotspots.json beside
 * them, the whole set replacing Shoal's previous files in the folder (`writeFileSet`).
 */
export async function runHotspots(command: HotspotCommand): Promise<string> {
  const built = await buildFromFile(command);
  const { table, fileName, fileSize, radius, result, reading, fingerprint, elapsed, readMs } = built;
  const column = table.columns.find((c) => c.name === command.scan);
  if (!column) throw new Error(`unknown column: ${command.scan}`);
  if (column.kind !== "numeric") throw new Error(`not a numeric column: ${command.scan}`);
  const context = { fileName, fileSize, idColumn: command.idColumn, outcomes: command.outcomes, reading };
  const files = coverExportChunks(table, result, context);
  const summary = { ...coverSummary(result, context), timingsMs: { read: readMs, ...result.timings, total: elapsed } };
  const started = performance.now();
  const scan = scanHotspots(table, result, {
    outcome: command.scan,
    direction: command.direction,
    maxNodes: command.maxNodes,
    replicates: command.replicates,
    scanSeed: command.scanSeed,
    stabilitySeeds: command.stabilitySeeds,
    ...(command.score ? { score: command.score } : {}),
    now: () => performance.now(),
  });
  const scanTime = performance.now() - started;
  const hotspots = {
    column: command.scan, direction: command.direction, maxNodes: command.maxNodes, replicates: command.replicates,
    score: command.score ?? "auto", scanSeed: command.scanSeed, stabilitySeeds: command.stabilitySeeds,
  } as const;
  const regions = recipeRegionRows(command.recipe, result.rowsRead);
  const recipe = recipeToSave(command.recipe, () => recipeOfRun(command, { fileName, fingerprint: fingerprint!, read: command.read, params: result.params, regions, hotspots }));
  await writeFileSet(command.outDir, {
    "nodes.csv": files["nodes.csv"](),
    "members.csv": files["members.csv"](),
    "edges.csv": files["edges.csv"](),
    "summary.json": `${JSON.stringify(summary, null, 2)}\n`,
    ...hotspotFileTexts(scan, table, { command, fileName, radius, buildMs: elapsed, scanMs: scanTime }),
  });
  const saved = await saveRecipe(command.recipe, recipe);
  const best = scan.hotspots[0];
  const top = best ? `top hotspot: nodes ${Array.from(best.nodes, (n) => n + 1).join(" ")}, ${best.nInside} rows, ${best.inside} inside vs ${best.outside} outside, p ${best.p}` : (scan.notice ?? "no region scores above 0");
  return `${scan.hotspots.length} hotspot${scan.hotspots.length === 1 ? "" : "s"} for ${command.scan} (${scan.score}, ${scan.search}, ${scan.candidateSets} candidate sets, ${scan.replicates} replicates) at radius ${radius}; ${top}; rows scanned ${scan.rowsScanned}, left out for a missing ${command.scan} ${scan.rowsMissingOutcome}; ${Math.round(scanTime)} ms; wrote ${command.outDir}${saved}`;
}
