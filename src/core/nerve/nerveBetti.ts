import { symmetricDifference } from "./symmetricDifference.ts";
import type { EdgeList } from "./overlapEdges.ts";

export interface NerveBetti {
  /** Connected components of the 2-skeleton (= of the graph). */
  readonly b0: number;
  /** Independent loops over GF(2) not filled by a triangle: b1 = E − V + b0 − rank ∂2. */
  readonly b1: number;
  readonly triangles: number;
  /** Rank over GF(2) of the boundary map from triangles to edges. */
  readonly boundaryRank: number;
}

/**
 * The full reduction over every triangle: the reference that the faster nerveLoops (used by
 * builds and sweeps) is tested against; too slow for large nerves.
 * Betti numbers b0 and b1 over GF(2) of the 2-skeleton of the sampled nerve (vertices = nodes,
 * edges = pairs of balls sharing a row, triangles = triples sharing a row).
 * b1 = dim ker ∂1 − rank ∂2 = (E − (V − b0)) − rank ∂2, with rank ∂2 found by reducing the
 * boundary columns (each triangle's three edges) by lowest pivot, as in the standard
 * persistence reduction. Source: H. Edelsbrunner and J. Harer, Computational Topology: An
 * Introduction, AMS 2010, §IV.2 (matrix reduction) and §III.2 (nerves). Worst case O(T·E²/w);
 * near linear for sparse nerves.
 * @example nerveBetti(3, edges of a triangle, b0 = 1, one triangle (0, 1, 2)) // => { b0: 1, b1: 0, triangles: 1, boundaryRank: 1 }
 */
export function nerveBetti(nodes: number, edges: EdgeList, b0: number, triangles: Uint32Array): NerveBetti {
  const edgeCount = edges.source.length;
  const edgeIndex = new Map<number, number>();
  for (let e = 0; e < edgeCount; ++e) edgeIndex.set(edges.source[e]! * nodes + edges.target[e]!, e);
  const index = (a: number, b: number): number => {
    const e = edgeIndex.get(a * nodes + b);
    if (e === undefined) throw new Error(`triangle side without an edge: ${a + 1}-${b + 1}`);
    return e;
  };
  const owner = new Map<number, number[]>(); // pivot edge → reduced column holding it as its largest entry
  let rank = 0;
  const count = triangles.length / 3;
  for (let t = 0; t < count; ++t) {
    const a = triangles[3 * t]!;
    const b = triangles[3 * t + 1]!;
    const c = triangles[3 * t + 2]!;
    let column = [index(a, b), index(a, c), index(b, c)].sort((x, y) => x - y);
    while (column.length > 0) {
      const pivot = column[column.length - 1]!;
      const other = owner.get(pivot);
      if (!other) {
        owner.set(pivot, column);
        rank++;
        break;
      }
      column = symmetricDifference(column, other);
    }
  }
  return { b0, b1: edgeCount - nodes + b0 - rank, triangles: count, boundaryRank: rank };
}
