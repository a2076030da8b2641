import { parseArgs } from "node:util";
import { maybeLandmarkRule, maybeMetric, maybeScale, type CoverParams } from "../core/index.ts";

export interface BuildCommand {
  readonly input: string;
  readonly outDir: string;
  /** Feature columns, or null for every numeric column except the id and outcomes. */
  readonly columns: readonly string[] | null;
  readonly idColumn: string | null;
  readonly outcomes: readonly string[];
  /** Radius, or null for the default rule. */
  readonly radius: number | null;
  readonly params: Omit<CoverParams, "features" | "radius">;
}

export const buildUsage = `usage: shoal build DATA.csv --out DIR [--columns a,b,c] [--id COLUMN] [--outcome a,b]
  [--scale zscore] [--metric euclidean] [--radius R] [--landmarks greedy|random] [--seed N]`;

/** Parses `shoal build …` arguments; throws one clear message for anything wrong. */
export function parseBuildArgs(args: readonly string[]): BuildCommand {
  const { values, positionals } = parseArgs({
    args: [...args],
    allowPositionals: true,
    strict: true,
    options: {
      out: { type: "string" },
      columns: { type: "string" },
      id: { type: "string" },
      outcome: { type: "string" },
      scale: { type: "string", default: "zscore" },
      metric: { type: "string", default: "euclidean" },
      radius: { type: "string" },
      landmarks: { type: "string", default: "greedy" },
      seed: { type: "string", default: "1" },
    },
  });
  if (positionals.length !== 1) throw new Error(`expected one input file, got ${positionals.length}`);
  if (!values.out) throw new Error("missing --out DIR");
  const list = (text: string | undefined): string[] => (text ?? "").split(",").map((s) => s.trim()).filter((s) => s !== "");
  let radius: number | null = null;
  if (values.radius !== undefined) {
    radius = Number(values.radius);
    if (!(radius > 0) || !Number.isFinite(radius)) throw new Error(`invalid radius: ${values.radius}`);
  }
  const seed = Number(values.seed);
  if (!Number.isInteger(seed)) throw new Error(`invalid seed: ${values.seed}`);
  return {
    input: positionals[0]!,
    outDir: values.out,
    columns: values.columns === undefined ? null : list(values.columns),
    idColumn: values.id ?? null,
    outcomes: list(values.outcome),
    radius,
    params: {
      scale: maybeScale(values.scale ?? "zscore"),
      metric: maybeMetric(values.metric ?? "euclidean").name,
      landmarks: maybeLandmarkRule(values.landmarks ?? "greedy"),
      seed,
    },
  };
}
