import { GrowableInts } from "./growableInts.ts";

/**
 * Rank over GF(2) of a sparse 0/1 matrix given by columns, each an ascending list of row numbers
 * in `items` (column k ends at ends[k], starts at ends[k − 1] or 0). Lowest-pivot reduction: a
 * column is added to the reduced column that owns its largest row until it is empty or owns a
 * new pivot; the rank is the number of pivots (H. Edelsbrunner and J. Harer, Computational
 * Topology, AMS 2010, §VII.1). Owned columns are kept in one pool; the working column lives in two
 * scratch buffers, so nothing is allocated per step.
 * Cost: O(Σ reduction steps × column length); O(rows + kept entries) memory.
 * @example rankOfSortedColumns(Int32Array.of(0, 1, 1, 2, 0, 2), Int32Array.of(2, 4, 6), 3) // => 2 (the three columns sum to zero)
 */
export function rankOfSortedColumns(items: Int32Array, ends: Int32Array, rows: number): number {
  const ownerStart = new Int32Array(rows).fill(-1);
  const ownerLength = new Int32Array(rows);
  const kept = new GrowableInts(1024);
  let work = new Int32Array(64);
  let spare = new Int32Array(64);
  let rank = 0;
  let from = 0;
  for (let k = 0; k < ends.length; ++k) {
    const to = ends[k]!;
    let length = to - from;
    if (work.length < length) work = new Int32Array(2 * length);
    for (let t = 0; t < length; ++t) work[t] = items[from + t]!;
    from = to;
    while (length > 0) {
      const pivot = work[length - 1]!;
      const at = ownerStart[pivot]!;
      if (at === -1) {
        ownerStart[pivot] = kept.length;
        ownerLength[pivot] = length;
        for (let t = 0; t < length; ++t) kept.push(work[t]!);
        rank++;
        break;
      }
      const otherLength = ownerLength[pivot]!;
      if (spare.length < length + otherLength) spare = new Int32Array(2 * (length + otherLength));
      const other = kept.items;
      let i = 0;
      let j = 0;
      let n = 0;
      while (i < length && j < otherLength) {
        const p = work[i]!;
        const r = other[at + j]!;
        if (p < r) {
          spare[n++] = p;
          i++;
        } else if (r < p) {
          spare[n++] = r;
          j++;
        } else {
          i++;
          j++;
        }
      }
      while (i < length) spare[n++] = work[i++]!;
      while (j < otherLength) spare[n++] = other[at + j++]!;
      [work, spare] = [spare, work];
      length = n;
    }
  }
  return rank;
}
