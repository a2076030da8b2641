import { sharedRowCount } from "../regions/sharedRowCount.ts";

/**
 * Jaccard index of two ascending row lists: |A ∩ B| / |A ∪ B| (P. Jaccard, Bull Soc Vaud Sci Nat
 * 37:547–579, 1901). O(|A| + |B|) by merging. Two empty lists give 0.
 * @example jaccardRows(Uint32Array.of(1, 2, 3), Uint32Array.of(2, 3, 4)) // => 0.5
 */
export function jaccardRows(a: ArrayLike<number>, b: ArrayLike<number>): number {
  const shared = sharedRowCount(a, b);
  const union = a.length + b.length - shared;
  return union === 0 ? 0 : shared / union;
}
