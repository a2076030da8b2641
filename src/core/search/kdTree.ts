import type { StepHook } from "../control.ts";
/**
 * A k-d tree over the rows of a row-major matrix, with the tight bounding box of every node.
 * Each node covers a contiguous range of positions; `rowAt` maps positions to rows and `coords`
 * holds the rows' coordinates in position order, so a leaf's rows are adjacent in memory.
 */
export interface KdTree {
  readonly dims: number;
  /** Row at each position; the leaves partition the positions. */
  readonly rowAt: Uint32Array;
  /** Position of each row: positionOf[rowAt[p]] = p. */
  readonly positionOf: Uint32Array;
  /** coords[p·dims + k] = coordinate k of row rowAt[p]. */
  readonly coords: Float64Array;
  /** Position range [start, end) of each node; node 0 is the root, children follow their parent. */
  readonly start: Uint32Array;
  readonly end: Uint32Array;
  /** First child of an inner node (the second is firstChild + 1), or 0 for a leaf. */
  readonly firstChild: Uint32Array;
  /** Smallest and largest coordinate k over the node's rows: lo[node·dims + k], hi[node·dims + k]. */
  readonly lo: Float64Array;
  readonly hi: Float64Array;
}

export interface KdTreeOptions {
  /** Rearrange the caller's `points` into tree order (they become `coords`) instead of copying them. */
  readonly inPlace?: boolean;
  /** Called before splitting a node once 2¹⁶ rows were split since the last call, e.g. to check for cancellation by throwing. */
  readonly onStep?: StepHook;
}

export const defaultLeafSize = 32; // rows per leaf; 16–64 differ by < 10 % in bench/run.ts timings
const sampleSize = 16; // rows sampled per node to pick the split coordinate

/**
 * Builds a k-d tree: split a node at the median of the coordinate with the widest spread over
 * 16 evenly strided rows (all its rows when those are equal), until it holds at most `leafSize`
 * rows or all its rows are equal; then compute every box exactly, leaves from their rows and inner nodes as the
 * union of their children. Source: J. L. Bentley, Commun. ACM 18(9):509–517, 1975 (k-d tree);
 * median by Hoare's FIND (C. A. R. Hoare, Commun. ACM 4(7):321–322, 1961). Boxes skip NaN values.
 * Correctness never depends on the split choice: only on boxes containing their rows.
 * O(n log n + n·d) time, O(n·d) memory for the copy of the rows (none in place).
 * Degenerate input: no rows give one empty leaf; equal rows stay in one leaf of any size.
 * @example kdTree(Float64Array.of(0, 1, 2, 3), 1, 4, 2).firstChild[0] // => 1
 */
