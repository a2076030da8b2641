/** Each node's neighbours, packed: the neighbours of node k are `neighbours[offsets[k]]` to `neighbours[offsets[k + 1] − 1]`, ascending. */
export interface NeighbourLists {
  readonly offsets: Uint32Array;
  readonly neighbours: Uint32Array;
}

/**
 * Neighbour lists of an undirected graph from its edge list (source[e], target[e]), by counting
 * degrees, a prefix sum and one filling pass; each list sorted ascending. O(n + e log d).
 * Degenerate input: no edges gives n empty lists; a self-loop (source = target) is left out.
 * @example neighbourLists(3, [0, 1], [1, 2]).neighbours // => Uint32Array [1, 0, 2, 1]
 */
export function neighbourLists(n: number, source: ArrayLike<number>, target: ArrayLike<number>): NeighbourLists {
  const offsets = new Uint32Array(n + 1);
  for (let e = 0; e < source.length; ++e) {
    if (source[e] === target[e]) continue;
    ++offsets[source[e]! + 1]!;
    ++offsets[target[e]! + 1]!;
  }
  for (let k = 0; k < n; ++k) offsets[k + 1]! += offsets[k]!;
  const neighbours = new Uint32Array(offsets[n]!);
  const fill = offsets.slice(0, n);
  for (let e = 0; e < source.length; ++e) {
    const a = source[e]!;
    const b = target[e]!;
    if (a === b) continue;
    neighbours[fill[a]!++] = b;
    neighbours[fill[b]!++] = a;
  }
  for (let k = 0; k < n; ++k) neighbours.subarray(offsets[k]!, offsets[k + 1]!).sort();
  return { offsets, neighbours };
}

/** The neighbours of node k (a view into the packed array). */
export function neighboursOf(lists: NeighbourLists, k: number): Uint32Array {
  return lists.neighbours.subarray(lists.offsets[k]!, lists.offsets[k + 1]!);
}
