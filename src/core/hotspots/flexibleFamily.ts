import { adjacencySets } from "./adjacencySets.ts";

/**
 * Candidate regions as packed node lists: region k holds nodes[offsets[k] .. offsets[k + 1]),
 * ascending. Regions found by enumeration also carry where they were kept: the node `origins[k]`
 * (ascending over k) and the bit mask `masks[k]` over that node's neighbourhood (bit 0 the node
 * itself, bit b its b-th nearest), which lets a replicate sum every subset of a neighbourhood at
 * once (familyMaximumByCount).
 */
export interface CandidateFamily {
  readonly offsets: Uint32Array;
  readonly nodes: Uint32Array;
  readonly origins?: Uint32Array;
  readonly masks?: Uint16Array;
}

/** The graph a family lives on: each node's K − 1 nearest nodes (landmarkNeighbours) and the edges of the nerve. */
export interface FamilyGraph {
  readonly neighbours: readonly Uint32Array[];
  readonly source: Uint32Array;
  readonly target: Uint32Array;
}

/**
 * Flexibly shaped candidate family: for each node i, every set of nodes that contains i, lies
 * within i and its K − 1 nearest nodes, and is connected in the graph; a set found from several
 * nodes counts once (it is kept at the lowest node i of the set whose neighbourhood holds it).
 * Source: T. Tango and K. Takahashi, Int J Health Geogr 4:11, 2005 (the family Z_1k, connected
 * sets within the K nearest regions). At most N·2^(K−1) sets; the enumeration visits exactly
 * N·2^(K−1) bit masks, each tested for connectedness with O(K) word operations, and each
 * connected one for duplicates in O(|S|²·K). `visit(nodes, size, origin, mask)` receives each kept set, nodes
 * ascending in a buffer it must copy to keep. A graph with no nodes has no sets.
 * @example countFamily(path 0–1–2 with every node's 2 nearest, K = 3) // => 6 (3 singletons, 2 pairs, 1 triple)
 */
export function enumerateFamily(graph: FamilyGraph, visit: (nodes: Uint32Array, size: number, origin: number, mask: number) => void, onNode?: (done: number) => void): void {
  const count = graph.neighbours.length;
  const adjacent = adjacencySets(graph);
  const hoods = graph.neighbours.map((list, i) => Uint32Array.from([i, ...list]));
  const buffer = new Uint32Array(16);
  const local = new Uint32Array(16);
  for (let i = 0; i < count; ++i) {
    const hood = hoods[i]!;
    const k = hood.length;
    for (let a = 0; a < k; ++a) {
      let mask = 0;
      for (let b = 0; b < k; ++b) if (adjacent[hood[a]!]!.has(hood[b]!)) mask |= 1 << b;
      local[a] = mask;
    }
    const subsets = 1 << (k - 1);
    for (let m = 0; m < subsets; ++m) {
      const mask = (m << 1) | 1;
      let reach = 1;
      for (;;) {
        let next = reach;
        for (let b = 0; b < k; ++b) if (reach & (1 << b)) next |= local[b]! & mask;
        if (next === reach) break;
        reach = next;
      }
      if (reach !== mask) continue;
      let size = 0;
      for (let b = 0; b < k; ++b) if (mask & (1 << b)) buffer[size++] = hood[b]!;
      const set = buffer.subarray(0, size).sort();
      if (foundEarlier(set, i, hoods)) continue;
      visit(set, size, i, mask);
    }
    onNode?.(i + 1);
  }
}

// True when a node j < i of the set has the whole set in its neighbourhood: the set was kept at j.
function foundEarlier(set: Uint32Array, i: number, hoods: readonly Uint32Array[]): boolean {
  for (let a = 0; a < set.length && set[a]! < i; ++a) {
    const hood = hoods[set[a]!]!;
    let all = true;
    for (let b = 0; b < set.length && all; ++b) all = hood.includes(set[b]!);
    if (all) return true;
  }
  return false;
}

/** The exact number of sets in the family (enumerateFamily). */
export function countFamily(graph: FamilyGraph): number {
  let total = 0;
  enumerateFamily(graph, () => ++total);
  return total;
}

/**
 * The family's exact size and, when it is at most `budget` sets, the family packed
 * (enumerateFamily); past the budget the enumeration goes on counting only, so one pass serves both.
 */
export function flexibleFamily(graph: FamilyGraph, budget = Infinity, onNode?: (done: number) => void): { readonly count: number; readonly family: CandidateFamily | null } {
  let offsets: number[] | null = [0];
  let nodes: number[] = [];
  let origins: number[] = [];
  let masks: number[] = [];
  let count = 0;
  enumerateFamily(graph, (set, size, origin, mask) => {
    ++count;
    if (!offsets) return;
    if (count > budget) {
      offsets = null;
      nodes = origins = masks = [];
      return;
    }
    for (let a = 0; a < size; ++a) nodes.push(set[a]!);
    offsets.push(nodes.length);
    origins.push(origin);
    masks.push(mask);
  }, onNode);
  const family = offsets ? { offsets: Uint32Array.from(offsets), nodes: Uint32Array.from(nodes), origins: Uint32Array.from(origins), masks: Uint16Array.from(masks) } : null;
  return { count, family };
}
