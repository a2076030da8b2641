import { parseNumber, type ByteReadOptions } from "../core/index.ts";
import { commonOptionSpec, commonUsage, readCommonOptions, type CommonOptions } from "./commonOptions.ts";
import { readByteOptions, readOptionSpec, readUsage } from "./readInput.ts";
import { numberList, type RowChoice } from "./regionArgs.ts";
import { argsWithRecipe, recipeUsage } from "./recipeOptions.ts";

export interface DrawCommand extends CommonOptions {
  readonly input: string;
  readonly out: string;
  readonly format: "svg" | "png";
  /** Radius, or null for the default rule. */
  readonly radius: number | null;
  readonly read: ByteReadOptions;
  readonly colourBy: string;
  readonly width: number;
  readonly height: number;
  /** Pixels per picture unit in a PNG: 1, 2 or 3. */
  readonly density: 1 | 2 | 3;
  readonly layoutSeed: number;
  readonly greyscale: boolean;
  /** --region-nodes with its --region-name: a region outlined on the picture; null for none. */
  readonly region: { readonly name: string; readonly choice: RowChoice } | null;
}

export const drawUsage = `usage: shoal draw DATA --colour-by COLUMN --out FILE.svg|FILE.png [options]
  DATA                a delimited text file (CSV, TSV, ; or | separated) or a Parquet file
  --out FILE          the picture: .svg (text stays text) or .png (drawn with the DejaVu Sans font
                      shipped in assets/fonts); any other extension is an error
  --colour-by COLUMN  fill nodes by a column: a numeric one by the node's mean, a categorical one by
                      its most common level
  --size WxH          picture size in pixels (default 1200x900; at least 480x320)
  --density D         1 | 2 | 3: device pixels per picture pixel in a PNG (default 1)
  --layout-seed N     integer seed of the force layout's starting places (default 1); the layout runs
                      d3-force's 300 ticks, so the same command writes the same file byte for byte
  --greyscale         a picture that reads in greyscale: numbered grey steps for categories, dash
                      patterns for regions, and the legend says "lightness increases with value"
  --radius R          ball radius (default: the workbench's default-radius rule)
  --region-nodes 3,4  outline a region: the rows of these nodes (1-based), as the workbench outlines one
  --region-name NAME  the region's name in the legend (default region)
${commonUsage}
${readUsage}
${recipeUsage}`;

/** Parses `shoal draw …` arguments; throws one clear message for anything wrong. */
export function parseDrawArgs(args: readonly string[]): DrawCommand {
  const { values, flags, positionals, recipe } = argsWithRecipe(args, {
    ...commonOptionSpec, ...readOptionSpec, out: { type: "string" }, radius: { type: "string" }, "colour-by": { type: "string" }, size: { type: "string" },
    density: { type: "string" }, "layout-seed": { type: "string" }, "region-nodes": { type: "string" }, "region-name": { type: "string" }, greyscale: { type: "boolean" },
  });
  if (positionals.length !== 1) throw new Error(`expected one input file, got ${positionals.length}`);
  if (!values.out) throw new Error("missing --out FILE.svg or FILE.png");
  const extension = /\.(svg|png)$/i.exec(values.out)?.[1]?.toLowerCase();
  if (extension !== "svg" && extension !== "png") throw new Error(`invalid --out: ${values.out} (expected a name ending in .svg or .png)`);
  if (values["colour-by"] === undefined || values["colour-by"] === "") throw new Error("missing --colour-by COLUMN");
  let radius: number | null = null;
  if (values.radius !== undefined) {
    radius = parseNumber(values.radius);
    if (!(radius > 0)) throw new Error(`invalid radius: ${values.radius}`);
  }
  const size = /^(\d+)x(\d+)$/.exec(values.size ?? "1200x900");
  if (!size) throw new Error(`invalid --size: ${values.size} (expected WxH in whole pixels, such as 1200x900)`);
  const density = Number(values.density ?? "1");
  if (density !== 1 && density !== 2 && density !== 3) throw new Error(`invalid --density: ${values.density} (expected 1, 2 or 3)`);
  if (values.density !== undefined && extension !== "png") throw new Error("--density applies to a .png picture only");
  const layoutSeed = parseNumber(values["layout-seed"] ?? "1");
  if (!Number.isInteger(layoutSeed)) throw new Error(`invalid --layout-seed: ${values["layout-seed"]}`);
  const nodes = values["region-nodes"];
  const choice: RowChoice | null = nodes === undefined ? null : { by: "nodes", numbers: numberList("--region-nodes", nodes) };
  if (!choice && values["region-name"] !== undefined) throw new Error("--region-name needs --region-nodes");
  if (values["region-name"] === "") throw new Error("invalid --region-name: an empty name");
  return {
    ...readCommonOptions(values, recipe),
    input: positionals[0]!, out: values.out, format: extension, radius, read: readByteOptions(values), colourBy: values["colour-by"],
    width: Number(size[1]), height: Number(size[2]), density, layoutSeed, greyscale: flags.has("greyscale"),
    region: choice ? { name: values["region-name"] ?? "region", choice } : null,
  };
}
