import type { CompressedLists } from "../lists/compressedLists.ts";
import type { EdgeList } from "./overlapEdges.ts";
import { checkStop, type RunControl } from "../control.ts";
import { GrowableInts } from "./growableInts.ts";
import { rankOfSortedColumns } from "./sortedColumnRank.ts";

/** b0 and b1 over GF(2) of the 2-skeleton of the sampled nerve. */
export interface LoopCounts {
  readonly b0: number;
  readonly b1: number;
}

const none = -1;
const pairBitsLimit = 2 ** 27; // bits (16 MB)
const denseLimit = 2048; // nodes: the packed upper triangle then holds at most 2M slots (8 MB)
const denseRatio = 8; // and at most 8 slots per edge: sparser graphs look edges up instead

/**
 * b0 and b1 over GF(2) of the sampled nerve's 2-skeleton, equal to nerveBetti's, by a discrete
 * Morse reduction that leaves only a few thousand edges to eliminate.
 *
 * Triangles: only the fan triangles are needed, (v, b, c) for a row whose lowest node is v and
 * which also lies in b < c: every nerve triangle {a, b, c} lies in some row's node set, with
 * lowest node v, and there ∂{a, b, c} = ∂{v, b, c} + ∂{v, a, c} + ∂{v, a, b} over GF(2) (the
 * boundary of the tetrahedron {v, a, b, c} is zero), so they span the same boundaries and give
 * the same b1.
 *
 * Matching (R. Forman, "Morse theory for cell complexes", Adv. Math. 134 (1998) 90–145, §2 and
 * Thm 8.2): node c goes with edge (p, c), p the lowest neighbour of c, when p < c; edge (b, c)
 * goes with the fan triangle (m, b, c), m the lowest node of any row lying in b and c, when
 * m < b. Each pair adds a node below the cell's lowest one, so along any gradient path the lowest
 * node falls: the matching is acyclic, and no cell is matched twice (an edge (p, c) with p the
 * lowest neighbour of c has no row below p). Unmatched cells are critical: c0 nodes, c1 edges
 * and the remaining fan triangles.
 *
 * Homology from the critical cells (K. Mischaikow and V. Nanda, "Morse theory for filtrations and
 * efficient computation of persistent homology", Discrete Comput. Geom. 50 (2013) 330–353, §4):
 *   b1 = c1 − (c0 − b0) − rank ∂2ᴹ,
 * where ∂2ᴹ(t) = flow(∂t) and the flow of an edge is itself if critical, 0 if matched with a
 * node, and flow(∂t − e) = flow(m, b) + flow(m, c) if matched with t = (m, b, c). Rows are taken
 * by their lowest node, ascending, so each edge's flow is known before it is used: its partner
 * triangle has the lowest apex, met first. On covers of 100,000 rows an edge's flow holds about
 * one critical edge (seven at most, measured), so ∂2ᴹ is a few thousand sparse rows, reduced by
 * lowest pivot (sortedColumnRank.ts).
 *
 * Cost: O(Σ_rows c²) for c balls per row: one edge look-up per pair of a row's upper nodes (a
 * dense table up to 2,048 nodes, else a binary search), constant work per distinct fan triangle
 * since flows are short, plus the reduction of ∂2ᴹ. Memory O(E + N²) up to 2,048 nodes N, else O(E),
 * plus the columns of ∂2ᴹ.
 * @example nerveLoops(rows in balls {0, 1}, {1, 2}, {0, 2}, 3, edges of the triangle, 1) // => { b0: 1, b1: 1 } (no row in all three balls)
 */
export function nerveLoops(rowNodes: CompressedLists, nodes: number, edges: EdgeList, b0: number, control: RunControl = {}): LoopCounts {
  const packed = nodes <= denseLimit && (nodes * (nodes - 1)) / 2 <= denseRatio * edges.source.length;
  return nerveLoopsWithSlots(rowNodes, nodes, edges, b0, control, packed ? "packed" : "edges");
}

