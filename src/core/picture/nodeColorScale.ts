import { scaleSequential, type ScaleSequential } from "d3-scale";
import { cividis } from "./colourSchemes.ts";

/**
 * Sequential cividis scale over the finite node values (NaN ignored); a constant value gets the
 * domain [v − 0.5, v + 0.5] so it takes the middle colour; null when there is no finite value. O(n).
 * @example nodeColorScale(Float64Array.of(2, NaN, 4))!.domain() // => [2, 4]
 */
export function nodeColorScale(values: Float64Array): ScaleSequential<string> | null {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of values) {
    if (Number.isNaN(v)) continue;
    lo = Math.min(lo, v);
    hi = Math.max(hi, v);
  }
  if (lo > hi) return null;
  return scaleSequential(cividis).domain(lo === hi ? [lo - 0.5, hi + 0.5] : [lo, hi]);
}
