import { readFileSync } from "node:fs";
import { join } from "node:path";
import { expect, it } from "vitest";
import { drawGraph, selectionRing } from "../../../src/ui/graph/drawGraph.ts";
import { missingColor, okabeIto, otherColor, plainColor } from "../../../src/ui/graph/scales.ts";
import type { Layout, LayoutNode } from "../../../src/ui/graph/useForceLayout.ts";

const paper = "#f4f1ea"; // the page background, --paper in styles.css

/** WCAG 2.x relative luminance of an sRGB hex colour (W3C, Web Content Accessibility Guidelines 2.1, "relative luminance"). */
function luminance(hex: string): number {
  const channel = (k: number): number => {
    const c = parseInt(hex.slice(1 + 2 * k, 3 + 2 * k), 16) / 255;
    return c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4; // WCAG 2.1 uses 0.03928, equivalent for 8-bit values
  };
  return 0.2126 * channel(0) + 0.7152 * channel(1) + 0.0722 * channel(2);
}

/** WCAG 2.x contrast ratio (L1 + 0.05) / (L2 + 0.05). */
function contrast(a: string, b: string): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x) as [number, number];
  return (hi + 0.05) / (lo + 0.05);
}

interface Stroke { readonly colour: string; readonly width: number; readonly radius: number }

/** A stand-in 2D context that records every stroked circle around (0, 0) with its colour and line width. */
function recordingContext(): { context: CanvasRenderingContext2D; rings: Stroke[] } {
  const rings: Stroke[] = [];
  let arcs: number[] = [];
  const state = { strokeStyle: "", lineWidth: 1, fillStyle: "" };
  const context = {
    ...state,
    clearRect() {}, save() {}, restore() {}, translate() {}, scale() {}, moveTo() {}, lineTo() {}, fill() {}, setLineDash() {},
    beginPath() { arcs = []; },
    arc(x: number, y: number, r: number) { if (x === 0 && y === 0) arcs.push(r); },
    stroke() { for (const r of arcs) rings.push({ colour: String(context.strokeStyle), width: context.lineWidth, radius: r }); },
  };
  return { context: context as unknown as CanvasRenderingContext2D, rings };
}

const node: LayoutNode = { index: 0, radius: 10, x: 0, y: 0 };
const layout: Layout = { nodes: [node], links: [] };

function selectionRingsOn(fill: string): Stroke[] {
  const { context, rings } = recordingContext();
  drawGraph(context, layout, { k: 1, x: 0, y: 0 }, { width: 100, height: 100, fillOf: () => fill, selected: 0, region: [] });
  return rings.filter((r) => r.radius > node.radius).sort((a, b) => a.radius - b.radius);
}

// 3:1 is WCAG 2.1's minimum contrast for graphical objects (success criterion 1.4.11). A light fill
// merges with the light band, which then reads as part of the node, so the dark band must stand out from the fill
it.each([...okabeIto, missingColor, plainColor, otherColor])("a selected node filled %s keeps a ring band of contrast ≥ 3 against its fill, and its outer band has contrast ≥ 3 against the page", (fill) => {
  const rings = selectionRingsOn(fill);
  expect(rings.length).toBeGreaterThanOrEqual(2);
  const inner = rings[0]!;
  const outer = rings[rings.length - 1]!;
  expect(inner.radius - inner.width / 2).toBeGreaterThanOrEqual(node.radius); // the inner band starts at the node's edge
  expect(Math.max(...rings.map((r) => contrast(r.colour, fill)))).toBeGreaterThanOrEqual(3);
  expect(contrast(outer.colour, paper)).toBeGreaterThanOrEqual(3);
});

it("the selection ring's two bands, white and ink, contrast ≥ 3 with each other", () => {
  expect(contrast(selectionRing.light, selectionRing.dark)).toBeGreaterThanOrEqual(3);
});

it("the darkest palette colour, Okabe–Ito black #000000, still shows the selection ring's light band", () => {
  expect(okabeIto[okabeIto.length - 1]).toBe("#000000"); // black is the eighth Okabe–Ito colour (Okabe and Ito 2008)
  const rings = selectionRingsOn("#000000");
  expect(rings[0]!.colour).toBe(selectionRing.light);
  expect(contrast(selectionRing.light, "#000000")).toBeGreaterThanOrEqual(3);
});

it("the selection ring uses none of the accent colour, which styles.css keeps for interactive controls and focus", () => {
  const css = readFileSync(join(process.cwd(), "src/ui/styles.css"), "utf8"); // vitest runs from the repository root
  const accent = /--accent:\s*(#[0-9a-fA-F]{6})/.exec(css)![1]!.toLowerCase();
  for (const fill of okabeIto) expect(selectionRingsOn(fill).map((r) => r.colour.toLowerCase())).not.toContain(accent);
});
