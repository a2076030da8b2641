import { interpolateCividis, schemeDark2 } from "d3-scale-chromatic";
import { greyOfLightness, hexOf, rgbChannels } from "./cieLightness.ts";

// The colour schemes of the graph, one home for the workbench's canvas and the saved picture.

/** Cividis (d3-scale-chromatic): J. R. Nuñez, C. R. Anderton and R. S. Renslow, PLoS ONE 13(7): e0199239, 2018; its lightness rises monotonically. */
export const colorSchemeName = "cividis (d3-scale-chromatic): perceptually uniform, readable with colour-vision deficiency";
export const categoricalSchemeName = "Okabe–Ito: eight colours distinguishable with common colour-vision deficiencies";
export const greyLevelSchemeName = "grey steps of equal CIELAB lightness difference, numbered on the nodes";

export const missingColor = "#cfcac0"; // warm grey: no member has a value
export const plainColor = "#7d8fa3"; // slate, when nothing is chosen to colour by
export const otherColor = "#b9b2a4"; // levels beyond the palette
export const ink = "#23272f"; // --ink in styles.css
export const nodeRim = "#5a5f68"; // node outline: at least 3:1 against the page (#f4f1ea) and a white picture, so light fills keep a visible edge

// M. Okabe and K. Ito, "Color Universal Design", J*Fly, 2008 (the eight-colour set, black last)
export const okabeIto = ["#E69F00", "#56B4E9", "#009E73", "#F0E442", "#0072B2", "#D55E00", "#CC79A7", "#000000"] as const;

/** Cividis at t in [0, 1] as "#rrggbb" (t outside is clamped), so that a saved picture's bytes do not depend on d3's text form. */
export function cividis(t: number): string {
  return hexOf(rgbChannels(interpolateCividis(Math.min(1, Math.max(0, t)))));
}

/**
 * Greys for categories when a picture must read in greyscale: categorical hues are not greyscale-safe,
 * so the first six levels get greys at CIELAB L* = 20, 34, …, 90 (steps of 14, our choice: about the
 * smallest step told apart at a glance in print, from memory), darkest first, and every node also
 * carries its level's number. Levels beyond the sixth are white, known by their number.
 */
export const greyLevels: readonly string[] = [20, 34, 48, 62, 76, 90].map(greyOfLightness);

/** Colour of a level (first eight levels in file order get the palette, later ones one shared grey; −1, no level, the missing grey). */
export function levelColor(level: number): string {
  return level < 0 ? missingColor : (okabeIto[level] ?? otherColor);
}

/** A level's grey in the greyscale-safe form: a step of `greyLevels`, white beyond them and for no level. */
export function levelGrey(level: number): string {
  return level < 0 ? "#ffffff" : (greyLevels[level] ?? "#ffffff");
}

/** How a region's outline looks: a colour and a dash pattern, so two regions differ by more than hue. */
export interface OutlineStyle {
  readonly colour: string;
  /** Dash and gap lengths in screen pixels; empty for a solid line. */
  readonly dash: readonly number[];
}

// ColorBrewer Dark2 through d3-scale-chromatic (C. Brewer, colorbrewer2.org: colour-blind safe for
// up to three classes); a dash pattern per region carries the difference beyond three
export const outlineSchemeName = "Dark2 (d3-scale-chromatic, ColorBrewer) with a dash pattern per region";
const dashes: readonly (readonly number[])[] = [[], [7, 3], [2, 3], [10, 3, 2, 3]]; // common practice, no source

/** The outline style of the region in place `style` of the region list; in greyscale, ink with the dash pattern changing first. */
export function outlineStyle(style: number, greyscale = false): OutlineStyle {
  if (greyscale) return { colour: ink, dash: dashes[style % dashes.length]! };
  return { colour: schemeDark2[style % schemeDark2.length]!, dash: dashes[Math.floor(style / schemeDark2.length) % dashes.length]! };
}

/** Gap in screen pixels between a node and its region's outline, different per place so that overlapping regions' rings nest. */
export function outlineGap(style: number): number {
  return 8 + 3 * (style % 4); // our choice, no source
}
