import { rowsToNodes, type CompressedLists } from "../lists/compressedLists.ts";
import { createListBuilder, transposeBuilt, type ListBuilder } from "../lists/listBuilder.ts";
import { treeOrderIndex } from "../search/treeOrderIndex.ts";
import { components } from "../nerve/components.ts";
import { Cancelled, lapClock, type PhasedControl, type RunControl } from "../control.ts";
import type { ShareArray } from "../search/indexParts.ts";
import { runCoverPart, type PartOutput } from "./coverParts.ts";
import { ballsInParts, countEdges, isShared, type PartRequest, type Split } from "./splitSteps.ts";
import { maybeMetric } from "../metric/metrics.ts";
import type { Metric } from "../metric/types.ts";
import { greedyBalls } from "../landmark/greedyBalls.ts";
import { landmarkBalls } from "../landmark/netWithBalls.ts";
import { visitOrder } from "../landmark/visitOrder.ts";
import { createRowIndex } from "../search/rowIndex.ts";
import type { ParsedTable } from "../table/types.ts";
import type { CoverGraph } from "./coverGraph.ts";
import { prepareFeatures, type PreparedFeatures } from "../scale/prepareFeatures.ts";
import { maybeLandmarkRule, maybeMissingPolicy, maybeScale, type CoverParams, type LandmarkRule } from "../params.ts";
import { nerveLoops, type LoopCounts } from "../nerve/nerveLoops.ts";

export type { PartRequest };

export type BuildPhase = "scale" | "landmarks" | "members" | "edges" | "components" | "loops";

/** A build: its parameters, which rows went in or were left out and why (PreparedFeatures), and its graph. */
export interface CoverResult extends Omit<PreparedFeatures, "table">, CoverGraph {
  readonly params: CoverParams;
  readonly rowsRead: number;
  /** b0, b1 over GF(2) of the nerve's 2-skeleton; null when `loops: false`. */
  readonly betti: LoopCounts | null;
  /** Milliseconds per phase, by the clock passed in. */
  readonly timings: Readonly<Record<BuildPhase, number>>;
}

/**
 * onPhase announces each phase, onProgress reports the fraction of the current phase (a throw
 * from either, core's Cancelled, stops the build); shouldStop is asked inside long steps,
 * including those that report no progress (selecting, scaling, the tree), and true stops the
 * build with Cancelled.
 */
export interface BuildOptions extends PhasedControl<BuildPhase> {
  now?: () => number;
  /** Compute triangles and b1 (default true). */
  loops?: boolean;
  /**
   * Split the balls found after the net and the edge count into this many parts (default 1).
   * buildCover runs them one after another in this thread; buildCoverOnThreads gives its runner's
   * thread count. The result is the same whatever the count.
   */
  parts?: number;
  /** Least work (landmarks × rows for the balls, row pairs for the edges) worth splitting (default 2²², about 10 ms of either). */
  minPartWork?: number;
}

/** The build as steps: it yields each split step's request and is resumed with the remote parts' outputs, in order. */
export type CoverSteps = Generator<PartRequest, CoverResult, PartOutput[]>;


/**
 * Builds the ball-cover graph: select rows (missing-value policy), scale and weight, leave out
 * rows where the metric is undefined, choose an r-net of landmarks, put a closed ball of radius
 * r around each, one node per ball, an edge wherever two balls share rows (the 1-skeleton of
 * the nerve of the cover), connected components, cycle rank and the nerve's b0 and b1.
 * Nerve: H. Edelsbrunner and J. Harer, Computational Topology, AMS 2010, §III.2.
 * One candidate index (search/rowIndex.ts) serves the net and the balls; it only skips pairs the
 * reference predicate provably rejects. Where it prunes well, each landmark's ball is found when
 * the landmark is placed (search/greedyBalls.ts, search/maximinBalls.ts) and the "members" phase
 * only transposes; otherwise the balls are found afterwards, 64 landmarks at a time. With
 * `parts` above 1 those balls and the edge count run in ranges (splitSteps.ts), joined in order:
 * the same lists as one part.
 * Memory: the scaled rows are the build's one copy of the table; greedy and random nets index
 * them in tree order in place (search/treeOrderIndex.ts), keep the balls packed as varint gaps
 * (search/packedLists.ts), and reuse the rows' buffer for the row → nodes lists once the index
 * is let go, before edges.
 * Cost: O(n·L·d) at worst for n rows, L landmarks, d features, plus the loops step.
 */