/** nerveLoops with the flows' slots chosen by the caller ("packed": the upper triangle of node pairs; "edges": edge numbers); for tests of both. */
export function nerveLoopsWithSlots(rowNodes: CompressedLists, nodes: number, edges: EdgeList, b0: number, control: RunControl, slots: "packed" | "edges"): LoopCounts {
  const { source, target } = edges;
  const edgeCount = source.length;
  const { offsets, items } = rowNodes;
  const rows = offsets.length - 1;

  // edges are sorted by (source, target): node a's upper edges are first[a] .. first[a + 1] − 1
  const first = new Uint32Array(nodes + 1);
  for (let e = 0; e < edgeCount; ++e) first[source[e]! + 1]!++;
  for (let k = 0; k < nodes; ++k) first[k + 1]! += first[k]!;
  // lowest neighbour of each node (none when it has no lower neighbour: a critical node)
  const lowest = new Int32Array(nodes).fill(none);
  for (let e = 0; e < edgeCount; ++e) if (lowest[target[e]!] === none) lowest[target[e]!] = source[e]!;
  let criticalNodes = 0;
  for (let v = 0; v < nodes; ++v) if (lowest[v] === none) criticalNodes++;

  // rows in three or more balls, grouped by their lowest node (counting sort)
  const start = new Uint32Array(nodes + 1);
  for (let i = 0; i < rows; ++i) if (offsets[i + 1]! - offsets[i]! >= 3) start[items[offsets[i]!]! + 1]!++;
  for (let k = 0; k < nodes; ++k) start[k + 1]! += start[k]!;
  const byLowest = new Uint32Array(start[nodes]!);
  const fill = start.slice(0, nodes);
  for (let i = 0; i < rows; ++i) if (offsets[i + 1]! - offsets[i]! >= 3) byLowest[fill[items[offsets[i]!]!]!++] = i;

  // Each edge's flow, coded in one Int32 (see FlowCodes), at the edge's slot: the pair (a, b)'s
  // place in the packed upper triangle, for up to 2,048 nodes with at least one edge per 8 pairs
  // (no look-up: one memory access per triangle side, ≤ 8 MB); else the edge number, found by
  // binary search.
  const dense = slots === "packed";
  // dense slots pack the upper triangle: (a, b), a < b, at rowStart[a] + b
  const rowStart = new Int32Array(dense ? nodes : 0);
  for (let a = 0; a < rowStart.length; ++a) rowStart[a] = a * (nodes - 1) - (a * (a - 1)) / 2 - a - 1;
  const flows = new FlowCodes(dense ? (nodes * (nodes - 1)) / 2 : edgeCount);
  const slotOfEdge = (e: number): number => (dense ? rowStart[source[e]!]! + target[e]! : e);
  let criticalEdges = 0;
  const settleUnpaired = (e: number): void => {
    // an edge with no partner triangle: matched with its upper node (flow 0), or critical (itself)
    flows.code[slotOfEdge(e)] = lowest[target[e]!] === source[e]! ? emptyFlow : criticalEdges++;
  };

  // pairs met at the current apex, by local numbers, in a bit table of (upper degree)² bits when
  // that is at most 16 MB (cleared by the list of words set); else by stamping the slot with the apex
  let mostUpper = 0;
  for (let v = 0; v < nodes; ++v) mostUpper = Math.max(mostUpper, first[v + 1]! - first[v]!);
  const pairBits = mostUpper * mostUpper <= pairBitsLimit ? new Int32Array(Math.ceil((mostUpper * mostUpper) / 32) + 1) : null;
  const wordsSet = new GrowableInts(pairBits ? 1024 : 1);
  const metAt = pairBits ? null : new Int32Array(edgeCount).fill(none);

  const columns = new GrowableInts(1 << 16);
  const columnEnds = new GrowableInts(1 << 12);
  const local = new Int32Array(nodes).fill(none); // node → its spoke's offset from first[v], for the current apex v

  for (let v = 0; v < nodes; ++v) {
    if ((v & 63) === 0) checkStop(control, "the loop count");
    if (start[v] === start[v + 1]) continue;
    const base = first[v]!;
    const upper = first[v + 1]! - base;
    // v's own edges: any partner triangle would have an apex below v, so their flows are final now
    for (let e = base; e < first[v + 1]!; ++e) {
      local[target[e]!] = e - base;
      if (flows.code[slotOfEdge(e)] === unsettled) settleUnpaired(e);
    }
    for (let h = start[v]!; h < start[v + 1]!; ++h) {
      const i = byLowest[h]!;
      const end = offsets[i + 1]!;
      for (let q = offsets[i]! + 1; q < end; ++q) {
        const b = items[q]!;
        const localB = local[b]!;
        const vb = dense ? rowStart[v]! + b : base + localB;
        const bRow = dense ? rowStart[b]! : 0;
        for (let s = q + 1; s < end; ++s) {
          const c = items[s]!;
          const localC = local[c]!;
          let bc: number;
          if (pairBits) {
            // (v, b, c) met before, on another row?
            const bit = localB * upper + localC;
            const word = bit >>> 5;
            const mask = 1 << (bit & 31);
            if ((pairBits[word]! & mask) !== 0) continue;
            if (pairBits[word] === 0) wordsSet.push(word);
            pairBits[word]! |= mask;
            bc = dense ? bRow + c : edgeIndex(first, target, b, c);
          } else {
            bc = dense ? bRow + c : edgeIndex(first, target, b, c);
            if (metAt![bc] === v) continue;
            metAt![bc] = v;
          }
          const vc = dense ? rowStart[v]! + c : base + localC;
          const bcCode = flows.code[bc]!;
          if (bcCode === unsettled) {
            // the first apex met is the lowest: (b, c) is matched with (v, b, c), its flow is the rest of the boundary
            flows.code[bc] = flows.sum(flows.code[vb]!, flows.code[vc]!);
            continue;
          }
          // a critical triangle: its Morse boundary, when not zero, is a column of ∂2ᴹ
          if (flows.appendSum(flows.code[vb]!, flows.code[vc]!, bcCode, columns) > 0) columnEnds.push(columns.length);
        }
      }
    }
    for (let e = base; e < first[v + 1]!; ++e) local[target[e]!] = none;
    if (pairBits) {
      for (let k = 0; k < wordsSet.length; ++k) pairBits[wordsSet.items[k]!] = 0;
      wordsSet.length = 0;
    }
  }
  // edges on no fan triangle (rows in two balls) are settled last
  for (let e = 0; e < edgeCount; ++e) if (flows.code[slotOfEdge(e)] === unsettled) settleUnpaired(e);
  checkStop(control, "the loop count");
  const rank = rankOfSortedColumns(columns.items, columnEnds.items.subarray(0, columnEnds.length), criticalEdges);
  return { b0, b1: criticalEdges - (criticalNodes - b0) - rank };
}

