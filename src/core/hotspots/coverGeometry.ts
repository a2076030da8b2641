import type { CoverResult } from "../cover/buildCover.ts";
import { transposeLists, type CompressedLists } from "../lists/compressedLists.ts";
import { maybeMetric } from "../metric/metrics.ts";
import type { Metric } from "../metric/types.ts";
import { prepareFeatures } from "../scale/prepareFeatures.ts";
import type { NumericTable, ParsedTable } from "../table/types.ts";

/** A build's rows in scan terms: its scaled rows again, where each landmark sits among them, and which balls hold each row. */
export interface CoverGeometry {
  /** The scaled rows, in the order of `result.usedRows` (position p is parsed row usedRows[p]). */
  readonly table: NumericTable;
  readonly metric: Metric;
  /** Position (in `table`) of each node's landmark. */
  readonly landmarkPositions: Uint32Array;
  /** For each position, the nodes whose balls hold it, ascending. */
  readonly rowNodes: CompressedLists;
}

/**
 * Scales the rows again with the build's parameters (`prepareFeatures`, one table-sized copy,
 * held for the scan's set-up only) and transposes the build's balls to positions. O(n·d + m)
 * for n used rows, d columns and m memberships. Throws when the rows do not match the build.
 */
export function coverGeometry(parsed: ParsedTable, result: CoverResult): CoverGeometry {
  const prepared = prepareFeatures(parsed, result.params);
  const used = prepared.usedRows;
  if (used.length !== result.usedRows.length) throw new Error(`the table does not match the build: ${used.length} rows used, the build used ${result.usedRows.length}`);
  const positionOf = new Int32Array(parsed.rows).fill(-1);
  for (let p = 0; p < used.length; ++p) positionOf[used[p]!] = p;
  const at = (row: number): number => {
    const p = positionOf[row]!;
    if (p < 0) throw new Error(`the table does not match the build: row ${row} is not used`);
    return p;
  };
  const items = result.members.items.map(at);
  const rowNodes = transposeLists(result.members.offsets, [items], used.length);
  return { table: prepared.table, metric: maybeMetric(result.params.metric), landmarkPositions: Uint32Array.from(result.landmarks, at), rowNodes };
}
