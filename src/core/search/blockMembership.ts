import { checkStop, type RunControl } from "../control.ts";
import type { CompressedLists } from "../lists/compressedLists.ts";
import type { KdTree } from "./kdTree.ts";
import { boxBound } from "./boxBound.ts";
import { scanLeaf } from "./leafScan.ts";
import { closeLists, createListBuilder, finishLists, reserveLists, type ListBuilder } from "../lists/listBuilder.ts";
import { isInBall, judgeRadius, type RowIndex } from "./rowIndex.ts";
import type { Norm } from "./searchSpace.ts";
import type { TreeQuery } from "./treeQuery.ts";

const chunk = 64; // landmarks per pass: their coordinates stay in the first-level cache with a leaf's rows
const pairsPerCheck = 1 << 16; // (landmark, row) pairs scanned between two asks of shouldStop: about a millisecond at 40 columns, where a group of 64 can take 100 ms

/** State of one pass over the tree for a group of landmarks. */
interface Pass {
  readonly index: RowIndex;
  readonly tree: KdTree;
  readonly norm: Norm;
  readonly radius: number;
  readonly limit: number;
  readonly landmarks: Uint32Array;
  readonly marks: Float64Array;
  /** The tree query, its centre moved to each landmark of the group in turn. */
  readonly query: TreeQuery;
  readonly pool: Uint32Array;
  first: number;
  pairs: Uint32Array;
  size: number;
  scanned: number;
  bounded: boolean;
  readonly control: RunControl;
  /** Pairs scanned since shouldStop was last asked. */
  unchecked: number;
}

/**
 * Closed balls of many landmarks, leaf by leaf: landmarks are taken 64 at a time; the tree is
 * walked once per group, each node keeping the group's landmarks whose box bound stays within
 * the threshold (boxBound.ts), and each leaf's rows are scanned against the landmarks left
 * (leafScan.ts); every remaining pair is decided by the reference predicate (isInBall). The same lists as
 * one ball query per landmark (ballRows), members ascending, but a leaf's rows are read once
 * per group instead of once per landmark, which matters when rows do not fit in the cache.
 * (Grouping queries over a tree, as in A. G. Gray and A. W. Moore, NIPS 13, 2001.)
 * Reports progress after every 64 landmarks, and asks shouldStop after every 2¹⁶ pairs scanned too. Cost: O(n·L·d) at worst, O(m log m) for sorting.
 * @example blockMembership(createRowIndex(line0to3, euclidean), 1, Uint32Array.of(0, 2)) // => offsets [0, 2, 5], items [0, 1, 1, 2, 3]
 */
export function blockMembership(index: RowIndex, radius: number, landmarks: Uint32Array, control: RunControl = {}): CompressedLists {
  const builder = createListBuilder(index.table.rows);
  blockMembershipInto(builder, index, radius, landmarks, control);
  return finishLists(builder);
}

/** blockMembership's lists appended to `builder`, one per landmark in order (no final copy). */
export function blockMembershipInto(builder: ListBuilder, index: RowIndex, radius: number, landmarks: Uint32Array, control: RunControl = {}): void {
  const { table, space, tree } = index;
  if (!space || !tree) throw new Error("blockMembership needs a search space");
  const d = table.columns;
  judgeRadius(index, radius);
  const marks = new Float64Array(chunk * d);
  const limit = space.threshold(radius);
  const pass: Pass = {
    index,
    tree,
    norm: space.norm,
    radius,
    limit,
    landmarks,
    marks,
    query: { norm: space.norm, dims: tree.dims, coords: tree.coords, lo: tree.lo, hi: tree.hi, centre: marks, centreBase: 0, limit },
    pool: new Uint32Array((treeDepth(tree.firstChild) + 2) * chunk), // one list per level
    first: 0,
    pairs: new Uint32Array(2 * chunk),
    size: 0,
    scanned: 0,
    bounded: index.mode !== "flat",
    control,
    unchecked: 0,
  };
  for (let first = 0; first < landmarks.length; first += chunk) {
    const group = Math.min(chunk, landmarks.length - first);
    for (let l = 0; l < group; ++l) {
      for (let k = 0; k < d; ++k) pass.marks[l * d + k] = space.points[landmarks[first + l]! * d + k]!;
      pass.pool[l] = l;
    }
    pass.first = first;
    pass.size = 0;
    pass.scanned = 0;
    visit(pass, 0, 0, group);
    // boxes that let over 3/4 of the pairs through are not worth their bounds (see RowIndex.mode)
    if (index.mode === "probe") index.mode = pass.scanned > 0.75 * group * table.rows ? "flat" : "tree";
    pass.bounded = index.mode !== "flat";
    appendGroup(builder, pass.pairs, pass.size, group);
    if (group === chunk) {
      checkStop(control, "the balls");
      control.onProgress?.((first + chunk) / landmarks.length);
    }
  }
}

