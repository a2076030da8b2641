import type { StepHook } from "../control.ts";
import type { Metric } from "../metric/types.ts";
import type { NumericTable } from "../table/types.ts";
import { defaultLeafSize, kdTree } from "./kdTree.ts";
import { createRowIndex, rowIndexOf, type RowIndex, type RowIndexOptions } from "./rowIndex.ts";
import { searchSpace } from "./searchSpace.ts";

export interface TreeOrderIndex {
  /** An index over the table's rows renumbered in tree order: its row p is the input's row rowAt[p]. */
  readonly index: RowIndex;
  /** Input row of each renumbered row, or null when no tree applies (rows keep their numbers). */
  readonly rowAt: Uint32Array | null;
}

/**
 * The candidate index of createRowIndex without its copy of the table: the k-d tree is built
 * in place, so the table's own values are rearranged into tree order, and the rows are
 * renumbered to match (cosine and correlation rearrange their unit rows in place, then the
 * table's rows the same way). The tree has the same nodes and boxes as createRowIndex's and its
 * positions are now row numbers, so every search returns the same rows under the new numbers:
 * the reference predicate sees the same pairs of rows. Saves one copy of the table, the largest
 * array of a build. The caller gives up `table` (its values are rearranged) and maps rows back
 * through `rowAt`. Without a search space nothing moves (rowAt null). O(n log n · d).
 * @example treeOrderIndex(table, euclidean).index.tree!.rowAt[5] // => 5 (rows are tree positions)
 */
export function treeOrderIndex(table: NumericTable, metric: Metric, options: RowIndexOptions = {}): TreeOrderIndex {
  const space = searchSpace(table, metric);
  if (!space) return { index: createRowIndex(table, metric, options), rowAt: null };
  const { rows: n, columns: d } = table;
  const tree = kdTree(space.points, space.dims, n, options.leafSize ?? defaultLeafSize, { inPlace: true, ...(options.onStep ? { onStep: options.onStep } : {}) });
  if (space.points !== table.values) permuteRows(table.values, d, tree.rowAt, options.onStep);
  const identity = Uint32Array.from({ length: n }, (_, i) => i);
  const renumbered: NumericTable = { ...table, values: table.values };
  const index = rowIndexOf(renumbered, metric, { ...space, points: tree.coords }, { ...tree, rowAt: identity, positionOf: identity });
  return { index, rowAt: tree.rowAt };
}

/** Rearranges row-major rows in place so that row p holds what row rowAt[p] held, by following the permutation's cycles; `onStep` every 2¹⁶ rows. O(n·d). */
export function permuteRows(values: Float64Array, d: number, rowAt: Uint32Array, onStep?: StepHook): void {
  const n = rowAt.length;
  const done = new Uint8Array(n);
  const held = new Float64Array(d);
  let moved = 0;
  for (let start = 0; start < n; ++start) {
    if (done[start]) continue;
    for (let k = 0; k < d; ++k) held[k] = values[start * d + k]!;
    let p = start;
    for (;;) {
      if ((++moved & 0xffff) === 0) onStep?.();
      done[p] = 1;
      const from = rowAt[p]!;
      if (from === start) {
        for (let k = 0; k < d; ++k) values[p * d + k] = held[k]!;
        break;
      }
      values.copyWithin(p * d, from * d, from * d + d);
      p = from;
    }
  }
}
