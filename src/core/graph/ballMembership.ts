import type { Metric } from "../metric/types.ts";
import type { NumericTable } from "../table/types.ts";

/** Compressed lists: the items of list k are items[offsets[k] .. offsets[k + 1]). */
export interface CompressedLists {
  readonly offsets: Uint32Array;
  readonly items: Uint32Array;
}

/**
 * Closed balls around landmarks: row i is a member of node k iff d(landmark_k, i) ≤ r
 * (reference predicate). Members of each node are listed in ascending row order.
 * O(n·L) distance tests.
 * @example ballMembership(line0to3, euclidean, 1, Uint32Array.of(0, 2)) // => offsets [0, 2, 5], items [0, 1, 1, 2, 3]
 */
export function ballMembership(
  table: NumericTable,
  metric: Metric,
  radius: number,
  landmarks: Uint32Array,
  onProgress?: (done: number, total: number) => void,
): CompressedLists {
  const { values, columns: d, rows: n } = table;
  const offsets = new Uint32Array(landmarks.length + 1);
  let items = new Uint32Array(Math.max(16, n));
  let size = 0;
  for (let k = 0; k < landmarks.length; ++k) {
    const center = landmarks[k]!;
    for (let i = 0; i < n; ++i) {
      if (!metric.within(values, d, center, i, radius)) continue;
      if (size === items.length) {
        const grown = new Uint32Array(items.length * 2);
        grown.set(items);
        items = grown;
      }
      items[size++] = i;
    }
    offsets[k + 1] = size;
    if (onProgress && (k & 63) === 63) onProgress(k + 1, landmarks.length);
  }
  return { offsets, items: items.slice(0, size) };
}

/**
 * Transposes node → rows lists into row → nodes lists (nodes ascending for each row). O(m) for m memberships.
 */
export function rowsToNodes(members: CompressedLists, rows: number): CompressedLists {
  const counts = new Uint32Array(rows + 1);
  for (let t = 0; t < members.items.length; ++t) counts[members.items[t]! + 1]!++;
  for (let i = 0; i < rows; ++i) counts[i + 1]! += counts[i]!;
  const offsets = counts.slice();
  const cursor = counts.slice(0, rows);
  const items = new Uint32Array(members.items.length);
  const nodes = members.offsets.length - 1;
  for (let k = 0; k < nodes; ++k) {
    for (let t = members.offsets[k]!; t < members.offsets[k + 1]!; ++t) items[cursor[members.items[t]!]!++] = k;
  }
  return { offsets, items };
}
