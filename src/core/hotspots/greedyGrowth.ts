import type { FamilyGraph } from "./flexibleFamily.ts";

/** What greedy growth reads: each node's row count, the cap on a region's rows, and the score. */
export interface GrowthInput {
  readonly graph: FamilyGraph;
  /** The graph's neighbours of each node (adjacencySets), made once for every replicate. */
  readonly adjacent: readonly ReadonlySet<number>[];
  /** Row count and value sum per node. */
  readonly nodeCounts: Uint32Array;
  readonly nodeSums: Float64Array;
  /** A region holds at most this many rows. */
  readonly cap: number;
  readonly score: (n: number, s: number) => number;
}

/**
 * Greedy growth, the heuristic search when the flexible family passes its budget: from every node
 * i (alone, when within the cap), repeatedly add the node of i's neighbourhood (i and its K − 1
 * nearest) that touches the region in the graph and gives the best score (ties to the lower node),
 * while the region stays within the cap; every region on the way is a candidate. A variant of the
 * greedy growth of L. Duczmal and R. Assunção, Comput Stat Data Anal 45:269–286, 2004 (there
 * with simulated annealing; here deterministic and bounded to the flexible neighbourhood, so
 * its regions are a subset of the flexible family). The same search runs in every replicate.
 * O(N·K²·deg) per call. `visit(nodes, size, score)` gets each region, nodes in order of growth.
 * Returns the largest score (0 when none is positive).
 * @example greedyGrowth(path 0–1–2 with sums [0, 1, 1], counts 1 each, cap 2, score s) // => 2
 */
export function greedyGrowth(input: GrowthInput, visit?: (nodes: Uint32Array, size: number, score: number) => void): number {
  const { graph, adjacent, nodeCounts, nodeSums, cap, score } = input;
  const count = graph.neighbours.length;
  const region = new Uint32Array(16);
  let best = 0;
  for (let i = 0; i < count; ++i) {
    if (nodeCounts[i]! > cap) continue;
    const hood = graph.neighbours[i]!;
    const taken = new Uint8Array(hood.length);
    region[0] = i;
    let size = 1;
    let n = nodeCounts[i]!;
    let s = nodeSums[i]!;
    let value = score(n, s);
    for (;;) {
      if (value > best) best = value;
      visit?.(region, size, value);
      let pick = -1;
      let pickValue = -Infinity;
      for (let a = 0; a < hood.length; ++a) {
        const node = hood[a]!;
        if (taken[a] || n + nodeCounts[node]! > cap) continue;
        let touches = false;
        for (let b = 0; b < size && !touches; ++b) touches = adjacent[node]!.has(region[b]!);
        if (!touches) continue;
        const v = score(n + nodeCounts[node]!, s + nodeSums[node]!);
        if (v > pickValue || (v === pickValue && node < hood[pick]!)) {
          pick = a;
          pickValue = v;
        }
      }
      if (pick < 0) break;
      taken[pick] = 1;
      const node = hood[pick]!;
      region[size++] = node;
      n += nodeCounts[node]!;
      s += nodeSums[node]!;
      value = pickValue;
    }
  }
  return best;
}
