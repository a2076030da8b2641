/**
 * Rows two regions share: both ascending (as regions keep them), merged in one pass. O(|a| + |b|).
 * @example sharedRowCount(Uint32Array.of(1, 3, 5), Uint32Array.of(3, 5, 8)) // => 2
 */
export function sharedRowCount(a: ArrayLike<number>, b: ArrayLike<number>): number {
  let i = 0;
  let j = 0;
  let shared = 0;
  while (i < a.length && j < b.length) {
    if (a[i]! < b[j]!) ++i;
    else if (a[i]! > b[j]!) ++j;
    else {
      ++shared;
      ++i;
      ++j;
    }
  }
  return shared;
}
