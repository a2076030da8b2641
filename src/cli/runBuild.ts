import { mkdir, readFile, rename, rm, stat, writeFile } from "node:fs/promises";
import { basename, join } from "node:path";
import { buildCover, coverExports, parseCsvText, suggestRadius, type ParsedTable } from "../core/index.ts";
import type { BuildCommand } from "./parseBuildArgs.ts";

/**
 * Reads the table through the same core parser as the workbench, builds, and writes the same
 * nodes.csv, members.csv, edges.csv and summary.json. Files go to a temporary folder first and
 * are moved into place only when all are written, so a failure leaves nothing half written.
 */
export async function runBuild(command: BuildCommand): Promise<string> {
  const [text, info] = await Promise.all([readFile(command.input, "utf8"), stat(command.input)]).catch(() => {
    throw new Error(`cannot read input file: ${command.input}`);
  });
  const table = parseCsvText(text);
  for (const name of [...(command.columns ?? []), ...command.outcomes, ...(command.idColumn ? [command.idColumn] : [])]) {
    if (!table.columns.some((c) => c.name === name)) throw new Error(`unknown column: ${name}`);
  }
  const features = command.columns ?? defaultFeatures(table, command);
  const radius = command.radius ?? suggestRadius(table, { features, metric: command.params.metric, scale: command.params.scale });
  if (!(radius > 0)) throw new Error("no default radius: the rows do not differ in the chosen columns");
  const started = performance.now();
  const result = buildCover(table, { ...command.params, features, radius }, { now: () => performance.now() });
  const elapsed = performance.now() - started;
  const files = coverExports(table, result, { fileName: basename(command.input), fileSize: info.size, idColumn: command.idColumn, outcomes: command.outcomes });
  const summary = { ...JSON.parse(files["summary.json"]), timingsMs: { ...result.timings, total: elapsed } };

  const staging = `${command.outDir}.partial-${process.pid}`;
  await rm(staging, { recursive: true, force: true });
  await mkdir(staging, { recursive: true });
  await Promise.all([
    writeFile(join(staging, "nodes.csv"), files["nodes.csv"]),
    writeFile(join(staging, "members.csv"), files["members.csv"]),
    writeFile(join(staging, "edges.csv"), files["edges.csv"]),
    writeFile(join(staging, "summary.json"), `${JSON.stringify(summary, null, 2)}\n`),
  ]);
  await mkdir(command.outDir, { recursive: true });
  for (const name of ["nodes.csv", "members.csv", "edges.csv", "summary.json"]) await rename(join(staging, name), join(command.outDir, name));
  await rm(staging, { recursive: true, force: true });
  return `${result.landmarks.length} nodes, ${result.edges.source.length} edges, ${result.componentCount} components at radius ${radius}; rows used ${result.usedRows.length} of ${result.rowsRead}; wrote ${command.outDir}`;
}

function defaultFeatures(table: ParsedTable, command: BuildCommand): string[] {
  return table.columns.filter((c) => c.kind === "numeric" && c.name !== command.idColumn && !command.outcomes.includes(c.name)).map((c) => c.name);
}
