import { rowsToNodes, type CompressedLists } from "../lists/compressedLists.ts";
import { ballRows } from "../search/ballRows.ts";
import { appendList, createListBuilder, finishLists } from "../lists/listBuilder.ts";
import type { RowIndex } from "../search/rowIndex.ts";
import { checkStop, type RunControl } from "../control.ts";
import type { Balls } from "../landmark/netWithBalls.ts";

/** The farthest-point order at the smallest radius, with each landmark's insertion distance. */
export interface MaximinSequence {
  /** Landmarks of the maximin net at the smallest radius, in the order chosen (prepared-table rows). */
  readonly landmarks: Uint32Array;
  /** ρ_t = min over s < t of d(g_s, g_t); ρ_0 = ∞. Nonincreasing up to rounding. */
  readonly insertion: Float64Array;
}

/**
 * Insertion distances of the maximin net at the smallest sweep radius. For a larger radius r
 * the farthest-point run picks the same rows in the same order for as long as each is uncovered,
 * then stops, so its net is the prefix of length first{t ≥ 1 : ρ_t ≤ r} (T. F. Gonzalez,
 * Theor. Comput. Sci. 38:293–306, 1985). Rounding can move that boundary, so every prefix is
 * checked (isMaximinNet). O(T²) distance calls.
 */
export function maximinSequence(index: RowIndex, smallest: Balls, control: RunControl = {}): MaximinSequence {
  const { table, metric } = index;
  const { landmarks } = smallest;
  const insertion = new Float64Array(landmarks.length).fill(Infinity);
  for (let t = 1; t < landmarks.length; ++t) {
    if ((t & 63) === 0) checkStop(control, "the sweep");
    let nearest = Infinity;
    for (let s = 0; s < t; ++s) nearest = Math.min(nearest, metric.distance(table.values, table.columns, landmarks[s]!, landmarks[t]!));
    insertion[t] = nearest;
  }
  return { landmarks, insertion };
}

/** The prefix that should be the maximin net at radius r, with its closed balls (ballRows: reference predicate). O(T) ball queries. */
export function prefixBalls(index: RowIndex, sequence: MaximinSequence, radius: number, control: RunControl = {}): Balls {
  let length = Math.min(1, sequence.landmarks.length);
  while (length < sequence.landmarks.length && sequence.insertion[length]! > radius) length++;
  const landmarks = sequence.landmarks.slice(0, length);
  const builder = createListBuilder(index.table.rows);
  for (let t = 0; t < length; ++t) {
    if ((t & 63) === 0) checkStop(control, "the sweep");
    appendList(builder, ballRows(index, landmarks[t]!, radius));
  }
  const members = finishLists(builder);
  return { landmarks, members, rowNodes: rowsToNodes(members, index.table.rows) };
}

/**
 * Whether landmarks g_0..g_{T−1} are exactly the maximin net at the radius their balls were
 * drawn with: each g_t lies in no earlier ball (so the run picks it: it is the farthest row,
 * ties to the lowest, among a superset of the uncovered rows with the same nearest distances),
 * and every row is covered (so the run stops there). `rowNodes`: each row's nodes ascending. O(n + T).
 * @example isMaximinNet([0, 4, 2], rowNodes of the line 0..4 at r = 1) // => true
 */
export function isMaximinNet(landmarks: ArrayLike<number>, rowNodes: CompressedLists): boolean {
  const { offsets, items } = rowNodes;
  for (let i = 0; i + 1 < offsets.length; ++i) if (offsets[i + 1] === offsets[i]) return false;
  for (let t = 0; t < landmarks.length; ++t) if (items[offsets[landmarks[t]!]!] !== t) return false;
  return true;
}