const unsettled = -(2 ** 31);
const emptyFlow = -1;

/**
 * Flows coded one Int32 per slot: `unsettled`; −1 for the empty flow; c ≥ 0 for the one critical
 * edge c (most flows: about 85% hold at most one); else −2 − p for a list kept at pool[p]
 * (its length, then its ascending critical-edge numbers).
 */
class FlowCodes {
  readonly code: Int32Array;
  private readonly pool = new GrowableInts(1 << 14);
  private out = new Int32Array(256);
  private left = new Int32Array(256);
  private right = new Int32Array(256);

  constructor(slots: number) {
    this.code = new Int32Array(slots).fill(unsettled);
  }

  /** The code of flow(x) + flow(y). */
  sum(x: number, y: number): number {
    if (x >= emptyFlow && y >= emptyFlow) {
      // both at most one edge: the common case, without touching the pool
      if (x === emptyFlow) return y;
      if (y === emptyFlow || x === y) return x === y ? emptyFlow : x;
      return this.storePair(Math.min(x, y), Math.max(x, y));
    }
    const length = this.sumInto(x, y);
    const sum = this.out;
    if (length === 0) return emptyFlow;
    if (length === 1) return sum[0]!;
    const at = this.pool.length;
    this.pool.push(length);
    for (let k = 0; k < length; ++k) this.pool.push(sum[k]!);
    return -2 - at;
  }

