/** The neighbours of each of the graph's nodes as sets, from its edge lists. O(L + E). */
export function adjacencySets(graph: { readonly neighbours: readonly unknown[]; readonly source: Uint32Array; readonly target: Uint32Array }): Set<number>[] {
  const adjacent: Set<number>[] = Array.from({ length: graph.neighbours.length }, () => new Set<number>());
  for (let e = 0; e < graph.source.length; ++e) {
    adjacent[graph.source[e]!]!.add(graph.target[e]!);
    adjacent[graph.target[e]!]!.add(graph.source[e]!);
  }
  return adjacent;
}
