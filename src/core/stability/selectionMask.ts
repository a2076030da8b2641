/**
 * A selection of parsed-table rows as a 0/1 mask over the rows of a build (`usedRows`: the
 * parsed-table row of each build row, ascending). Selected rows left out of the build do not
 * count. Throws for a row that is not an integer in 0..parsedRows−1, and when no selected row is
 * in the build. O(s log n) for s selected rows.
 * @example selectionMask([1, 4, 2], Uint32Array.of(0, 2, 4), 5) // => Uint8Array [0, 1, 1] (row 1 was not used)
 */
export function selectionMask(selection: ArrayLike<number>, usedRows: Uint32Array, parsedRows: number): Uint8Array {
  const mask = new Uint8Array(usedRows.length);
  let count = 0;
  for (let s = 0; s < selection.length; ++s) {
    const row = selection[s]!;
    if (!Number.isInteger(row) || row < 0 || row >= parsedRows) throw new Error(`invalid selection row: ${row}`);
    let lo = 0;
    let hi = usedRows.length;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if (usedRows[mid]! < row) lo = mid + 1;
      else hi = mid;
    }
    if (usedRows[lo] !== row || mask[lo]) continue;
    mask[lo] = 1;
    count++;
  }
  if (count === 0) throw new Error(`the selection holds no row used in the build (${selection.length} rows given)`);
  return mask;
}
