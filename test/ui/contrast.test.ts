// Contrast of the stylesheet's colour pairs by the WCAG 2.2 formula (W3C, Web Content Accessibility
// Guidelines 2.2, 2023: definitions "contrast ratio" and "relative luminance"): text 4.5:1, large
// text 3:1 (SC 1.4.3), component boundaries and focus indicators 3:1 (SC 1.4.11). Colours are read
// from src/ui/styles.css itself (custom properties resolved), so a change there is checked here.
// axe-core checks rendered text in the browser tests; this also covers borders and outlines, which axe does not.
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { assertClose } from "../assertClose.ts";
import { nodeRim } from "../../src/core/picture/colourSchemes.ts";

const css = readFileSync(join(process.cwd(), "src/ui/styles.css"), "utf8");

/** WCAG 2.2 relative luminance of an sRGB colour #rrggbb: channels linearised with the 0.04045 threshold, weighted 0.2126, 0.7152, 0.0722. */
function relativeLuminance(hex: string): number {
  const match = /^#([0-9a-f]{6})$/i.exec(hex);
  if (!match) throw new Error(`invalid colour: ${hex}`);
  const [r, g, b] = [0, 2, 4].map((i) => {
    const c = parseInt(match[1]!.slice(i, i + 2), 16) / 255;
    return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  });
  return 0.2126 * r! + 0.7152 * g! + 0.0722 * b!;
}

/** WCAG 2.2 contrast ratio (L1 + 0.05) / (L2 + 0.05), L1 the lighter. */
function contrastRatio(a: string, b: string): number {
  const [x, y] = [relativeLuminance(a), relativeLuminance(b)];
  return (Math.max(x, y) + 0.05) / (Math.min(x, y) + 0.05);
}

/** The value of `property` in the rule whose selector list is exactly `selector`, with var(--x) resolved from :root. */
function declared(selector: string, property: string): string {
  const start = css.indexOf(`${selector} {`);
  if (start < 0) throw new Error(`no rule: ${selector}`);
  const body = css.slice(start + selector.length + 2, css.indexOf("}", start));
  const value = new RegExp(`(?:^|[;\\s])${property}:\\s*([^;]+);`).exec(body)?.[1]?.trim();
  if (value === undefined) throw new Error(`no ${property} in ${selector}`);
  return resolve(value);
}

function resolve(value: string): string {
  const colour = /#[0-9a-f]{6}\b/i.exec(value)?.[0];
  const variable = /var\((--[a-z-]+)\)/.exec(value)?.[1];
  if (variable) return declared(":root", variable);
  if (colour) return colour;
  throw new Error(`not a colour: ${value}`);
}

const paper = declared(":root", "--paper");
const panel = declared(":root", "--panel");
const ink = declared(":root", "--ink");
const cautionBand = declared(".cautions", "background");

// [what, foreground, background, minimum]; every background a piece of text or a control sits on.
const textPairs: readonly [string, string, string, number][] = [
  ["body text on the page", ink, paper, 4.5],
  ["body text on the side panes", ink, panel, 4.5],
  ["muted notes on the page", declared(":root", "--muted"), paper, 4.5],
  ["muted notes on the side panes", declared(":root", "--muted"), panel, 4.5],
  ["muted text on the cautions band", declared(":root", "--muted"), cautionBand, 4.5],
  ["body text on the cautions band", ink, cautionBand, 4.5],
  ["a primary button's label", paper, ink, 4.5],
  ["a chosen tab's label", declared('.tabs [role="tab"][aria-selected="true"]', "color"), declared('.tabs [role="tab"][aria-selected="true"]', "background"), 4.5],
  ["a link button on the side panes", declared("button.link", "color"), panel, 4.5],
  ["an error on the side panes", declared(".error", "color"), panel, 4.5],
  ["an error on the page", declared(".error", "color"), paper, 4.5],
  ["a field error", declared(".field-error", "color"), panel, 4.5],
  ["a region-pane flag", declared(".region-flag", "color"), panel, 4.5],
  ["text on a notice", ink, declared(".notices", "background"), 4.5],
  ["muted text on a notice", declared(":root", "--muted"), declared(".notices", "background"), 4.5],
];

const boundaryPairs: readonly [string, string, string, number][] = [
  ["a button's edge on the side panes", declared("button", "border"), panel, 3],
  ["a button's edge on the page", declared("button", "border"), paper, 3],
  ["a button's edge on the cautions band", declared("button", "border"), cautionBand, 3],
  ["a tab's edge on the side pane", declared('.tabs [role="tab"]', "border"), panel, 3],
  ["the focus ring on the page", declared(":focus-visible", "outline"), paper, 3],
  ["the focus ring on the side panes", declared(":focus-visible", "outline"), panel, 3],
  ["an invalid field's edge", declared('.setting-field input[aria-invalid="true"]', "border"), panel, 3],
  ["the open node's row outline in the node table", declared('.node-table tr[aria-current="true"]', "outline"), paper, 3],
  ["a node's rim in the drawing (light cividis fills would not reach 3:1 alone)", nodeRim, paper, 3],
  ["a node's rim in a saved picture (white ground)", nodeRim, "#ffffff", 3],
];

describe("contrast ratios (WCAG 2.2 relative-luminance formula)", () => {
  it("black on white is 21 and white on white is 1 (worked by hand: 1.05 / 0.05 and 1.05 / 1.05)", () => {
    assertClose(contrastRatio("#000000", "#ffffff"), 21);
    assertClose(contrastRatio("#ffffff", "#ffffff"), 1);
  });

  it("#767676 on white is about 4.54, the lightest grey that passes 4.5:1 (from memory; common practice)", () => {
    assertClose(contrastRatio("#767676", "#ffffff"), 4.54, { absolute: 0.005 });
  });

  it.each(textPairs)("text: %s (%s on %s) reaches %s:1", (_what, foreground, background, minimum) => {
    expect(contrastRatio(foreground, background)).toBeGreaterThanOrEqual(minimum);
  });

  it.each(boundaryPairs)("boundary: %s (%s on %s) reaches %s:1", (_what, foreground, background, minimum) => {
    expect(contrastRatio(foreground, background)).toBeGreaterThanOrEqual(minimum);
  });
});
