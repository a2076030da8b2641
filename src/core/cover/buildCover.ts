import { ballMembership, rowsToNodes, type CompressedLists } from "../graph/ballMembership.ts";
import { components } from "../graph/components.ts";
import { nerveBetti, type NerveBetti } from "../graph/nerveBetti.ts";
import { nerveTriangles } from "../graph/nerveTriangles.ts";
import { overlapEdges, type EdgeList } from "../graph/overlapEdges.ts";
import { chooseLandmarks } from "../landmark/chooseLandmarks.ts";
import { maybeMetric } from "../metric/metrics.ts";
import { scaleTable } from "../scale/scaleTable.ts";
import type { ParsedTable } from "../table/types.ts";
import { excludeUndefinedRows } from "./excludeUndefinedRows.ts";
import { maybeLandmarkRule, maybeMissingPolicy, maybeScale, type CoverParams } from "./params.ts";
import { selectFeatures } from "../table/selectFeatures.ts";

export type BuildPhase = "scale" | "landmarks" | "members" | "edges" | "components" | "loops";

export interface CoverResult {
  readonly params: CoverParams;
  readonly rowsRead: number;
  /** Parsed-table rows (0-based) that entered the build, ascending. */
  readonly usedRows: Uint32Array;
  /** Parsed-table rows left out for a missing feature value (policy "drop"), ascending. */
  readonly droppedRows: Uint32Array;
  /** Parsed-table rows left out because the metric is undefined on them (cosine: zero row; correlation: constant row). */
  readonly undefinedRows: Uint32Array;
  /** Values filled in per feature (policies "median" and "mean"). */
  readonly imputed: Readonly<Record<string, number>>;
  readonly constantColumns: readonly string[];
  /** Landmark of node k (0-based) as a parsed-table row; node k is shown as k + 1. */
  readonly landmarks: Uint32Array;
  /** Members of node k as parsed-table rows, ascending. */
  readonly members: CompressedLists;
  readonly edges: EdgeList;
  readonly component: Uint32Array;
  readonly componentCount: number;
  /** E − V + C: independent cycles of the graph (counts every triangle of mutually overlapping balls). */
  readonly cycleRank: number;
  /** b0, b1 over GF(2) of the nerve's 2-skeleton; null when `loops: false`. */
  readonly betti: NerveBetti | null;
  /** Milliseconds per phase, by the clock passed in. */
  readonly timings: Readonly<Record<BuildPhase, number>>;
}

export interface BuildOptions {
  onProgress?: (phase: BuildPhase, fraction: number) => void;
  now?: () => number;
  /** Compute triangles and b1 (default true). */
  loops?: boolean;
}

/**
 * Builds the ball-cover graph: select rows (missing-value policy), scale and weight, leave out
 * rows where the metric is undefined, choose an r-net of landmarks, put a closed ball of radius
 * r around each, one node per ball, an edge wherever two balls share rows (the 1-skeleton of
 * the nerve of the cover), connected components, cycle rank and the nerve's b0 and b1.
 * Nerve: H. Edelsbrunner and J. Harer, Computational Topology, AMS 2010, §III.2.
 * Cost: O(n·L·d) for n rows, L landmarks, d features, plus the loops step.
 */
export function buildCover(parsed: ParsedTable, params: CoverParams, options: BuildOptions = {}): CoverResult {
  const { onProgress, now = Date.now, loops = true } = options;
  const metric = maybeMetric(params.metric);
  maybeScale(params.scale);
  const rule = maybeLandmarkRule(params.landmarks);
  const missing = maybeMissingPolicy(params.missing ?? "drop");
  if (!(params.radius > 0) || !Number.isFinite(params.radius)) throw new Error(`invalid radius: ${params.radius}`);
  if (!Number.isInteger(params.seed)) throw new Error(`invalid seed: ${params.seed}`);

  let t = now();
  const lap = (): number => {
    const t1 = now();
    const elapsed = t1 - t;
    t = t1;
    return elapsed;
  };
  onProgress?.("scale", 0);
  const selection = selectFeatures(parsed, params.features, missing);
  const scaled = scaleTable(selection.table, params.scale, params.weights);
  const defined = excludeUndefinedRows(scaled.table, metric, selection.usedRows);
  const table = defined.table;
  const scaleTime = lap();

  onProgress?.("landmarks", 0);
  const centers = chooseLandmarks(table, metric, params.radius, rule, params.seed, (fraction) => onProgress?.("landmarks", fraction));
  const landmarkTime = lap();

  onProgress?.("members", 0);
  const local = ballMembership(table, metric, params.radius, centers, (done, total) => onProgress?.("members", done / total));
  const memberTime = lap();

  onProgress?.("edges", 0);
  const rowNodes = rowsToNodes(local, table.rows);
  const edges = overlapEdges(rowNodes, centers.length);
  const edgeTime = lap();

  const { component, count } = components(centers.length, edges.source, edges.target);
  const componentTime = lap();

  onProgress?.("loops", 0);
  const betti = loops ? nerveBetti(centers.length, edges, count, nerveTriangles(rowNodes, centers.length)) : null;
  const loopTime = lap();

  const toParsedRow = (i: number): number => defined.usedRows[i]!;
  return {
    params: { ...params, features: [...params.features] },
    rowsRead: parsed.rows,
    usedRows: defined.usedRows,
    droppedRows: selection.droppedRows,
    undefinedRows: defined.undefinedRows,
    imputed: selection.imputed,
    constantColumns: scaled.constantColumns,
    landmarks: centers.map(toParsedRow),
    members: { offsets: local.offsets, items: local.items.map(toParsedRow) },
    edges,
    component,
    componentCount: count,
    cycleRank: edges.source.length - centers.length + count,
    betti,
    timings: { scale: scaleTime, landmarks: landmarkTime, members: memberTime, edges: edgeTime, components: componentTime, loops: loopTime },
  };
}