export function buildCover(parsed: ParsedTable, params: CoverParams, options: BuildOptions = {}): CoverResult {
  const steps = coverSteps(parsed, params, options, null);
  for (let next = steps.next(); ; ) {
    if (next.done) return next.value;
    const { task, remote, local } = next.value;
    local();
    next = steps.next(remote.map((range) => runCoverPart(task, range, options)));
  }
}

/**
 * buildCover as steps (see CoverSteps): buildCover drives them in one thread, buildCoverOnThreads
 * on several. `share` copies the arrays a split step sends to other threads into shared memory.
 */
export function* coverSteps(parsed: ParsedTable, params: CoverParams, options: BuildOptions, share: ShareArray | null): CoverSteps {
  const { onProgress, now = Date.now, loops = true, parts = 1, minPartWork = 1 << 22 } = options;
  if (!(Number.isInteger(parts) && parts >= 1)) throw new Error(`invalid part count: ${parts}`);
  const split: Split = { parts, minWork: minPartWork, share };
  const enter = (phase: BuildPhase): void => {
    options.onPhase?.(phase);
    onProgress?.(0);
  };
  const metric = maybeMetric(params.metric);
  maybeScale(params.scale);
  const rule = maybeLandmarkRule(params.landmarks);
  maybeMissingPolicy(params.missing ?? "drop");
  if (!(params.radius > 0) || !Number.isFinite(params.radius)) throw new Error(`invalid radius: ${params.radius}`);
  if (!Number.isInteger(params.seed)) throw new Error(`invalid seed: ${params.seed}`);

  const lap = lapClock(now);
  enter("scale");
  const found = yield* landmarksAndBalls(parsed, params, { ...options, enter, metric, rule, lap, split });
  const { centers, prepared, scaleTime, landmarkTime } = found;
  // row → nodes; and node → rows ascending: the lists as found when they hold rows, else the
  // transpose back, made after the lists by tree position are let go
  const rowNodes = rowNodesOf(found.balls!, prepared.rows);
  const rowLists = found.balls!.kind === "rows" ? found.balls!.lists : null;
  found.balls = null;
  const local = rowLists ?? rowsToNodes(rowNodes, centers.length);
  const memberTime = lap();

  enter("edges");
  const edges = yield* countEdges(rowNodes, centers.length, local, split);
  const edgeTime = lap();

  const { component, count } = components(centers.length, edges.source, edges.target);
  const componentTime = lap();

  enter("loops");
  // b1 by the spanning-forest route (same value as nerveBetti's full reduction, without listing every triangle)
  const betti = loops ? nerveLoops(rowNodes, centers.length, edges, count, onProgress ? { onProgress } : {}) : null;
  const loopTime = lap();

  const toParsedRow = (i: number): number => prepared.usedRows[i]!;
  // the lists are this build's own: renumber their rows in place rather than beside a copy
  const items = local.items;
  for (let t = 0; t < items.length; ++t) items[t] = prepared.usedRows[items[t]!]!;
  return {
    params: { ...params, features: [...params.features], ...(params.oneHot ? { oneHot: [...params.oneHot] } : {}) },
    rowsRead: parsed.rows,
    usedRows: prepared.usedRows,
    droppedRows: prepared.droppedRows,
    undefinedRows: prepared.undefinedRows,
    imputed: prepared.imputed,
    constantColumns: prepared.constantColumns,
    landmarks: centers.map(toParsedRow),
    members: { offsets: local.offsets, items },
    edges,
    component,
    componentCount: count,
    cycleRank: edges.source.length - centers.length + count,
    betti,
    timings: { scale: scaleTime, landmarks: landmarkTime, members: memberTime, edges: edgeTime, components: componentTime, loops: loopTime },
  };
}

/** Each landmark's ball: lists of rows, or lists of tree positions (row rowAt[p]) as found, packed (search/packedLists.ts). */
type FoundBalls =
  | { readonly kind: "rows"; readonly lists: CompressedLists }
  | { readonly kind: "positions"; readonly lists: ListBuilder; readonly rowAt: Uint32Array; readonly spare: ArrayBufferLike | null };

/** What a build has settled before it reads the rows: the metric, the rule, its clock and its hooks. */
interface BuildRun extends Pick<BuildOptions, "onProgress" | "shouldStop"> {
  /** Announces a phase and reports its start. */
  readonly enter: (phase: BuildPhase) => void;
  readonly metric: Metric;
  readonly rule: LandmarkRule;
  /** Milliseconds since the last lap. */
  readonly lap: () => number;
  readonly split: Split;
}

