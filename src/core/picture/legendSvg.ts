import { escapeXml } from "../export/escapeXml.ts";
import { categoricalSchemeName, colorSchemeName, greyLevels, greyLevelSchemeName, ink, levelColor, levelGrey, missingColor, okabeIto, otherColor, outlineStyle, plainColor } from "./colourSchemes.ts";
import { nodeColorScale } from "./nodeColorScale.ts";
import type { PictureInput } from "./pictureTypes.ts";
import { labelNumber, svgNumber as f } from "./svgNumber.ts";

export const legendWidth = 260; // px, the legend's column at the right of the picture (our choice)
const line = 17; // px between legend lines at font size 12 (our choice)
const rampStops = 9; // gradient stops sampled from the scale, as the workbench's legend
const maxChars = 36; // characters on a legend line at 12 px DejaVu Sans in 240 px (about 0.55 em a character, from memory)

/** The sentence the legend carries in the greyscale-safe form. */
export const greyscaleNote = "lightness increases with value";

/**
 * The legend as SVG elements, in a column starting at (left, top): what the colour shows (ramp and
 * range, or one swatch per level), the scheme, the node and edge encodings, the region outlines.
 * Text is real text, escaped. Greyscale adds "lightness increases with value" (for levels, with the level number).
 */
export function legendSvg(input: PictureInput, left: number, top: number): string[] {
  const out: string[] = [`<g class="legend" font-family="DejaVu Sans, sans-serif" font-size="12" fill="${ink}">`];
  let y = top;
  const text = (content: string, indent = 0, extra = ""): void => {
    for (const part of wrapWords(content, maxChars - Math.round(indent / 7))) {
      out.push(`<text x="${f(left + indent)}" y="${f(y)}"${extra}>${escapeXml(part)}</text>`);
      y += line;
    }
  };
  const swatch = (colour: string, label: string, dashed = false, number: string | null = null): void => {
    const ring = dashed ? ` stroke="${ink}" stroke-dasharray="2 2"` : ` stroke="${ink}" stroke-opacity="0.3"`;
    out.push(`<circle cx="${f(left + 6)}" cy="${f(y - 4)}" r="6" fill="${colour}"${ring}/>`);
    text(number === null ? label : `${number}  ${label}`, 18);
  };
  const { fill, greyscale } = input;
  text(fill ? `Colour: ${fill.caption}` : "Colour: none (nodes plain)", 0, ' font-weight="bold"');
  if (!fill) swatch(plainColor, "every node");
  else if (fill.kind === "sequential") {
    const scale = nodeColorScale(fill.values);
    if (scale) {
      const [lo, hi] = scale.domain() as [number, number];
      out.push('<defs><linearGradient id="shoal-ramp" x1="0" x2="1" y1="0" y2="0">');
      for (let i = 0; i < rampStops; ++i) out.push(`<stop offset="${f(i / (rampStops - 1))}" stop-color="${scale(lo + ((hi - lo) * i) / (rampStops - 1))}"/>`);
      out.push("</linearGradient></defs>");
      out.push(`<rect x="${f(left)}" y="${f(y - 10)}" width="200" height="12" fill="url(#shoal-ramp)"/>`);
      y += line;
      out.push(`<text x="${f(left)}" y="${f(y)}">${escapeXml(labelNumber(lo))}</text>`, `<text x="${f(left + 200)}" y="${f(y)}" text-anchor="end">${escapeXml(labelNumber(hi))}</text>`);
      y += line;
    }
    swatch(greyscale ? "#ffffff" : missingColor, "no value", greyscale);
    text(`scheme: ${colorSchemeName}`);
    if (greyscale) text(greyscaleNote, 0, ' font-style="italic"');
  } else {
    const shown = greyscale ? greyLevels.length : okabeIto.length;
    fill.levels.slice(0, shown).forEach((level, k) => swatch(greyscale ? levelGrey(k) : levelColor(k), level, false, greyscale ? String(k + 1) : null));
    const more = fill.levels.length - shown;
    if (more > 0) swatch(greyscale ? "#ffffff" : otherColor, greyscale ? `${more} more levels (white, by number ${shown + 1} to ${fill.levels.length})` : `${more} more levels`);
    if (fill.level.some((l) => l < 0)) swatch(greyscale ? "#ffffff" : missingColor, "no level", greyscale);
    text(`scheme: ${greyscale ? greyLevelSchemeName : categoricalSchemeName}`);
    if (greyscale) text(`${greyscaleNote} (the level's number)`, 0, ' font-style="italic"');
  }
  y += line / 2;
  text("node area ∝ rows in its ball");
  text("edge: two balls share rows; wider for more shared rows (log2)");
  const drawn = input.edges.source.length;
  if (drawn < input.facts.edgeCount) text(`drawing the ${drawn} edges that share the most rows, of ${input.facts.edgeCount}`);
  if (input.outlines.length > 0) {
    y += line / 2;
    text("Regions (nodes most of whose rows are in it)", 0, ' font-weight="bold"');
    for (const [style, outline] of input.outlines.entries()) {
      const { colour, dash } = outlineStyle(style, greyscale);
      const dashes = dash.length > 0 ? ` stroke-dasharray="${dash.join(" ")}"` : "";
      out.push(`<line x1="${f(left)}" y1="${f(y - 4)}" x2="${f(left + 14)}" y2="${f(y - 4)}" stroke="${colour}" stroke-width="2"${dashes}/>`);
      text(outline.name, 18);
    }
  }
  out.push("</g>");
  return out;
}

/** Words joined into lines of at most `maxChars` (a longer word stays whole on its own line). */
export function wrapWords(text: string, maxChars: number): string[] {
  const lines: string[] = [];
  let current = "";
  for (const word of text.split(" ")) {
    if (current !== "" && current.length + 1 + word.length > maxChars) {
      lines.push(current);
      current = word;
    } else current = current === "" ? word : `${current} ${word}`;
  }
  lines.push(current);
  return lines;
}
