import { quantileSorted } from "../core/index.ts";

/** At most this many points per side are sent for a distribution plot (a 200-pixel-wide plot needs no more; common practice, no source). */
export const ecdfPoints = 101;

/**
 * The values one side of a region table puts into its empirical-CDF plot, ascending: the side's
 * present values themselves (missing values, NaN, left out) when there are at most `points`,
 * otherwise `points` quantiles at p = k / (points − 1), k = 0..points − 1 (quantileSorted, type 7),
 * so the answer stays small for a side of a million rows while its ends (the minimum and maximum)
 * are kept. Either way the plot reads the sample as evenly weighted steps.
 * Cost: O(n log n) for the sort; memory: one copy of the side's values.
 * @example ecdfSample(Float64Array.of(3, NaN, 1, 2), Uint32Array.of(0, 1, 2, 3), 2) // => Float64Array [1, 3]
 */
export function ecdfSample(values: Float64Array, rows: Uint32Array, points = ecdfPoints): Float64Array {
  const present = new Float64Array(rows.length);
  let n = 0;
  for (const row of rows) {
    const value = values[row]!;
    if (value === value) present[n++] = value;
  }
  const sorted = present.subarray(0, n).sort();
  if (n <= points) return sorted.slice();
  return Float64Array.from({ length: points }, (_, k) => quantileSorted(sorted, k / (points - 1)));
}
