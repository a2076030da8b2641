/**
 * Standardised difference of a subgroup mean from the whole: (subgroup mean − overall mean) / overall sd,
 * with the overall sample standard deviation (n − 1). NaN when the overall sd is 0 or undefined.
 * Source: the usual standardised mean difference against a reference group (J. Cohen, Statistical
 * Power Analysis for the Behavioral Sciences, 2nd ed., 1988, §2.2, with the whole table as reference). O(1).
 * @example standardisedDifference(12, 10, 4) // => 0.5
 */
export function standardisedDifference(subgroupMean: number, overallMean: number, overallSd: number): number {
  return overallSd > 0 ? (subgroupMean - overallMean) / overallSd : NaN;
}
