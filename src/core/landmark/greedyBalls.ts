import { checkStop, type RunControl } from "../control.ts";
import type { CompressedLists } from "../lists/compressedLists.ts";
import { ballRows } from "../search/ballRows.ts";
import { firstHitNet } from "./firstHitNet.ts";
import { appendList, createListBuilder, finishLists, type ListBuilder } from "../lists/listBuilder.ts";
import type { RowIndex } from "../search/rowIndex.ts";

/** Progress is the share of `order` visited, reported every 256 rows; a `shouldStop` is asked as often. */
export interface GreedyBallsOptions extends RunControl {
  /** Keep each landmark's ball (default true). */
  balls?: boolean;
  /**
   * Finish with first-hit tests (firstHitNet.ts) once ball queries prove costly (default true).
   * False keeps one ball query per landmark to the end, which the sweep prefers.
   */
  firstHit?: boolean;
  /** Stop as soon as the net has more than this many landmarks (for radius searches; default no limit). */
  maxLandmarks?: number;
  /**
   * Append the balls to this builder instead of returning them (`members` is then null). When the
   * net switched to first-hit tests it holds the balls of the first landmarks only: the caller
   * sees that by its list count and finds the balls afresh.
   */
  into?: ListBuilder;
}

export interface NetWithBalls {
  /** Landmark rows in the order chosen. */
  readonly landmarks: Uint32Array;
  /** Members of each landmark's closed ball, ascending; null when `balls` is false or the net switched to first-hit tests. */
  readonly members: CompressedLists | null;
}

/**
 * Greedy ε-net and its balls in one pass, the one greedy loop of core (the build, the sweep,
 * the seed runs, the default radius and the default range all run it; `order` comes from
 * visitOrder.ts): visit rows in `order`; a row not yet covered becomes a landmark, and its
 * closed ball (ballRows: reference predicate) marks every row within r as covered. Row i is
 * chosen iff no earlier landmark l has within(l, i), the greedy net's rule, since "covered" is
 * that disjunction, whatever order the balls are found in.
 * The balls are the ones ballMembership would list, so the net costs nothing beyond them.
 * When the first queries scan more than n/16 rows each (the index prunes little: high dimension,
 * or no index), the rest of the order is finished by firstHitNet, which only tests rows against
 * landmarks until one covers them, and no balls are returned: ballMembership then finds them
 * group by group (blockMembership.ts), which reads the rows far fewer times than L ball queries.
 * Source: S. Har-Peled, Geometric Approximation Algorithms, AMS 2011, §4.2 (greedy nets).
 * Cost: the L ball queries (ballRows) plus O(n).
 * @example greedyBalls(createRowIndex(line0to3, euclidean), 1, Uint32Array.of(0, 1, 2, 3)).landmarks // => Uint32Array [0, 2]
 */
export function greedyBalls(index: RowIndex, radius: number, order: ArrayLike<number>, options: GreedyBallsOptions = {}): NetWithBalls {
  const { balls = true, firstHit = true, onProgress, maxLandmarks = Infinity, into } = options;
  const n = index.table.rows;
  const covered = new Uint8Array(n);
  const landmarks: number[] = [];
  const builder = into ?? (balls ? createListBuilder(n) : null);
  const before = { ...index.stats };
  const probe = index.tree ? 4 : 1; // queries before judging the index
  for (let k = 0; k < order.length; ++k) {
    const i = order[k]!;
    if (!covered[i]) {
      landmarks.push(i);
      const ball = ballRows(index, i, radius);
      for (let t = 0; t < ball.length; ++t) covered[ball[t]!] = 1;
      if (builder) appendList(builder, ball);
      if (landmarks.length > maxLandmarks) break;
      const queries = index.stats.queries - before.queries;
      if (firstHit && queries >= probe && index.stats.scanned - before.scanned > (queries * n) / 16) {
        const rest = firstHitNet(index, radius, order, { ...options, from: k + 1, covered, maxLandmarks: maxLandmarks - landmarks.length });
        return { landmarks: Uint32Array.from([...landmarks, ...rest]), members: null };
      }
    }
    if ((k & 255) === 255) {
      checkStop(options, "the landmark net");
      onProgress?.((k + 1) / order.length);
    }
  }
  return { landmarks: Uint32Array.from(landmarks), members: builder && !into ? finishLists(builder) : null };
}
