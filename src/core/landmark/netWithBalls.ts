import type { LandmarkRule } from "../params.ts";
import { rowsToNodes, type CompressedLists } from "../lists/compressedLists.ts";
import { ballMembership } from "../search/ballMembership.ts";
import { randomSource, shuffledOrder } from "../random.ts";
import { ballRows } from "../search/ballRows.ts";
import { appendList, createListBuilder, finishLists } from "../lists/listBuilder.ts";
import { maximinBalls } from "./maximinBalls.ts";
import type { RowIndex } from "../search/rowIndex.ts";
import { checkStop, type RunControl } from "../control.ts";

/** Landmarks and balls of one radius, on the rows of a prepared table. */
export interface Balls {
  /** Landmark rows, in the order chosen. */
  readonly landmarks: Uint32Array;
  /** Members of each landmark's closed ball, ascending. */
  readonly members: CompressedLists;
  /** For each row, its nodes ascending (the transpose of `members`). */
  readonly rowNodes: CompressedLists;
}

/**
 * Landmarks by rule and their closed balls, as buildCover chooses them, on an index built once.
 * Greedy and random: visit rows in file order or in the order shuffled by the seed; a row not in
 * any earlier landmark's ball becomes a landmark, and its ball (ballRows: reference predicate)
 * marks the rows it covers, so a row is chosen iff no earlier landmark is within r, greedyNet's
 * rule. One ball query per landmark, with no further pass (on the bench tables this beat the
 * first-hit net plus grouped ball queries at every size). Maximin: maximinBalls from the row
 * floor(u · n) for the seed's first draw u, balls by ballMembership when it returns none.
 * Source: S. Har-Peled, Geometric Approximation Algorithms, AMS 2011, §4.2 (greedy nets).
 * Cost: L ball queries through the index, O(n·d) each at worst.
 * @example netWithBalls(createRowIndex(line 0, 1, 2, 3, euclidean), 1, "greedy-file-order", 1).landmarks // => Uint32Array [0, 2]
 */
export function netWithBalls(index: RowIndex, radius: number, rule: LandmarkRule, seed: number, control: RunControl = {}): Balls {
  const n = index.table.rows;
  const onProgress = (done: number, total: number): void => {
    checkStop(control, "the sweep");
    control.onProgress?.(done / total);
  };
  let landmarks: Uint32Array = new Uint32Array(0);
  let members: CompressedLists = { offsets: Uint32Array.of(0), items: new Uint32Array(0) };
  if (rule === "maximin" && n > 0) {
    const net = maximinBalls(index, radius, Math.floor(randomSource(seed)() * n), { onProgress });
    landmarks = net.landmarks;
    members = net.members ?? ballMembership(index.table, index.metric, radius, landmarks, onProgress, { index });
  } else if (rule !== "maximin") {
    const order = rule === "greedy-shuffled" ? shuffledOrder(n, randomSource(seed)) : Uint32Array.from({ length: n }, (_, i) => i);
    const covered = new Uint8Array(n);
    const chosen: number[] = [];
    const builder = createListBuilder(n);
    for (let k = 0; k < n; ++k) {
      if ((k & 4095) === 4095) onProgress(k + 1, n);
      const i = order[k]!;
      if (covered[i]) continue;
      chosen.push(i);
      const ball = ballRows(index, i, radius);
      for (let t = 0; t < ball.length; ++t) covered[ball[t]!] = 1;
      appendList(builder, ball);
    }
    landmarks = Uint32Array.from(chosen);
    members = finishLists(builder);
  }
  return { landmarks, members, rowNodes: rowsToNodes(members, n) };
}
