/**
 * Node radius in pixels: area proportional to member count, the largest node at `largest` px,
 * never below 3 px so that a one-row node stays visible: max(3, largest · √(size / max(1, maxSize))). O(1).
 * @example nodeRadius(25, 100) // => 13
 */
export function nodeRadius(size: number, maxSize: number, largest = 26): number {
  return Math.max(3, largest * Math.sqrt(size / Math.max(1, maxSize)));
}
