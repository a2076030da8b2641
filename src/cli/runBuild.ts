import { mkdir, rename, rm, stat, writeFile } from "node:fs/promises";
import { join } from "node:path";
import { buildCover, coverExports, featureWeights, defaultRadius, type CoverParams } from "../core/index.ts";
import { resolveFeatures } from "./commonOptions.ts";
import type { BuildCommand } from "./parseBuildArgs.ts";
import { readInput } from "./readInput.ts";

/**
 * Reads the table through the same core parser as the workbench, builds, and writes the same
 * nodes.csv, members.csv, edges.csv and summary.json. Files go to a temporary folder first and
 * are moved into place only when all are written, so a failure leaves nothing half written.
 */
export async function runBuild(command: BuildCommand): Promise<string> {
  const { table, fileName, fileSize } = await readInput(command.input, command.read);
  const features = resolveFeatures(table, command);
  for (const name of command.outcomes) {
    if (table.columns.find((c) => c.name === name)!.kind !== "numeric") throw new Error(`not a numeric column: ${name}`);
  }
  const { scale, metric, landmarks, seed } = command.params;
  const missing = command.params.missing ?? "drop";
  const oneHot = command.params.oneHot ?? [];
  const weights = featureWeights([...features, ...oneHot], command.params.weights ?? {});
  const encoded = oneHot.length > 0 ? { oneHot } : {};
  const radius = command.radius ?? defaultRadius(table, { features, scale, metric, missing, weights, ...encoded });
  if (!(radius > 0)) throw new Error("no default radius: the rows do not differ in the chosen columns");
  // the same key order as the workbench's parameters, so both summaries read alike
  const params: CoverParams = { features, scale, metric, radius, landmarks, seed, missing, weights, ...encoded };
  const started = performance.now();
  const result = buildCover(table, params, { now: () => performance.now() });
  const elapsed = performance.now() - started;
  const files = coverExports(table, result, { fileName, fileSize, idColumn: command.idColumn, outcomes: command.outcomes });
  const summary = { ...JSON.parse(files["summary.json"]), timingsMs: { ...result.timings, total: elapsed } };

  await writeAll(command.outDir, {
    "nodes.csv": files["nodes.csv"],
    "members.csv": files["members.csv"],
    "edges.csv": files["edges.csv"],
    "summary.json": `${JSON.stringify(summary, null, 2)}\n`,
  });
  const loops = result.betti ? `, b0 ${result.betti.b0}, b1 ${result.betti.b1}` : "";
  const count = (n: number, word: string): string => `${n} ${word}${n === 1 ? "" : "s"}`;
  return `${count(result.landmarks.length, "node")}, ${count(result.edges.source.length, "edge")}, ${count(result.componentCount, "component")}, cycle rank ${result.cycleRank}${loops} at radius ${radius}; rows used ${result.usedRows.length} of ${result.rowsRead}; wrote ${command.outDir}`;
}

/** Writes every file to a staging folder beside `outDir`, then moves them in; on any failure the staging folder is removed. */
export async function writeAll(outDir: string, files: Readonly<Record<string, string>>): Promise<void> {
  const existing = await stat(outDir).catch(() => null);
  if (existing && !existing.isDirectory()) throw new Error(`output path is not a folder: ${outDir}`);
  const staging = `${outDir}.partial-${process.pid}`;
  try {
    await rm(staging, { recursive: true, force: true });
    await mkdir(staging, { recursive: true });
    await Promise.all(Object.entries(files).map(([name, text]) => writeFile(join(staging, name), text)));
    await mkdir(outDir, { recursive: true });
    for (const name of Object.keys(files)) await rename(join(staging, name), join(outDir, name));
  } catch (error) {
    throw new Error(`cannot write to ${outDir}: ${error instanceof Error ? error.message : String(error)}`, { cause: error });
  } finally {
    await rm(staging, { recursive: true, force: true });
  }
}
