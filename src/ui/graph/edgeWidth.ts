/** Edge widths in screen pixels: the thinnest drawn, the widest, and the one width when widths are off (our choice, no source). */
export const edgeWidths = { min: 0.75, max: 8, plain: 1 } as const;

/**
 * Edge width by shared rows: proportional to the square root of the rows two balls share, so the
 * stroke's area, not its width, follows the count (as node area follows members); the edge sharing
 * the most rows gets `max` pixels: w = clamp(max · √(shared / mostShared), min, max), rounded to the
 * nearest half pixel so edges batch into at most 16 strokes widths.
 * Degenerate input: mostShared ≤ 0, or shared ≤ 0, gives `min`.
 * @example edgeWidth(25, 100) // => 4 (8 · √0.25)
 */
export function edgeWidth(shared: number, mostShared: number): number {
  if (!(mostShared > 0) || !(shared > 0)) return edgeWidths.min;
  const width = edgeWidths.max * Math.sqrt(shared / mostShared);
  return Math.min(edgeWidths.max, Math.max(edgeWidths.min, Math.round(2 * width) / 2));
}
