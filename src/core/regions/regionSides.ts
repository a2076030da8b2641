/** The two sides a region table compares, as ascending 0-based rows of the parsed table. */
export interface RegionSides {
  readonly inside: Uint32Array;
  readonly outside: Uint32Array;
  /** Rows of the region (and of the versus region) that the build left out: in neither side. */
  readonly regionRowsUnused: number;
  /** Rows read that the build left out (missing feature values, undefined distance): in neither side. */
  readonly rowsUnused: number;
  /** A vs B only: used rows in both regions, left out of both sides (0 against the rest). */
  readonly inBoth: number;
}

/**
 * Splits the rows a build used into the sides of a region table:
 * - region against the rest: inside = region ∩ used, outside = used \ region;
 * - region A against region B: inside = (A \ B) ∩ used, outside = (B \ A) ∩ used, and the used rows
 *   in both are counted in `inBoth` and left out of both sides.
 * Rows the build left out are in neither side. Rows are 0-based and must be < `rowsRead`, else it throws.
 * O(rowsRead) memory (one byte a row) and time.
 * @example regionSides(5, Uint32Array.of(0, 1, 2, 4), Uint32Array.of(1, 3)).outside // => Uint32Array [0, 2, 4]
 */
export function regionSides(rowsRead: number, usedRows: Uint32Array, region: ArrayLike<number>, versus?: ArrayLike<number>): RegionSides {
  const mark = new Uint8Array(rowsRead); // bit 1: used, bit 2: in the region, bit 4: in the versus region
  for (const row of usedRows) mark[row] = 1;
  const put = (rows: ArrayLike<number>, bit: number): void => {
    for (let k = 0; k < rows.length; ++k) {
      const row = rows[k]!;
      if (!(Number.isInteger(row) && row >= 0 && row < rowsRead)) throw new Error(`row out of range: ${row} (0-based; ${rowsRead} rows were read)`);
      mark[row]! |= bit;
    }
  };
  put(region, 2);
  if (versus) put(versus, 4);
  const inside: number[] = [];
  const outside: number[] = [];
  let regionRowsUnused = 0;
  let inBoth = 0;
  for (let row = 0; row < rowsRead; ++row) {
    const m = mark[row]!;
    if (!(m & 1)) {
      if (m & 6) regionRowsUnused++;
      continue;
    }
    const a = (m & 2) !== 0;
    const b = versus ? (m & 4) !== 0 : !a;
    if (a && b) inBoth++;
    else if (a) inside.push(row);
    else if (b) outside.push(row);
  }
  return { inside: Uint32Array.from(inside), outside: Uint32Array.from(outside), regionRowsUnused, rowsUnused: rowsRead - usedRows.length, inBoth };
}
