import { buildCoverOnThreads, featureWeights, readingRecord, defaultRadius, type CoverParams, type CoverResult, type FileFingerprint, type ReadingRecord, type ReadOutcome } from "../core/index.ts";
import { resolveFeatures, type CommonOptions } from "./commonOptions.ts";
import type { BuildCommand } from "./parseBuildArgs.ts";
import { nodePartRunner } from "./nodePartRunner.ts";
import { readInput } from "./readInput.ts";
import { checkRecipeInput, needsFingerprint } from "./recipeOfRun.ts";

export interface FileBuild extends ReadOutcome {
  readonly fileName: string;
  readonly fileSize: number;
  readonly radius: number;
  readonly result: CoverResult;
  readonly reading: ReadingRecord;
  /** Size and SHA-256 of the input when a recipe is read or written, else null. */
  readonly fingerprint: FileFingerprint | null;
  /** Milliseconds the build took. */
  readonly elapsed: number;
  /** Milliseconds reading the file took (open to parsed table). */
  readonly readMs: number;
}

/** Reads a file through the core reader and builds the cover graph with the command's options, on two threads where there are two cores, as `shoal build` does (`explain` too). */
export async function buildFromFile(command: CommonOptions & Pick<BuildCommand, "input" | "radius" | "read">): Promise<FileBuild> {
  const { table, report, fileName, fileSize, fingerprint, readMs } = await readInput(command.input, command.read, needsFingerprint(command.recipe));
  checkRecipeInput(command.recipe, fileName, fingerprint);
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
  // two threads where the machine has two cores (nodePartRunner): the same result as one
  const runner = nodePartRunner();
  let result: CoverResult;
  try {
    result = await buildCoverOnThreads(table, params, runner, { now: () => performance.now() });
  } finally {
    runner?.close();
  }
  const elapsed = performance.now() - started;
  const reading = readingRecord(report.format, command.read.ragged);
  return { table, report, fileName, fileSize, radius, result, reading, fingerprint, elapsed, readMs };
}
