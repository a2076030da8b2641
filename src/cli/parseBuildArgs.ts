import { parseNumber, type ByteReadOptions } from "../core/index.ts";
import { commonOptionSpec, commonUsage, readCommonOptions, type CommonOptions } from "./commonOptions.ts";
import { readByteOptions, readOptionSpec, readUsage } from "./readInput.ts";
import { strictArgs } from "./strictArgs.ts";

export interface BuildCommand extends CommonOptions {
  readonly input: string;
  readonly outDir: string;
  /** Radius, or null for the default rule. */
  readonly radius: number | null;
  readonly read: ByteReadOptions;
}

export const buildUsage = `usage: shoal build DATA --out DIR [options]
  DATA                a delimited text file (CSV, TSV, ; or | separated) or a Parquet file
  --out DIR           folder for nodes.csv, members.csv, edges.csv and summary.json; replaces the
                      set Shoal wrote there before (listed in DIR/.shoal-files), leaves other files
  --radius R          ball radius (default: the workbench's default-radius rule)
${commonUsage}
${readUsage}`;

/** Parses `shoal build …` arguments; throws one clear message for anything wrong. */
export function parseBuildArgs(args: readonly string[]): BuildCommand {
  const { values, positionals } = strictArgs(args, { ...commonOptionSpec, ...readOptionSpec, out: { type: "string" }, radius: { type: "string" } });
  if (positionals.length !== 1) throw new Error(`expected one input file, got ${positionals.length}`);
  if (!values.out) throw new Error("missing --out DIR");
  let radius: number | null = null;
  if (values.radius !== undefined) {
    radius = parseNumber(values.radius);
    if (!(radius > 0)) throw new Error(`invalid radius: ${values.radius}`);
  }
  return { ...readCommonOptions(values), input: positionals[0]!, outDir: values.out, radius, read: readByteOptions(values) };
}
