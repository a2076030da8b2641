import { scaleSequential, type ScaleSequential } from "d3-scale";
import { interpolateCividis } from "d3-scale-chromatic";
import type { NodeFill } from "../../state/nodeFill.ts";

export const missingColor = "#cfcac0"; // warm grey: no member has a value
export const plainColor = "#7d8fa3"; // slate, when nothing is chosen to colour by
export const otherColor = "#b9b2a4"; // levels beyond the palette
export const colorSchemeName = "cividis (d3-scale-chromatic): perceptually uniform, readable with colour-vision deficiency";
export const categoricalSchemeName = "Okabe–Ito: eight colours distinguishable with common colour-vision deficiencies";

// M. Okabe and K. Ito, "Color Universal Design", J*Fly, 2008 (the eight-colour set, black last)
export const okabeIto = ["#E69F00", "#56B4E9", "#009E73", "#F0E442", "#0072B2", "#D55E00", "#CC79A7", "#000000"] as const;

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

/** Colour of a level: the first eight levels (file order) get the palette, later ones one shared grey. */
export function levelColor(level: number): string {
  return level < 0 ? missingColor : (okabeIto[level] ?? otherColor);
}

/** The fill colour of each node for a fill choice. */
export function fillColors(fill: NodeFill | null): (node: number) => string {
  if (!fill) return () => plainColor;
  if (fill.kind === "categorical") return (node) => levelColor(fill.level[node] ?? -1);
  const scale = nodeColorScale(fill.values);
  return (node) => {
    const value = fill.values[node];
    return value === undefined || Number.isNaN(value) || !scale ? missingColor : scale(value);
  };
}

/** Node radius in pixels: area proportional to member count, the largest node at `largest` px. */
export function nodeRadius(size: number, maxSize: number, largest = 26): number {
  return Math.max(3, largest * Math.sqrt(size / Math.max(1, maxSize)));
}
