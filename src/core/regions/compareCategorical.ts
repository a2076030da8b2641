import { chiSquaredIndependence } from "../stats/chiSquaredIndependence.ts";
import { missingCode } from "../table/finishColumn.ts";
import type { Categories } from "../table/types.ts";

/** One categorical column, inside against outside. */
export interface CategoricalComparison {
  /** Rows with a level (missing cells are left out) on each side. */
  readonly nInside: number;
  readonly nOutside: number;
  /** Per level, in the column's level order: its share of the side's rows with a level (NaN for an empty side). */
  readonly levels: readonly { readonly level: string; readonly shareInside: number; readonly shareOutside: number }[];
  /** Pearson's X² of the 2 × levels table (no continuity correction); NaN when undefined. */
  readonly statistic: number;
  readonly degreesOfFreedom: number;
  readonly p: number;
  /** True when an expected count is below 5 (the approximation is poor there). */
  readonly hasSmallExpected: boolean;
}

/**
 * Compares one categorical column on two sets of rows: the share of each level inside and outside,
 * and Pearson's chi-squared test of independence of side and level (chiSquaredIndependence; levels
 * absent from both sides are dropped there). O(rows + levels).
 * @example compareCategorical({ codes: Uint32Array.of(0, 0, 1, 1), levels: ["a", "b"] }, Uint32Array.of(0, 1), Uint32Array.of(2, 3)).statistic // => 4
 */
export function compareCategorical(categories: Categories, inside: Uint32Array, outside: Uint32Array): CategoricalComparison {
  const count = (rows: Uint32Array): Float64Array => {
    const counts = new Float64Array(categories.levels.length);
    for (const row of rows) {
      const code = categories.codes[row]!;
      if (code !== missingCode) counts[code]!++;
    }
    return counts;
  };
  const a = count(inside);
  const b = count(outside);
  const total = (c: Float64Array): number => c.reduce((s, v) => s + v, 0);
  const nInside = total(a);
  const nOutside = total(b);
  const test = chiSquaredIndependence([a, b]);
  return {
    nInside,
    nOutside,
    levels: categories.levels.map((level, k) => ({ level, shareInside: nInside > 0 ? a[k]! / nInside : NaN, shareOutside: nOutside > 0 ? b[k]! / nOutside : NaN })),
    statistic: test.statistic,
    degreesOfFreedom: test.degreesOfFreedom,
    p: test.pValue,
    hasSmallExpected: test.hasSmallExpected,
  };
}
