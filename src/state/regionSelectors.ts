import { findRow, type RowPlace } from "./findRow.ts";
import { memoizeLast } from "./memoizeLast.ts";
import { majorityNodes, nodeRowShare, sharedRowCount } from "../core/index.ts";
import { selectIdColumn, selectRegionRows } from "./selectors.ts";
import type { NamedRegion } from "./slices/selectionSlice.ts";
import type { WorkbenchState } from "./store.ts";

/** The active region, or null. */
export const selectActiveRegion = (s: WorkbenchState): NamedRegion | null => s.regions.find((r) => r.id === s.activeRegionId) ?? null;

/** Rows the sweep and the seed runs track: the active region's, else the selection's (null when neither). */
export const selectTrackedRows = (s: WorkbenchState): Uint32Array | null => selectActiveRegion(s)?.rows ?? selectRegionRows(s);

const memoShare = memoizeLast((result: WorkbenchState["result"], region: NamedRegion | null): Float64Array | null =>
  result && region ? nodeRowShare(result.members, region.rows, result.rowsRead) : null,
);

/** Share of each node's rows in the active region (the shading after a rebuild), or null with no active region. */
export const selectActiveShare = (s: WorkbenchState): Float64Array | null => memoShare(s.result, selectActiveRegion(s));

/** A region's outline on the graph: the nodes most of whose rows lie in it, and its place in the outline styles. */
export interface RegionOutline {
  readonly id: number;
  readonly style: number;
  readonly nodes: readonly number[];
}

const memoOutlines = memoizeLast((result: WorkbenchState["result"], regions: readonly NamedRegion[]): readonly RegionOutline[] =>
  result ? regions.map((region, style) => ({ id: region.id, style, nodes: majorityNodes(result.members, region.rows, result.rowsRead) })) : [],
);

/** Outlines of every region on the current build, in the order the regions were kept. */
export const selectRegionOutlines = (s: WorkbenchState): readonly RegionOutline[] => memoOutlines(s.result, s.regions);

/** "A and B share N rows" for every pair of regions, in list order. */
export interface RegionOverlap {
  readonly first: string;
  readonly second: string;
  readonly shared: number;
}

const memoOverlaps = memoizeLast((regions: readonly NamedRegion[]): readonly RegionOverlap[] => {
  const out: RegionOverlap[] = [];
  for (let i = 0; i < regions.length; ++i) {
    for (let j = i + 1; j < regions.length; ++j) out.push({ first: regions[i]!.name, second: regions[j]!.name, shared: sharedRowCount(regions[i]!.rows, regions[j]!.rows) });
  }
  return out;
});

export const selectRegionOverlaps = (s: WorkbenchState): readonly RegionOverlap[] => memoOverlaps(s.regions);

const memoPlace = memoizeLast(
  (table: WorkbenchState["table"], result: WorkbenchState["result"], label: string | null, query: WorkbenchState["rowQuery"]): RowPlace | null =>
    table && result && query ? findRow(table, result, label, query.query, query.mode) : null,
);

/** Where the row looked for is in the current build, or null when nothing is looked for (or nothing is built). */
export const selectRowPlace = (s: WorkbenchState): RowPlace | null => memoPlace(s.table, s.result, selectIdColumn(s), s.rowQuery);
