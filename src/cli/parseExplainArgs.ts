import { parseNumber, type ByteReadOptions } from "../core/index.ts";
import { commonOptionSpec, commonUsage, readCommonOptions, type CommonOptions } from "./commonOptions.ts";
import { readByteOptions, readOptionSpec, readUsage } from "./readInput.ts";
import { rowChoice, type RowChoice } from "./regionArgs.ts";
import { argsWithRecipe, recipeUsage } from "./recipeOptions.ts";

export interface ExplainCommand extends CommonOptions {
  readonly input: string;
  /** CSV destination, or null for standard output. */
  readonly outFile: string | null;
  readonly radius: number | null;
  readonly read: ByteReadOptions;
  readonly region: RowChoice;
  /** The second region (A vs B), or null for the region against the rest. */
  readonly versus: RowChoice | null;
}

export const explainUsage = `usage: shoal explain DATA (--nodes 3,4,7 | --rows 12,40) [--versus-nodes 8,9 | --versus-rows 5,6] [--out FILE] [options]
  DATA                a delimited text file (CSV, TSV, ; or | separated) or a Parquet file
  --nodes 3,4,7       the region: the rows of these nodes (1-based, as in nodes.csv) after the build
  --rows 12,40        the region: these record numbers (as in members.csv)
  --versus-nodes 8,9  compare with the rows of these nodes instead of the rest (rows in both are left out)
  --versus-rows 5,6   compare with these records instead of the rest
  --out FILE          write the region table there (default: standard output)
  --radius R          ball radius (default: the workbench's default-radius rule)
${commonUsage}
${readUsage}
${recipeUsage}`;

/** Parses `shoal explain …` arguments; throws one clear message for anything wrong. */
export function parseExplainArgs(args: readonly string[]): ExplainCommand {
  const spec = { nodes: { type: "string" }, rows: { type: "string" }, "versus-nodes": { type: "string" }, "versus-rows": { type: "string" }, out: { type: "string" }, radius: { type: "string" } } as const;
  const { values, positionals, recipe } = argsWithRecipe(args, { ...commonOptionSpec, ...readOptionSpec, ...spec });
  if (positionals.length !== 1) throw new Error(`expected one input file, got ${positionals.length}`);
  const region = rowChoice("--nodes", values.nodes, "--rows", values.rows);
  if (!region) throw new Error("missing --nodes or --rows: the region to explain");
  const versus = rowChoice("--versus-nodes", values["versus-nodes"], "--versus-rows", values["versus-rows"]);
  let radius: number | null = null;
  if (values.radius !== undefined) {
    radius = parseNumber(values.radius);
    if (!(radius > 0)) throw new Error(`invalid radius: ${values.radius}`);
  }
  if (values.out === "") throw new Error("invalid --out: an empty file name");
  return { ...readCommonOptions(values, recipe), input: positionals[0]!, outFile: values.out ?? null, radius, read: readByteOptions(values), region, versus };
}
