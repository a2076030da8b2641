import { checkStop, type RunControl } from "../control.ts";
import { appendList, createListBuilder, finishLists } from "../lists/listBuilder.ts";
import { ballRows } from "../search/ballRows.ts";
import { relaxNearest } from "../search/relaxNearest.ts";
import type { RowIndex } from "../search/rowIndex.ts";
import type { NetWithBalls } from "./greedyBalls.ts";

/** Progress is the share of rows covered, reported after each landmark; a `shouldStop` is asked as often. */
export interface MaximinBallsOptions extends RunControl {
  /** Also return each landmark's ball (default true). */
  balls?: boolean;
}

/**
 * Maximin (farthest-point) r-net and its balls: from `start`, each landmark's closed ball
 * (ballRows: reference predicate) covers rows; every row still uncovered keeps
 * nearest = min over landmarks of metric.distance(landmark, row) (relaxNearest.ts, which skips
 * only rows it proves cannot get smaller); the next landmark is the uncovered row with the
 * largest nearest distance, ties to the lowest row; stop when all rows are covered.
 * The one maximin loop of core (netWithBalls runs it). The same net, bit for bit, as the plain definition (test/core/support/bruteForce.ts): coverage is the same disjunction of
 * predicate decisions, and `nearest` takes the same minimum of the same computed distances.
 * Source: T. F. Gonzalez, Theor. Comput. Sci. 38:293–306, 1985.
 * Cost: L ball queries, L nearest-distance passes (pruned by the tree), O(n) per landmark for
 * the farthest row among the uncovered.
 * @example maximinBalls(createRowIndex(line0to4, euclidean), 1, 0).landmarks // => Uint32Array [0, 4, 2]
 */
export function maximinBalls(index: RowIndex, radius: number, start: number, options: MaximinBallsOptions = {}): NetWithBalls {
  const { balls = true, onProgress } = options;
  const n = index.table.rows;
  const covered = new Uint8Array(n);
  const nearest = new Float64Array(n).fill(Infinity);
  const builder = balls ? createListBuilder(n) : null;
  let uncovered = Uint32Array.from({ length: n }, (_, i) => i);
  let coveredCount = 0;
  const landmarks: number[] = [];
  const bounds = { tight: null as Float64Array | null };
  let next = start;
  while (next >= 0) {
    landmarks.push(next);
    const ball = ballRows(index, next, radius);
    for (let t = 0; t < ball.length; ++t) {
      const i = ball[t]!;
      if (covered[i]) continue;
      covered[i] = 1;
      coveredCount++;
    }
    if (builder) appendList(builder, ball);
    relaxNearest(index, next, nearest, covered, uncovered, bounds);
    let kept = 0;
    next = -1;
    let farthest = -Infinity;
    for (let t = 0; t < uncovered.length; ++t) {
      const i = uncovered[t]!;
      if (covered[i]) continue;
      uncovered[kept++] = i;
      if (!(nearest[i]! > farthest)) continue;
      farthest = nearest[i]!;
      next = i;
    }
    uncovered = uncovered.subarray(0, kept);
    checkStop(options, "the landmark net");
    onProgress?.(coveredCount / n);
  }
  return { landmarks: Uint32Array.from(landmarks), members: builder && finishLists(builder) };
}
