import { scaleSequential, type ScaleSequential } from "d3-scale";
import { interpolateCividis } from "d3-scale-chromatic";

export const missingColor = "#cfcac0"; // warm grey: no member has a value
export const plainColor = "#7d8fa3"; // slate, when nothing is chosen to colour by
export const colorSchemeName = "cividis (d3-scale-chromatic): perceptually uniform, readable with colour-vision deficiency";

/** Sequential cividis scale over the finite node values; null when there are none. */
export function nodeColorScale(values: Float64Array): ScaleSequential<string> | null {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of values) {
    if (Number.isNaN(v)) continue;
    lo = Math.min(lo, v);
    hi = Math.max(hi, v);
  }
  if (lo > hi) return null;
  return scaleSequential(interpolateCividis).domain(lo === hi ? [lo - 0.5, hi + 0.5] : [lo, hi]);
}

/** Node radius in pixels: area proportional to member count, the largest node at `largest` px. */
export function nodeRadius(size: number, maxSize: number, largest = 26): number {
  return Math.max(3, largest * Math.sqrt(size / Math.max(1, maxSize)));
}
