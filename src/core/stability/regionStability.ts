import type { ParsedTable } from "../table/types.ts";
import { prepareRows, type SweepParams } from "../search/prepareRows.ts";
import { sweepPrepared, type RadiusSweep, type SweepOptions } from "../sweep/radiusSweep.ts";
import { matchRegion } from "./matchRegion.ts";
import { selectionMask } from "./selectionMask.ts";

/** How well a selection survives across a sweep's radii. */
export interface RegionTrack {
  /** Jaccard index of the matched region's rows and the selection's rows, per radius (ascending). */
  readonly jaccard: Float64Array;
  /** The matched nodes (0-based, in the order added) per radius. */
  readonly nodes: readonly Uint32Array[];
  /** Selected rows that are in the build (the others are left out of S). */
  readonly selectedRows: number;
}

/**
 * Region stability: a radius sweep (radiusSweep, same options) in which, at every radius, the
 * selection (parsed-table rows, e.g. the union of the selected nodes' members) is matched to a
 * connected node set by matchRegion's greedy rule (start at the node holding the most selected
 * rows, ties to the lowest; add the neighbouring node that raises the rows' Jaccard index the
 * most while it rises), reporting that Jaccard index and the node list per radius.
 * Cost: the sweep's, plus O(m + E + k·V) per radius for the matching.
 * @example regionStability(line 0..9 and 15..24, …, rows 0..9, { radii: [1, 2.5, 5.5, 30] }).region.jaccard // => [1, 1, 1, 0.5]
 */
export function regionStability(parsed: ParsedTable, params: SweepParams, selection: ArrayLike<number>, options: SweepOptions = {}): { sweep: RadiusSweep; region: RegionTrack } {
  const now = options.now ?? Date.now;
  const started = now();
  const prepared = prepareRows(parsed, params, options);
  const selected = selectionMask(selection, prepared.usedRows, parsed.rows);
  const jaccard: number[] = [];
  const nodes: Uint32Array[] = [];
  const sweep = sweepPrepared(
    prepared,
    parsed.rows,
    params,
    {
      ...options,
      onCover: (k, cover, balls) => {
        const match = matchRegion(balls.members, balls.rowNodes, cover.edges, selected);
        jaccard[k] = match.jaccard;
        nodes[k] = match.nodes;
        options.onCover?.(k, cover, balls);
      },
    },
    now() - started,
  );
  return { sweep, region: { jaccard: Float64Array.from(jaccard), nodes, selectedRows: selected.reduce((a, b) => a + b, 0) } };
}
