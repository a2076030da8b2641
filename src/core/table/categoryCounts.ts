import { missingCode } from "./finishColumn.ts";
import type { Categories } from "./types.ts";

/**
 * Rows per level of a categorical column among `rows` (0-based; default every row), skipping
 * rows with no level. The share of level k is counts[k] / Σ counts. O(rows + levels).
 * @example categoryCounts({ codes: Uint32Array.of(0, 1, 1, 0xffffffff), levels: ["a", "b"] }) // => Uint32Array [1, 2]
 */
export function categoryCounts(categories: Categories, rows?: ArrayLike<number>): Uint32Array {
  const counts = new Uint32Array(categories.levels.length);
  const { codes } = categories;
  const n = rows ? rows.length : codes.length;
  for (let i = 0; i < n; ++i) {
    const code = codes[rows ? rows[i]! : i];
    if (code === undefined) throw new Error(`row out of range: ${rows ? rows[i] : i}`);
    if (code !== missingCode) counts[code]!++;
  }
  return counts;
}

/**
 * The level with the most rows (ties to the lowest level index, i.e. the level seen first in
 * the file), or -1 when every count is 0. O(levels).
 * @example majorityLevel(Uint32Array.of(2, 3, 3)) // => 1
 */
export function majorityLevel(counts: ArrayLike<number>): number {
  let best = -1;
  for (let k = 0; k < counts.length; ++k) if (counts[k]! > 0 && (best === -1 || counts[k]! > counts[best]!)) best = k;
  return best;
}
