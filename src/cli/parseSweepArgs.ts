import { parseNumber, type ByteReadOptions } from "../core/index.ts";
import { commonOptionSpec, commonUsage, readCommonOptions, type CommonOptions } from "./commonOptions.ts";
import { readByteOptions, readOptionSpec, readUsage } from "./readInput.ts";
import { argsWithRecipe, recipeUsage } from "./recipeOptions.ts";

export interface SweepCommand extends CommonOptions {
  readonly input: string;
  /** CSV destination, or null for standard output. */
  readonly outFile: string | null;
  /** Ends of the log-spaced radii; null ends come from the default range rule. */
  readonly radiusMin: number | null;
  readonly radiusMax: number | null;
  readonly steps: number;
  readonly read: ByteReadOptions;
}

export const sweepUsage = `usage: shoal sweep DATA [--out FILE] [options]
  DATA                a delimited text file (CSV, TSV, ; or | separated) or a Parquet file
  --out FILE          write the per-radius table there (default: standard output)
  --radius-min A      smallest radius (default: from the data, see the README)
  --radius-max B      largest radius (default: from the data)
  --steps K           number of radii, log-spaced from A to B (default 24)
${commonUsage}
${readUsage}
${recipeUsage}`;

/** Parses `shoal sweep …` arguments; throws one clear message for anything wrong. */
export function parseSweepArgs(args: readonly string[]): SweepCommand {
  const { values, positionals, recipe } = argsWithRecipe(args, { ...commonOptionSpec, ...readOptionSpec, out: { type: "string" }, "radius-min": { type: "string" }, "radius-max": { type: "string" }, steps: { type: "string" } });
  if (positionals.length !== 1) throw new Error(`expected one input file, got ${positionals.length}`);
  const radius = (text: string | undefined): number | null => {
    if (text === undefined) return null;
    const r = parseNumber(text);
    if (!(r > 0)) throw new Error(`invalid radius: ${text}`);
    return r;
  };
  const radiusMin = radius(values["radius-min"]);
  const radiusMax = radius(values["radius-max"]);
  if (radiusMin !== null && radiusMax !== null && !(radiusMin < radiusMax)) throw new Error(`invalid radius range: ${radiusMin} to ${radiusMax}`);
  const steps = parseNumber(values.steps ?? "24");
  if (!Number.isInteger(steps) || steps < 2) throw new Error(`invalid steps: ${values.steps}`);
  if (values.out === "") throw new Error("invalid --out: an empty file name");
  return { ...readCommonOptions(values, recipe), input: positionals[0]!, outFile: values.out ?? null, radiusMin, radiusMax, steps, read: readByteOptions(values) };
}

