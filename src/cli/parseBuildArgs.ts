import { parseNumber, type ByteReadOptions } from "../core/index.ts";
import { commonOptionSpec, commonUsage, readCommonOptions, type CommonOptions } from "./commonOptions.ts";
import { readByteOptions, readOptionSpec, readUsage } from "./readInput.ts";
import { numberList, type RowChoice } from "./regionArgs.ts";
import { argsWithRecipe, recipeUsage } from "./recipeOptions.ts";

export interface BuildCommand extends CommonOptions {
  readonly input: string;
  readonly outDir: string;
  /** Radius, or null for the default rule. */
  readonly radius: number | null;
  readonly read: ByteReadOptions;
  /** --region-nodes with its --region-name: the rows written to region-rows.csv; null for none. */
  readonly region: { readonly name: string; readonly choice: RowChoice } | null;
}

export const buildUsage = `usage: shoal build DATA --out DIR [options]
  DATA                a delimited text file (CSV, TSV, ; or | separated) or a Parquet file
  --out DIR           folder for nodes.csv, members.csv, edges.csv and summary.json; replaces the
                      set Shoal wrote there before (listed in DIR/.shoal-files), leaves other files
  --radius R          ball radius (default: the workbench's default-radius rule)
  --region-nodes 3,4  also write region-rows.csv: the rows of these nodes (1-based), each with its
                      cells as read, and list the region in summary.json
  --region-name NAME  the region's name in region-rows.csv and summary.json (default region)
${commonUsage}
${readUsage}
${recipeUsage}`;

/** Parses `shoal build …` arguments; throws one clear message for anything wrong. */
export function parseBuildArgs(args: readonly string[]): BuildCommand {
  const { values, positionals, recipe } = argsWithRecipe(args, { ...commonOptionSpec, ...readOptionSpec, out: { type: "string" }, radius: { type: "string" }, "region-nodes": { type: "string" }, "region-name": { type: "string" } });
  if (positionals.length !== 1) throw new Error(`expected one input file, got ${positionals.length}`);
  if (!values.out) throw new Error("missing --out DIR");
  let radius: number | null = null;
  if (values.radius !== undefined) {
    radius = parseNumber(values.radius);
    if (!(radius > 0)) throw new Error(`invalid radius: ${values.radius}`);
  }
  const nodes = values["region-nodes"];
  const choice: RowChoice | null = nodes === undefined ? null : { by: "nodes", numbers: numberList("--region-nodes", nodes) };
  if (!choice && values["region-name"] !== undefined) throw new Error("--region-name needs --region-nodes");
  if (values["region-name"] === "") throw new Error("invalid --region-name: an empty name");
  const region = choice ? { name: values["region-name"] ?? "region", choice } : null;
  return { ...readCommonOptions(values, recipe), input: positionals[0]!, outDir: values.out, radius, read: readByteOptions(values), region };
}