  /** Appends flow(x) + flow(y) + flow(z) to `into`; returns its length. */
  appendSum(x: number, y: number, z: number, into: GrowableInts): number {
    if (x >= emptyFlow && y >= emptyFlow && z >= emptyFlow) return appendSmallSum(x, y, z, into);
    this.makeRoom(this.lengthOf(x) + this.lengthOf(y) + this.lengthOf(z));
    const xy = this.sumInto(x, y);
    const zLength = this.expand(z, this.right, 0);
    const length = xorSorted(this.out, 0, xy, this.right, 0, zLength, this.left, 0);
    for (let k = 0; k < length; ++k) into.push(this.left[k]!);
    return length;
  }

  private storePair(low: number, high: number): number {
    const at = this.pool.length;
    this.pool.push(2);
    this.pool.push(low);
    this.pool.push(high);
    return -2 - at;
  }

  /** flow(x) + flow(y) into this.out; returns its length (scratch grown to fit three flows' worth). */
  private sumInto(x: number, y: number): number {
    this.makeRoom(this.lengthOf(x) + this.lengthOf(y));
    const xLength = this.expand(x, this.left, 0);
    const yLength = this.expand(y, this.right, 0);
    return xorSorted(this.left, 0, xLength, this.right, 0, yLength, this.out, 0);
  }

  private makeRoom(entries: number): void {
    if (this.out.length >= entries) return;
    this.out = new Int32Array(2 * entries);
    this.left = new Int32Array(2 * entries);
    this.right = new Int32Array(2 * entries);
  }

  private lengthOf(code: number): number {
    return code === emptyFlow ? 0 : code >= 0 ? 1 : this.pool.items[-2 - code]!;
  }

  private expand(code: number, out: Int32Array, at: number): number {
    if (code === emptyFlow) return 0;
    if (code >= 0) {
      out[at] = code;
      return 1;
    }
    const p = -2 - code;
    const items = this.pool.items;
    const length = items[p]!;
    for (let k = 0; k < length; ++k) out[at + k] = items[p + 1 + k]!;
    return length;
  }
}

/** Appends the sum of up to three single-edge flows (−1: empty) to `into`, ascending; returns its length. */
function appendSmallSum(x: number, y: number, z: number, into: GrowableInts): number {
  // cancel an equal pair (over GF(2) an edge twice is no edge)
  if (x === y) x = y = emptyFlow;
  else if (x === z) x = z = emptyFlow;
  else if (y === z) y = z = emptyFlow;
  // sort three by compare-exchange; empty (−1) sorts first
  let t: number;
  if (x > y) {
    t = x;
    x = y;
    y = t;
  }
  if (y > z) {
    t = y;
    y = z;
    z = t;
  }
  if (x > y) {
    t = x;
    x = y;
    y = t;
  }
  const before = into.length;
  if (x !== emptyFlow) into.push(x);
  if (y !== emptyFlow) into.push(y);
  if (z !== emptyFlow) into.push(z);
  return into.length - before;
}

/** Index of edge (a, b), a < b, by binary search in a's upper edges; throws when there is none. */
function edgeIndex(first: Uint32Array, target: Uint32Array, a: number, b: number): number {
  let lo = first[a]!;
  let hi = first[a + 1]!;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (target[mid]! < b) lo = mid + 1;
    else hi = mid;
  }
  if (lo === first[a + 1]! || target[lo] !== b) throw new Error(`triangle side without an edge: ${a + 1}-${b + 1}`);
  return lo;
}

/** Symmetric difference of two ascending lists into out[at..]; returns its length. */
function xorSorted(x: Int32Array, xAt: number, xLength: number, y: Int32Array, yAt: number, yLength: number, out: Int32Array, at: number): number {
  let i = 0;
  let j = 0;
  let n = at;
  while (i < xLength && j < yLength) {
    const p = x[xAt + i]!;
    const r = y[yAt + j]!;
    if (p < r) {
      out[n++] = p;
      i++;
    } else if (r < p) {
      out[n++] = r;
      j++;
    } else {
      i++;
      j++;
    }
  }
  while (i < xLength) out[n++] = x[xAt + i++]!;
  while (j < yLength) out[n++] = y[yAt + j++]!;
  return n - at;
}
