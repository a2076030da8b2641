import { checkStop, type RunControl } from "../control.ts";
import type { RowIndex } from "../search/rowIndex.ts";
import type { Norm } from "../search/searchSpace.ts";

/** Progress is the share of `order` visited, reported every 256 rows; a `shouldStop` is asked as often. */
export interface FirstHitOptions extends RunControl {
  /** First position of `order` to visit (default 0). */
  from?: number;
  /** Rows already covered by earlier landmarks (they are skipped); default none. */
  covered?: Uint8Array;
  /** Stop as soon as more than this many landmarks were chosen here (default no limit). */
  maxLandmarks?: number;
}

/**
 * Fast variant of greedyBalls (the one greedy loop), which hands over to it mid-order: the same
 * net for the same order, held equal on tables of a few thousand rows by test/core/landmark/fastVariants.test.ts.
 * Greedy ε-net by first-hit tests: visit order[from..]; a row not in `covered` is tested against
 * the landmarks chosen here so far until one lies within r (the reference predicate decides);
 * if none does, it becomes a landmark. The landmark that last covered a row of the same block of
 * 32 tree positions (rows close in space) is tried first. In a search space, four landmarks are screened at a time
 * by their norm values (Σ δ² etc. in column order, pruned once all four exceed the threshold,
 * which proves the predicate rejects them), and only survivors go to the predicate. Which
 * landmark is found first does not matter: a row is chosen iff none is within r.
 * Returns the new landmarks in the order chosen. O(rows · tests until the first hit · d).
 * @example firstHitNet(createRowIndex(line0to3, euclidean), 1, Uint32Array.of(0, 1, 2, 3)) // => Uint32Array [0, 2]
 */
export function firstHitNet(index: RowIndex, radius: number, order: ArrayLike<number>, options: FirstHitOptions = {}): Uint32Array {
  const { from = 0, covered, onProgress, maxLandmarks = Infinity } = options;
  const { table, space } = index;
  const { columns: d } = table;
  const points = space ? space.points : table.values;
  const limit = space ? space.threshold(radius) : Infinity;
  const norm = space ? space.norm : "squares";
  const landmarks: number[] = [];
  // landmark coordinates, packed; borrowed by coveredBy for this call, grown in place
  const hits: HitContext = { index, landmarks, marks: new Float64Array(16 * d), points, norm, limit, radius };
  // the last landmark found covering a row of each block of 32 tree positions (neighbours in space)
  const block = (i: number): number => (index.tree ? index.tree.positionOf[i]! : i) >>> 5;
  const hint = new Int32Array(Math.ceil(table.rows / 32) + 1).fill(-1);
  for (let k = from; k < order.length; ++k) {
    const i = order[k]!;
    const tried = covered?.[i] ? -1 : hint[block(i)]!;
    const found = covered?.[i] ? 0 : tried >= 0 && index.metric.within(table.values, d, landmarks[tried]!, i, radius) ? tried : coveredBy(hits, i);
    if (found >= 0) {
      if (!covered?.[i]) hint[block(i)] = found;
    } else {
      hint[block(i)] = landmarks.length;
      if ((landmarks.length + 1) * d > hits.marks.length) {
        const grown = new Float64Array(2 * hits.marks.length);
        grown.set(hits.marks);
        hits.marks = grown;
      }
      hits.marks.set(points.subarray(i * d, i * d + d), landmarks.length * d);
      landmarks.push(i);
      if (landmarks.length > maxLandmarks) break;
    }
    if ((k & 255) === 255) {
      checkStop(options, "the landmark net");
      onProgress?.((k + 1) / order.length);
    }
  }
  return Uint32Array.from(landmarks);
}

/** What the first-hit tests of one net read: the landmarks so far, their packed coordinates, the norm and threshold. */
interface HitContext {
  readonly index: RowIndex;
  readonly landmarks: number[];
  marks: Float64Array;
  readonly points: Float64Array;
  readonly norm: Norm;
  readonly limit: number;
  readonly radius: number;
}

/** Index (into `landmarks`) of a landmark within r of row i, or −1. */
function coveredBy(context: HitContext, i: number): number {
  const { index, landmarks, marks, points, norm, limit, radius } = context;
  const { metric, table } = index;
  const { values, columns: d } = table;
  const within = (landmark: number): boolean => metric.within(values, d, landmark, i, radius);
  const a = i * d;
  const m = landmarks.length;
  let l = 0;
  for (; index.space && l + 4 <= m; l += 4) {
    const b0 = l * d;
    const b1 = b0 + d;
    const b2 = b1 + d;
    const b3 = b2 + d;
    let s0 = 0;
    let s1 = 0;
    let s2 = 0;
    let s3 = 0;
    for (let k = 0; k < d; ) {
      const stop = k + 8 < d ? k + 8 : d;
      for (; k < stop; ++k) {
        const x = points[a + k]!;
        let e0 = marks[b0 + k]! - x;
        let e1 = marks[b1 + k]! - x;
        let e2 = marks[b2 + k]! - x;
        let e3 = marks[b3 + k]! - x;
        if (norm === "squares") {
          s0 += e0 * e0;
          s1 += e1 * e1;
          s2 += e2 * e2;
          s3 += e3 * e3;
          continue;
        }
        e0 = Math.abs(e0);
        e1 = Math.abs(e1);
        e2 = Math.abs(e2);
        e3 = Math.abs(e3);
        const max = norm === "max";
        s0 = max ? Math.max(s0, e0) : s0 + e0;
        s1 = max ? Math.max(s1, e1) : s1 + e1;
        s2 = max ? Math.max(s2, e2) : s2 + e2;
        s3 = max ? Math.max(s3, e3) : s3 + e3;
      }
      if (s0 > limit && s1 > limit && s2 > limit && s3 > limit) break;
    }
    if (s0 <= limit && within(landmarks[l]!)) return l;
    if (s1 <= limit && within(landmarks[l + 1]!)) return l + 1;
    if (s2 <= limit && within(landmarks[l + 2]!)) return l + 2;
    if (s3 <= limit && within(landmarks[l + 3]!)) return l + 3;
  }
  for (; l < m; ++l) if (within(landmarks[l]!)) return l;
  return -1;
}
