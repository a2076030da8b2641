import { nodeMajority } from "../cover/nodeCategories.ts";
import { nodeMeans } from "../cover/nodeMeans.ts";
import type { CompressedLists } from "../lists/compressedLists.ts";
import type { ParsedTable } from "../table/types.ts";
import type { PictureFill } from "./pictureTypes.ts";

/**
 * The fill for colouring by a column, as the workbench's default for that column: a numeric column
 * by each node's mean over its members with a value (`nodeMeans`), a categorical one by each node's
 * most common level (`nodeMajority`, ties to the level seen first). Throws for an unknown column and
 * for a text column without levels (too many distinct values to be a category). O(memberships).
 * @example columnFill(table, members, "pressure").caption // => "node mean of pressure"
 */
export function columnFill(table: ParsedTable, members: CompressedLists, name: string): NonNullable<PictureFill> {
  const column = table.columns.find((c) => c.name === name);
  if (!column) throw new Error(`unknown column: ${name}`);
  if (column.kind === "numeric") return { kind: "sequential", values: nodeMeans(column.numbers, members), caption: `node mean of ${name}` };
  if (!column.categories) throw new Error(`cannot colour by a text column without levels: ${name}`);
  return { kind: "categorical", level: nodeMajority(column.categories, members), levels: column.categories.levels, caption: `most common ${name} in the node` };
}
