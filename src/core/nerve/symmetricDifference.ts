/**
 * Symmetric difference of two ascending lists (addition of two columns over GF(2)), ascending.
 * O(|x| + |y|).
 * @example symmetricDifference([1, 2, 5], [2, 3]) // => [1, 3, 5]
 */
export function symmetricDifference(x: readonly number[], y: readonly number[]): number[] {
  const out: number[] = [];
  let i = 0;
  let j = 0;
  while (i < x.length || j < y.length) {
    if (j >= y.length || (i < x.length && x[i]! < y[j]!)) out.push(x[i++]!);
    else if (i >= x.length || y[j]! < x[i]!) out.push(y[j++]!);
    else {
      i++;
      j++;
    }
  }
  return out;
}