export function kdTree(points: Float64Array, dims: number, rows: number, leafSize = defaultLeafSize, options: KdTreeOptions = {}): KdTree {
  const { inPlace = false, onStep } = options;
  if (!(leafSize >= 1)) throw new Error(`invalid leaf size: ${leafSize}`);
  const rowAt = new Uint32Array(rows);
  for (let i = 0; i < rows; ++i) rowAt[i] = i;
  // rows move with their positions, so every pass over a node reads memory in order; in place,
  // the caller's own array is rearranged into tree order (and becomes `coords`) instead of a copy
  const coords = inPlace ? points.subarray(0, rows * dims) : points.slice(0, rows * dims);
  // a split node holds more than leafSize rows and its halves at least ⌈leafSize/2⌉ each
  const capacity = 2 * Math.ceil(rows / Math.ceil(leafSize / 2)) + 1;
  const start = new Uint32Array(capacity);
  const end = new Uint32Array(capacity);
  const firstChild = new Uint32Array(capacity);
  // double precision: single-precision keys collapse where a column's offset dwarfs its spread (raw data, scaling "none"), and every split turns arbitrary
  const keys = new Float64Array(rows);
  const low = new Float64Array(dims);
  const high = new Float64Array(dims);
  end[0] = rows;
  let nodes = 1;
  let handled = 0;
  // nodes are appended in breadth-first order, so every child comes after its parent
  for (let node = 0; node < nodes; ++node) {
    const from = start[node]!;
    const to = end[node]!;
    if (to - from <= leafSize) continue;
    // splitting costs about the node's rows: a step after every 2¹⁶ rows split, wherever in the tree
    if (onStep && (handled += to - from) >= 1 << 16) {
      handled = 0;
      onStep();
    }
    const sampled = widest(coords, dims, from, to, Math.max(1, Math.floor((to - from) / sampleSize)), low, high);
    const k = sampled >= 0 ? sampled : widest(coords, dims, from, to, 1, low, high);
    if (k < 0) continue;
    for (let p = from; p < to; ++p) keys[p] = coords[p * dims + k]!;
    const middle = (from + to) >>> 1;
    selectNth(keys, rowAt, coords, dims, from, to - 1, middle);
    firstChild[node] = nodes;
    start[nodes] = from;
    end[nodes] = middle;
    start[nodes + 1] = middle;
    end[nodes + 1] = to;
    nodes += 2;
  }
  const positionOf = new Uint32Array(rows);
  for (let p = 0; p < rows; ++p) positionOf[rowAt[p]!] = p;
  const lo = new Float64Array(nodes * dims).fill(Infinity);
  const hi = new Float64Array(nodes * dims).fill(-Infinity);
  for (let node = nodes - 1; node >= 0; --node) {
    const base = node * dims;
    const child = firstChild[node]!;
    if (child === 0) {
      for (let p = start[node]!; p < end[node]!; ++p) {
        for (let k = 0; k < dims; ++k) {
          const x = coords[p * dims + k]!;
          if (x < lo[base + k]!) lo[base + k] = x;
          if (x > hi[base + k]!) hi[base + k] = x;
        }
      }
      continue;
    }
    for (let k = 0; k < dims; ++k) {
      const a = child * dims + k;
      const b = a + dims;
      lo[base + k] = lo[a]! < lo[b]! ? lo[a]! : lo[b]!;
      hi[base + k] = hi[a]! > hi[b]! ? hi[a]! : hi[b]!;
    }
  }
  return { dims, rowAt, positionOf, coords, start: start.slice(0, nodes), end: end.slice(0, nodes), firstChild: firstChild.slice(0, nodes), lo, hi };
}

/** Coordinate with the widest spread over the rows at positions from, from + step, … below to, or −1 if they are all equal. */
function widest(coords: Float64Array, dims: number, from: number, to: number, step: number, low: Float64Array, high: Float64Array): number {
  low.fill(Infinity);
  high.fill(-Infinity);
  for (let p = from; p < to; p += step) {
    const a = p * dims;
    for (let k = 0; k < dims; ++k) {
      const x = coords[a + k]!;
      if (x < low[k]!) low[k] = x;
      if (x > high[k]!) high[k] = x;
    }
  }
  let widest = -1;
  let spread = 0;
  for (let k = 0; k < dims; ++k) {
    if (!(high[k]! - low[k]! > spread)) continue;
    spread = high[k]! - low[k]!;
    widest = k;
  }
  return widest;
}

/** Rearranges keys, rowAt and the rows of coords over [left, right] together so that position `nth` holds the key of rank nth. Hoare's FIND. */
function selectNth(keys: Float64Array, rowAt: Uint32Array, coords: Float64Array, dims: number, left: number, right: number, nth: number): void {
  while (left < right) {
    const pivot = keys[nth]!;
    let i = left;
    let j = right;
    while (i <= j) {
      while (keys[i]! < pivot) ++i;
      while (pivot < keys[j]!) --j;
      if (i <= j) {
        const key = keys[i]!;
        keys[i] = keys[j]!;
        keys[j] = key;
        const row = rowAt[i]!;
        rowAt[i] = rowAt[j]!;
        rowAt[j] = row;
        for (let a = i * dims, b = j * dims, k = 0; k < dims; ++k) {
          const x = coords[a + k]!;
          coords[a + k] = coords[b + k]!;
          coords[b + k] = x;
        }
        ++i;
        --j;
      }
    }
    if (j < nth) left = i;
    if (nth < i) right = j;
  }
}
