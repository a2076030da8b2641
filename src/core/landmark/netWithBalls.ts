import { checkStop, type RunControl } from "../control.ts";
import { rowsToNodes, type CompressedLists } from "../lists/compressedLists.ts";
import type { LandmarkRule } from "../params.ts";
import { ballMembership } from "../search/ballMembership.ts";
import type { RowIndex } from "../search/rowIndex.ts";
import { greedyBalls } from "./greedyBalls.ts";
import { maximinBalls } from "./maximinBalls.ts";
import { visitOrder } from "./visitOrder.ts";

/** Landmarks and balls of one radius, on the rows of a prepared table. */
export interface Balls {
  /** Landmark rows, in the order chosen. */
  readonly landmarks: Uint32Array;
  /** Members of each landmark's closed ball, ascending. */
  readonly members: CompressedLists;
  /** For each row, its nodes ascending (the transpose of `members`). */
  readonly rowNodes: CompressedLists;
}

export interface NetWithBallsOptions extends RunControl {
  /** Let the greedy net finish by first-hit tests where ball queries prune badly (greedyBalls' `firstHit`; default false). */
  firstHit?: boolean;
  /** Names the run in the Cancelled error (default "the sweep"). */
  what?: string;
}

/**
 * Landmarks by rule and their closed balls on an index built once: the one place a rule becomes
 * a net, for the build, the sweep and the seed runs. The rows are visited in the rule's order
 * (visitOrder.ts); greedy rules run greedyBalls (a row not in an earlier landmark's ball becomes
 * a landmark), maximin runs maximinBalls from the order's first row. Balls a net did not keep are
 * found afterwards by ballMembership. Progress: 0.8 for the net, the rest for the balls.
 * Source: S. Har-Peled, Geometric Approximation Algorithms, AMS 2011, §4.2 (greedy nets);
 * T. F. Gonzalez, Theor. Comput. Sci. 38:293–306, 1985 (maximin).
 * Cost: L ball queries through the index, O(n·d) each at worst, plus O(n + m) for the transpose.
 * @example netWithBalls(createRowIndex(line 0, 1, 2, 3, euclidean), 1, "greedy-file-order", 1).landmarks // => Uint32Array [0, 2]
 */
export function netWithBalls(index: RowIndex, radius: number, rule: LandmarkRule, seed: number, options: NetWithBallsOptions = {}): Balls {
  const { landmarks, members } = landmarkBalls(index, radius, rule, seed, options);
  return { landmarks, members, rowNodes: rowsToNodes(members, index.table.rows) };
}

/** netWithBalls without the transpose: the landmarks and each one's ball. */
export function landmarkBalls(index: RowIndex, radius: number, rule: LandmarkRule, seed: number, options: NetWithBallsOptions = {}): Omit<Balls, "rowNodes"> {
  const { firstHit = false, what = "the sweep", onProgress, shouldStop } = options;
  const n = index.table.rows;
  const control = (from: number, span: number): RunControl => ({
    ...(shouldStop ? { shouldStop } : {}),
    onProgress: (fraction) => {
      checkStop(options, what);
      onProgress?.(from + span * fraction);
    },
  });
  const order = visitOrder(rule, seed, n);
  const net =
    rule === "maximin"
      ? n === 0
        ? { landmarks: new Uint32Array(0), members: null }
        : maximinBalls(index, radius, order[0]!, control(0, 0.8))
      : greedyBalls(index, radius, order, { ...control(0, 0.8), firstHit });
  const members = net.members ?? ballMembership(index.table, index.metric, radius, net.landmarks, { ...control(0.8, 0.2), index });
  return { landmarks: net.landmarks, members };
}
