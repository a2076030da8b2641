import { buildCover, featureWeights, readingRecord, defaultRadius, type CoverParams, type CoverResult, type ReadingRecord, type ReadOutcome } from "../core/index.ts";
import { resolveFeatures, type CommonOptions } from "./commonOptions.ts";
import type { BuildCommand } from "./parseBuildArgs.ts";
import { readInput } from "./readInput.ts";

export interface FileBuild extends ReadOutcome {
  readonly fileName: string;
  readonly fileSize: number;
  readonly radius: number;
  readonly result: CoverResult;
  readonly reading: ReadingRecord;
  /** Milliseconds the build took. */
  readonly elapsed: number;
  /** Milliseconds reading the file took (open to parsed table). */
  readonly readMs: number;
}

/** Reads a file through the core reader and builds the cover graph with the command's options, as `shoal build` does (`explain` too). */
export async function buildFromFile(command: CommonOptions & Pick<BuildCommand, "input" | "radius" | "read">): Promise<FileBuild> {
  const { table, report, fileName, fileSize, readMs } = await readInput(command.input, command.read);
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
  const reading = readingRecord(report.format, command.read.ragged);
  return { table, report, fileName, fileSize, radius, result, reading, elapsed, readMs };
}
