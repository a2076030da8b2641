import { nodeLevelShare, nodeMajority, type Categories, type CompressedLists } from "../core/index.ts";

/** How nodes are filled: a number per node on a sequential scale, a level per node, or nothing. */
export type NodeFill =
  | { readonly kind: "sequential"; readonly values: Float64Array; readonly caption: string }
  | { readonly kind: "categorical"; readonly level: Int32Array; readonly levels: readonly string[]; readonly caption: string };

/** The fill of a column by level: the share of `level` in each node, or each node's most common level when no level is chosen (or it is gone). */
export function levelFill(categories: Categories, members: CompressedLists, name: string, level: string | null): NodeFill {
  const index = level === null ? -1 : categories.levels.indexOf(level);
  if (index >= 0) return { kind: "sequential", values: nodeLevelShare(categories, members, index), caption: `node share of ${name} = ${level}` };
  return { kind: "categorical", level: nodeMajority(categories, members), levels: categories.levels, caption: `most common ${name} in the node` };
}
