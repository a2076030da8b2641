/**
 * Whether a numeric column looks like a row number or a numeric id rather than a measurement.
 * Rule: at least 3 present values, every present cell an integer (no text flagged as missing),
 * all distinct, and either consecutive after sorting (max − min + 1 = count: 1, 2, 3, … in any
 * order and from any start) or some cell written otherwise than as its number (a leading zero as
 * in `007`, or more than 15 digits). Missing cells are allowed. Our rule, no source.
 * Cost: O(1) unless the cheap tests pass, then one sort of the present values, O(n log n).
 * @example looksLikeRowNumber(Float64Array.of(3, 1, 2), { hasOriginalTexts: false, notNumbers: 0 }) // => true
 */
export function looksLikeRowNumber(numbers: Float64Array, context: { readonly hasOriginalTexts: boolean; readonly notNumbers: number }): boolean {
  if (context.notNumbers > 0) return false;
  let count = 0;
  let min = Infinity;
  let max = -Infinity;
  for (let i = 0; i < numbers.length; ++i) {
    const x = numbers[i]!;
    if (x !== x) continue;
    if (!Number.isInteger(x)) return false;
    count++;
    if (x < min) min = x;
    if (x > max) max = x;
  }
  if (count < 3 || !(max - min + 1 === count || context.hasOriginalTexts)) return false;
  const sorted = numbers.filter((x) => x === x).sort();
  for (let k = 1; k < sorted.length; ++k) if (!(sorted[k]! > sorted[k - 1]!)) return false;
  return true;
}
