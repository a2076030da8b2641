import { boxBound } from "./boxBound.ts";
import type { RowIndex } from "./rowIndex.ts";
import type { TreeQuery } from "./treeQuery.ts";

/** Per-node upper bounds on `nearest` over the node's uncovered rows, kept between calls. */
export interface NearestBounds {
  tight: Float64Array | null;
}

/**
 * One relaxation step of the farthest-point net: for every uncovered row i,
 *   nearest[i] = Math.min(nearest[i], metric.distance(values, d, landmark, i)),
 * skipping only rows for which the computed distance is provably ≥ nearest[i] (so the minimum
 * would not change). Under Euclidean, Manhattan and Chebyshev distance the k-d tree proves it
 * for whole nodes: a node is skipped when its box bound (boxBound.ts; √ of it for Euclidean,
 * √ being monotone) is ≥ an upper bound of nearest over the node's uncovered rows, and a row is
 * skipped once its partial sum already reaches nearest[i]. Upper bounds only shrink as rows
 * get covered or nearer, so bounds from earlier calls stay valid. Other metrics relax every
 * uncovered row. Cost: O(n·d) at worst per landmark.
 */
export function relaxNearest(index: RowIndex, landmark: number, nearest: Float64Array, covered: Uint8Array, uncovered: Uint32Array, bounds: NearestBounds): void {
  const { table, metric, space, tree } = index;
  const { values, columns: d } = table;
  if (!space || !space.exact || !tree) {
    for (let t = 0; t < uncovered.length; ++t) {
      const i = uncovered[t]!;
      if (!covered[i]) nearest[i] = Math.min(nearest[i]!, metric.distance(values, d, landmark, i));
    }
    return;
  }
  const upper = (bounds.tight ??= new Float64Array(tree.start.length).fill(Infinity));
  const q = index.centre;
  for (let k = 0; k < d; ++k) q[k] = values[landmark * d + k]!;
  const squares = space.norm === "squares";
  const query: TreeQuery = { norm: space.norm, dims: d, coords: tree.coords, lo: tree.lo, hi: tree.hi, centre: q, centreBase: 0, limit: Infinity };
  const relax = (node: number): number => {
    const bound = upper[node]!;
    if (bound === -Infinity) return bound;
    query.limit = squares ? bound * bound : bound;
    const box = boxBound(query, node * d);
    if ((squares ? Math.sqrt(box) : box) >= bound) return bound;
    const child = tree.firstChild[node]!;
    let largest = -Infinity;
    if (child !== 0) largest = Math.max(relax(child), relax(child + 1));
    else {
      for (let p = tree.start[node]!; p < tree.end[node]!; ++p) {
        const i = tree.rowAt[p]!;
        if (covered[i]) continue;
        const current = nearest[i]!;
        if (!reaches(space.norm, tree.coords, p * d, q, d, current)) nearest[i] = Math.min(current, metric.distance(values, d, landmark, i));
        largest = Math.max(largest, nearest[i]!);
      }
    }
    upper[node] = largest;
    return largest;
  };
  relax(0);
}

/** True when the partial value, summed in column order from coords[base..], proves the distance ≥ bound. */
function reaches(norm: "squares" | "sum" | "max", coords: Float64Array, base: number, q: Float64Array, d: number, bound: number): boolean {
  const limit = norm === "squares" ? bound * bound : bound;
  let s = 0;
  for (let k = 0; k < d; ++k) {
    const e = q[k]! - coords[base + k]!;
    s = norm === "squares" ? s + e * e : norm === "sum" ? s + Math.abs(e) : Math.max(s, Math.abs(e));
    if (s > limit) return (norm === "squares" ? Math.sqrt(s) : s) >= bound;
  }
  return false;
}
