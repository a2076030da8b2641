import { regularizedGammaQ } from "./regularizedGammaQ.ts";

/** Pearson's chi-squared test of independence of an r×c table of counts. */
export interface ChiSquaredIndependence {
  /** X² = Σ (observed − expected)² / expected over the kept cells; NaN when fewer than 2 rows or columns are kept. */
  readonly statistic: number;
  /** (r − 1)(c − 1) over the kept rows and columns; 0 when the test is undefined. */
  readonly degreesOfFreedom: number;
  /** Q(df/2, X²/2), the upper tail of the chi-squared distribution; NaN when the test is undefined. */
  readonly pValue: number;
  /** The smallest expected count among the kept cells (NaN when none is kept). */
  readonly minExpected: number;
  /** True when some kept cell has an expected count below 5, where the chi-squared approximation is poor. */
  readonly hasSmallExpected: boolean;
}

/**
 * Pearson's chi-squared test of independence for a table of counts (rows: levels of one variable,
 * e.g. inside vs outside a region; columns: levels of the other):
 *   expected_ij = row_i · column_j / N,  X² = Σ_ij (observed_ij − expected_ij)² / expected_ij,
 *   df = (r − 1)(c − 1),  p = Q(df/2, X²/2) (regularizedGammaQ).
 * Variant: no continuity (Yates) correction, also for 2×2 tables. Rows and columns whose total is 0
 * are dropped before anything else (they have no expected count and carry no information), and
 * r, c count what is left. The flag for an expected count below 5 follows the usual rule of thumb
 * (W. G. Cochran, Biometrics 10:417–451, 1954, is more lenient; Shoal flags any cell).
 * Source: K. Pearson, Phil. Mag. 5th ser. 50:157–175, 1900, with R. A. Fisher's degrees of
 * freedom, J. R. Stat. Soc. 85:87–94, 1922. O(r·c).
 * Degenerate input: fewer than 2 rows or columns with a non-zero total give statistic and p NaN and
 * df 0; a ragged table or a negative or non-finite count throws.
 * @example chiSquaredIndependence([[10, 20], [30, 40]]).statistic // => 0.7936507936507936
 */
export function chiSquaredIndependence(table: ReadonlyArray<ArrayLike<number>>): ChiSquaredIndependence {
  const width = table.length === 0 ? 0 : table[0]!.length;
  const rowTotals = new Float64Array(table.length);
  const columnTotals = new Float64Array(width);
  let total = 0;
  for (let i = 0; i < table.length; ++i) {
    const row = table[i]!;
    if (row.length !== width) throw new Error(`ragged table: row ${i} has ${row.length} cells, not ${width}`);
    for (let j = 0; j < width; ++j) {
      const count = row[j]!;
      if (!(count >= 0 && count < Infinity)) throw new Error(`invalid count: ${count}`);
      rowTotals[i] = rowTotals[i]! + count;
      columnTotals[j] = columnTotals[j]! + count;
      total += count;
    }
  }
  const rows = rowTotals.filter((t) => t > 0).length;
  const columns = columnTotals.filter((t) => t > 0).length;
  if (rows < 2 || columns < 2) {
    return { statistic: NaN, degreesOfFreedom: 0, pValue: NaN, minExpected: NaN, hasSmallExpected: false };
  }
  let statistic = 0;
  let minExpected = Infinity;
  for (let i = 0; i < table.length; ++i) {
    if (rowTotals[i] === 0) continue;
    for (let j = 0; j < width; ++j) {
      if (columnTotals[j] === 0) continue;
      const expected = (rowTotals[i]! * columnTotals[j]!) / total;
      const difference = table[i]![j]! - expected;
      statistic += (difference * difference) / expected;
      if (expected < minExpected) minExpected = expected;
    }
  }
  const degreesOfFreedom = (rows - 1) * (columns - 1);
  return {
    statistic,
    degreesOfFreedom,
    pValue: regularizedGammaQ(degreesOfFreedom / 2, statistic / 2),
    minExpected,
    hasSmallExpected: minExpected < 5,
  };
}
