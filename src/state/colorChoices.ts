import { nodeRowShare, numericLevels, type CoverResult, type ParsedTable } from "../core/index.ts";
import { memoizeLast } from "./memoizeLast.ts";
import { levelFill, type NodeFill } from "./nodeFill.ts";
import type { NamedRegion } from "./slices/selectionSlice.ts";
import type { WorkbenchState } from "./store.ts";

/** Colour choices that are not a table column as it is: a named region's share, or a numeric column read as categories. */
const regionPrefix = "@region:";
const levelsPrefix = "@levels:";

/** The `colorBy` value that colours each node by the share of its rows in a named region. */
export const regionColor = (id: number): string => `${regionPrefix}${id}`;
/** The `colorBy` value that colours a numeric column with few distinct values by level. */
export const levelsColor = (column: string): string => `${levelsPrefix}${column}`;

/**
 * The fill for a region or levels choice, or undefined when `colorBy` is neither (then the column
 * fill applies); null when the region or column is gone or does not qualify.
 */
export function specialFill(
  table: ParsedTable | null,
  result: CoverResult,
  colorBy: string | null,
  colorLevel: string | null,
  regions: readonly NamedRegion[],
): NodeFill | null | undefined {
  if (colorBy?.startsWith(regionPrefix)) {
    const region = regions.find((r) => regionColor(r.id) === colorBy);
    return region ? { kind: "sequential", values: nodeRowShare(result.members, region.rows, result.rowsRead), caption: `node share of rows in ${region.name}` } : null;
  }
  if (colorBy?.startsWith(levelsPrefix)) {
    const name = colorBy.slice(levelsPrefix.length);
    const column = table?.columns.find((c) => c.name === name);
    const categories = column?.kind === "numeric" ? numericLevels(column.numbers) : null;
    return categories ? levelFill(categories, result.members, name, colorLevel) : null;
  }
  return undefined;
}

const memoLevelColumns = memoizeLast((table: ParsedTable | null): readonly { readonly name: string; readonly levels: readonly string[] }[] =>
  table
    ? table.columns.flatMap((c) => {
        const categories = c.kind === "numeric" ? numericLevels(c.numbers) : null;
        return categories ? [{ name: c.name, levels: categories.levels }] : [];
      })
    : [],
);

/** Numeric columns that may be coloured as categories (at most 12 distinct values), with their levels, in table order. */
export const selectLevelColumns = (s: WorkbenchState): readonly { readonly name: string; readonly levels: readonly string[] }[] => memoLevelColumns(s.table);
