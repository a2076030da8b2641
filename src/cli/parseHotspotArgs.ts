import { hotspotDefaults, parseNumber, type HotspotDirection, type HotspotScore } from "../core/index.ts";
import { commonOptionSpec, commonUsage, readCommonOptions } from "./commonOptions.ts";
import type { BuildCommand } from "./parseBuildArgs.ts";
import { readByteOptions, readOptionSpec, readUsage } from "./readInput.ts";
import { argsWithRecipe, recipeUsage } from "./recipeOptions.ts";

export interface HotspotCommand extends Omit<BuildCommand, "region"> {
  /** The outcome column scanned. */
  readonly scan: string;
  readonly direction: HotspotDirection;
  readonly maxNodes: number;
  readonly replicates: number;
  /** null: chosen from the values (0/1 → bernoulli, otherwise normal). */
  readonly score: HotspotScore | null;
  readonly scanSeed: number;
  readonly stabilitySeeds: number;
}

export const hotspotsUsage = `usage: shoal hotspots DATA --scan COLUMN --out DIR [options]
  DATA                a delimited text file (CSV, TSV, ; or | separated) or a Parquet file
  --scan COLUMN       the numeric outcome searched for hotspots (rows missing it are left out and counted)
  --out DIR           folder for the build's nodes.csv, members.csv, edges.csv and summary.json, and
                      hotspots.csv, hotspot-rows.csv and hotspots.json; replaces the set Shoal wrote there before
  --radius R          ball radius (default: the workbench's default-radius rule)
  --direction D       high | low | both: where the outcome runs high, low or either (default ${hotspotDefaults.direction})
  --max-nodes K       a candidate lies within a node and its K - 1 nearest nodes, 1 to ${hotspotDefaults.maxNodesLimit} (default ${hotspotDefaults.maxNodes})
  --replicates R      permutations of the outcome for the p-values (default ${hotspotDefaults.replicates})
  --score S           bernoulli | normal | rank (default: bernoulli for 0/1 values, otherwise normal)
  --scan-seed N       integer seed of the permutations and the bootstrap (default ${hotspotDefaults.scanSeed}); --seed stays the landmark seed
  --stability-seeds k rebuild with k other landmark seeds and report how often each hotspot is found again (default 0: off)
${commonUsage}
${readUsage}
${recipeUsage}`;

const wholeNumber = (flag: string, text: string | undefined, fallback: number, least: number, most = Infinity): number => {
  if (text === undefined) return fallback;
  const value = /^-?\d+$/.test(text.trim()) ? Number(text) : NaN;
  if (!Number.isSafeInteger(value) || value < least || value > most) throw new Error(`invalid ${flag}: ${text}`);
  return value;
};

/** Parses `shoal hotspots …` arguments; throws one clear message for anything wrong. */
export function parseHotspotArgs(args: readonly string[]): HotspotCommand {
  const spec = { out: { type: "string" }, radius: { type: "string" }, scan: { type: "string" }, direction: { type: "string" }, "max-nodes": { type: "string" }, replicates: { type: "string" }, score: { type: "string" }, "scan-seed": { type: "string" }, "stability-seeds": { type: "string" } } as const;
  const { values, positionals, recipe } = argsWithRecipe(args, { ...commonOptionSpec, ...readOptionSpec, ...spec });
  if (positionals.length !== 1) throw new Error(`expected one input file, got ${positionals.length}`);
  if (!values.out) throw new Error("missing --out DIR");
  if (!values.scan) throw new Error("missing --scan COLUMN: the outcome to search");
  let radius: number | null = null;
  if (values.radius !== undefined) {
    radius = parseNumber(values.radius);
    if (!(radius > 0)) throw new Error(`invalid radius: ${values.radius}`);
  }
  const direction = values.direction ?? hotspotDefaults.direction;
  if (direction !== "high" && direction !== "low" && direction !== "both") throw new Error(`invalid --direction: ${direction} (high, low or both)`);
  const score = values.score ?? null;
  if (score !== null && score !== "bernoulli" && score !== "normal" && score !== "rank") throw new Error(`invalid --score: ${score} (bernoulli, normal or rank)`);
  const common = readCommonOptions(values, recipe);
  // the scanned column is never a feature, as an outcome is not
  const outcomes = common.outcomes.includes(values.scan) ? common.outcomes : [...common.outcomes, values.scan];
  return {
    ...common,
    outcomes,
    input: positionals[0]!,
    outDir: values.out,
    radius,
    read: readByteOptions(values),
    scan: values.scan,
    direction,
    maxNodes: wholeNumber("--max-nodes", values["max-nodes"], hotspotDefaults.maxNodes, 1, hotspotDefaults.maxNodesLimit),
    replicates: wholeNumber("--replicates", values.replicates, hotspotDefaults.replicates, 0),
    score,
    scanSeed: wholeNumber("--scan-seed", values["scan-seed"], hotspotDefaults.scanSeed, -(2 ** 31), 2 ** 32 - 1),
    stabilitySeeds: wholeNumber("--stability-seeds", values["stability-seeds"], 0, 0, 1000),
  };
}
