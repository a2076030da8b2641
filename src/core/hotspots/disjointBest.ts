/**
 * The best regions that share no node with a better one: regions in order of decreasing score
 * (ties to the earlier region), each kept when its score is positive and none of its nodes is
 * in a kept region, until `limit` are kept. This is how secondary clusters are reported in
 * Kulldorff's scan (Commun Stat Theory Methods 26:1481, 1997, §5: non-overlapping secondary
 * clusters). O(R log R + total size) for R regions. Returns indices of kept regions, best first.
 * @example disjointBest([[0, 1], [1], [2]], Float64Array.of(3, 2, 1), 3, 10) // => [0, 2]
 */
export function disjointBest(nodesOf: (k: number) => ArrayLike<number>, scores: Float64Array, nodeCount: number, limit: number): number[] {
  const order = Array.from({ length: scores.length }, (_, k) => k).filter((k) => scores[k]! > 0);
  order.sort((a, b) => scores[b]! - scores[a]! || a - b);
  const used = new Uint8Array(nodeCount);
  const kept: number[] = [];
  for (const k of order) {
    if (kept.length >= limit) break;
    const nodes = nodesOf(k);
    let free = true;
    for (let t = 0; t < nodes.length && free; ++t) free = !used[nodes[t]!];
    if (!free) continue;
    for (let t = 0; t < nodes.length; ++t) used[nodes[t]!] = 1;
    kept.push(k);
  }
  return kept;
}