/** Filters the level's landmark list by the node's box, then recurses, or scans the leaf. */
function visit(pass: Pass, node: number, level: number, count: number): void {
  const { tree, pool, limit, query } = pass;
  const d = tree.dims;
  const from = level * chunk;
  const into = from + chunk;
  let kept = 0;
  for (let t = 0; t < count; ++t) {
    const l = pool[from + t]!;
    query.centreBase = l * d;
    if (!pass.bounded || boxBound(query, node * d) <= limit) pool[into + kept++] = l;
  }
  if (kept === 0) return;
  const child = tree.firstChild[node]!;
  if (child !== 0) {
    visit(pass, child, level + 1, kept);
    visit(pass, child + 1, level + 1, kept);
    return;
  }
  const { found } = pass.index;
  const start = tree.start[node]!;
  const end = tree.end[node]!;
  pass.scanned += kept * (end - start);
  if ((pass.unchecked += kept * (end - start)) >= pairsPerCheck) {
    pass.unchecked = 0;
    checkStop(pass.control, "the balls");
  }
  for (let t = 0; t < kept; ++t) {
    const l = pool[into + t]!;
    query.centreBase = l * d;
    const hits = scanLeaf(query, start, end, found, 0);
    if (pass.size + 2 * hits > pass.pairs.length) {
      const grown = new Uint32Array(Math.max(2 * pass.pairs.length, pass.size + 2 * hits));
      grown.set(pass.pairs.subarray(0, pass.size));
      pass.pairs = grown;
    }
    const centre = pass.landmarks[pass.first + l]!;
    for (let h = 0; h < hits; ++h) {
      const p = found[h]!;
      if (!isInBall(pass.index, centre, p, pass.radius)) continue;
      pass.pairs[pass.size++] = l;
      pass.pairs[pass.size++] = tree.rowAt[p]!;
    }
  }
}

/** Levels below the root of the deepest leaf; children follow their parents in node order. */
function treeDepth(firstChild: Uint32Array): number {
  const level = new Uint8Array(firstChild.length);
  let deepest = 0;
  for (let node = 0; node < firstChild.length; ++node) {
    const child = firstChild[node]!;
    if (child === 0) continue;
    level[child] = level[child + 1] = level[node]! + 1;
    deepest = Math.max(deepest, level[child]!);
  }
  return deepest;
}

/** Appends the rows of (landmark, row) pairs as one ascending list per landmark 0..group−1 (counting sort, then sort within), written straight into the builder. */
function appendGroup(builder: ListBuilder, pairs: Uint32Array, size: number, group: number): void {
  const starts = new Uint32Array(group + 1);
  for (let t = 0; t < size; t += 2) starts[pairs[t]! + 1]!++;
  for (let l = 0; l < group; ++l) starts[l + 1]! += starts[l]!;
  const rows = reserveLists(builder, size / 2);
  const cursor = starts.slice(0, group);
  for (let t = 0; t < size; t += 2) rows[cursor[pairs[t]!]!++] = pairs[t + 1]!;
  for (let l = 0; l < group; ++l) rows.subarray(starts[l]!, starts[l + 1]!).sort();
  closeLists(builder, starts.subarray(1));
}