interface FoundNet {
  /** Landmark rows (of the prepared table), in the order chosen. */
  readonly centers: Uint32Array;
  /** Dropped by the caller once transposed, so that the lists by position can be freed. */
  balls: FoundBalls | null;
  readonly prepared: Omit<PreparedFeatures, "table"> & { readonly rows: number };
  readonly scaleTime: number;
  readonly landmarkTime: number;
}

/**
 * The scaled rows, their index, the landmarks and their balls, in a function of their own so that
 * the scaled rows and the index can be freed before edges and loops. Greedy and random nets run
 * on the index in tree order (search/treeOrderIndex.ts), which holds the only scaled copy of the
 * table, and keep their balls as found, packed as varint gaps (no final copy); maximin keeps row
 * numbers, because its ties go to the lowest row. Laps the clock after scaling and after the net;
 * the caller times the balls, which it turns into lists by row.
 */
function* landmarksAndBalls(parsed: ParsedTable, params: CoverParams, run: BuildRun): Generator<PartRequest, FoundNet, PartOutput[]> {
  const { metric, rule, lap, enter, onProgress, shouldStop, split } = run;
  const step = (): void => {
    if (shouldStop?.()) throw new Cancelled("the build");
  };
  const { table, ...rest } = prepareFeatures(parsed, params, step);
  const prepared = { ...rest, rows: table.rows };
  const scaleTime = lap();
  const n = table.rows;
  const control: RunControl = { ...(shouldStop ? { shouldStop } : {}), ...(onProgress ? { onProgress } : {}) };
  const membersProgress = (done: number, total: number): void => onProgress?.(done / total);

  enter("landmarks");
  const indexOptions = { onStep: step }; // a chance to cancel while the tree is built
  const ordered = rule === "maximin" ? null : treeOrderIndex(table, metric, indexOptions); // `table` is rearranged from here on
  if (ordered?.rowAt) {
    const { index, rowAt } = ordered;
    // visit the rows in the rule's order (visitOrder), at their tree positions
    let lists = createListBuilder(n, { packed: true });
    const net = greedyBalls(index, params.radius, atTreePositions(visitOrder(rule, params.seed, n), rowAt), { ...control, into: lists });
    const landmarkTime = lap();
    enter("members");
    let searched = index;
    if (lists.offsets.length - 1 === net.landmarks.length) {
      // balls found with the net: the same reports as ballMembership's, after every 64 landmarks
      for (let k = 64; k <= net.landmarks.length; k += 64) membersProgress(k, net.landmarks.length);
    } else {
      lists = createListBuilder(n, { packed: true });
      searched = yield* ballsInParts(lists, index, params.radius, net.landmarks, control, split);
    }
    const centers = net.landmarks.map((p) => rowAt[p]!);
    // the scaled rows (in tree order) are not read again: their buffer can hold the row → nodes
    // lists, when it is the build's own whole buffer (prepareFeatures makes it so, and so does
    // sharing it; checked anyway). A shared buffer is no ArrayBuffer, hence the second test.
    const { buffer, byteOffset } = searched.table.values;
    const spare = byteOffset === 0 && (buffer instanceof ArrayBuffer || isShared(buffer)) ? buffer : null;
    return { centers, balls: { kind: "positions", lists, rowAt, spare }, prepared, scaleTime, landmarkTime };
  }
  const index = ordered?.index ?? createRowIndex(table, metric, indexOptions);
  // the net's share of progress goes to "landmarks"; balls it did not keep are found inside
  const net = landmarkBalls(index, params.radius, rule, params.seed, { ...control, firstHit: true, what: "the build" });
  const centers = net.landmarks;
  const landmarkTime = lap();
  enter("members");
  for (let k = 64; k <= centers.length; k += 64) membersProgress(k, centers.length);
  return { centers, balls: { kind: "rows", lists: net.members }, prepared, scaleTime, landmarkTime };
}

/** The visit order with each row replaced by its tree position (in place; the order is the caller's own). */
function atTreePositions(order: Uint32Array, rowAt: Uint32Array): Uint32Array {
  const n = rowAt.length;
  const positionOf = new Uint32Array(n);
  for (let p = 0; p < n; ++p) positionOf[rowAt[p]!] = p;
  for (let k = 0; k < n; ++k) order[k] = positionOf[order[k]!]!;
  return order;
}

/** For each row, the nodes whose balls hold it, ascending. */
function rowNodesOf(balls: FoundBalls, rows: number): CompressedLists {
  return balls.kind === "rows" ? rowsToNodes(balls.lists, rows) : transposeBuilt(balls.lists, rows, balls.rowAt, balls.spare ?? undefined);
}

