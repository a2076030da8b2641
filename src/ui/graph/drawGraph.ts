import { drawLasso, drawRegionMarks, type RegionMarks } from "./drawRegionMarks.ts";
import { drawNodeLabel, drawNodeNumbers } from "./drawNodeLabels.ts";
import { edgeBatches, fillBatches } from "./drawBatches.ts";
import type { Layout, LayoutNode } from "./useForceLayout.ts";
import type { View } from "./view.ts";
import { nodeRim } from "./scales.ts";

/** Fits the layout's bounding box (with node radii) into the canvas with a margin; never zooms past 1.6×. */
export function fitTransform(layout: Layout, width: number, height: number, margin = 16): View {
  let x0 = Infinity, y0 = Infinity, x1 = -Infinity, y1 = -Infinity;
  for (const n of layout.nodes) {
    x0 = Math.min(x0, n.x - n.radius);
    y0 = Math.min(y0, n.y - n.radius);
    x1 = Math.max(x1, n.x + n.radius);
    y1 = Math.max(y1, n.y + n.radius);
  }
  if (!(x1 > x0) || !(y1 > y0)) return { k: 1, x: width / 2, y: height / 2 };
  const k = Math.min(1.6, (width - 2 * margin) / (x1 - x0), (height - 2 * margin) / (y1 - y0));
  return { k, x: width / 2 - k * (x0 + x1) / 2, y: height / 2 - k * (y0 + y1) / 2 };
}

export interface Paint extends RegionMarks {
  readonly width: number;
  readonly height: number;
  /** Fill colour of node k; pass the same function from frame to frame while the colours stay, so the colour batches are reused. */
  readonly fillOf: (node: number) => string;
  readonly selected: number | null;
  /** Nodes of the selection, ringed. */
  readonly region: readonly number[];
  /** The node with keyboard focus, ringed in the accent, or null. */
  readonly focused?: number | null;
  /** A label beside a node (hover, keyboard focus), or null. */
  readonly label?: { readonly node: number; readonly text: string } | null;
  /** Edge width by shared rows (edgeWidth.ts) instead of one width for all. */
  readonly edgeWidthByShared?: boolean;
}

const segmentsPerStroke = 256;

/** A ring in two bands, in screen pixels: a light band against the node's fill, a dark band against the page. */
export interface Ring {
  readonly light: string;
  readonly dark: string;
  readonly lightWidth: number;
  readonly darkWidth: number;
}

// ink and paper, never a palette or accent colour: a light band touches the fill (visible on the darkest
// palette colour), a dark band touches the page (visible on the light background)
export const selectionRing: Ring = { light: "#ffffff", dark: "#23272f", lightWidth: 2.5, darkWidth: 3 };
export const regionRing: Ring = { light: "#ffffff", dark: "#23272f", lightWidth: 1.5, darkWidth: 1.5 };

function doubleRing(context: CanvasRenderingContext2D, node: { x: number; y: number; radius: number }, k: number, ring: Ring): void {
  const bands = [
    { colour: ring.light, width: ring.lightWidth, middle: ring.lightWidth / 2 },
    { colour: ring.dark, width: ring.darkWidth, middle: ring.lightWidth + ring.darkWidth / 2 },
  ];
  for (const band of bands) {
    context.lineWidth = band.width / k;
    context.strokeStyle = band.colour;
    context.beginPath();
    context.arc(node.x, node.y, node.radius + band.middle / k, 0, 2 * Math.PI);
    context.stroke();
  }
}

const focusColour = "#1d4ed8"; // --accent in styles.css: the accent marks keyboard focus and nothing else on the graph

/**
 * Draws the graph: edges (batched by width, at most 256 segments a stroke), nodes (one path per fill
 * colour), rings, region marks, pins, node numbers when zoomed in, the focus ring and a label.
 * Nodes and edges wholly off the canvas are skipped.
 */
export function drawGraph(context: CanvasRenderingContext2D, layout: Layout, view: View, paint: Paint): void {
  context.clearRect(0, 0, paint.width, paint.height);
  context.save();
  context.translate(view.x, view.y);
  context.scale(view.k, view.k);
  // the canvas in world coordinates, for skipping what lies wholly outside it
  const x0 = -view.x / view.k;
  const y0 = -view.y / view.k;
  const x1 = (paint.width - view.x) / view.k;
  const y1 = (paint.height - view.y) / view.k;
  context.strokeStyle = "rgba(70, 80, 95, 0.45)";
  // at most 256 segments per stroke: one path of thousands of crossing segments is slow to rasterise
  for (const { width, links } of edgeBatches(layout, paint.edgeWidthByShared ?? false)) {
    context.lineWidth = width / view.k;
    let segments = 0;
    context.beginPath();
    for (let i = 0; i < links.length; ++i) {
      const { source: a, target: b } = links[i]!;
      if ((a.x < x0 && b.x < x0) || (a.x > x1 && b.x > x1) || (a.y < y0 && b.y < y0) || (a.y > y1 && b.y > y1)) continue;
      context.moveTo(a.x, a.y);
      context.lineTo(b.x, b.y);
      if (++segments === segmentsPerStroke) {
        context.stroke();
        context.beginPath();
        segments = 0;
      }
    }
    if (segments > 0) context.stroke();
  }
  const isShown = (node: LayoutNode): boolean => node.x + node.radius >= x0 && node.x - node.radius <= x1 && node.y + node.radius >= y0 && node.y - node.radius <= y1;
  for (const { colour, nodes } of fillBatches(layout, paint.fillOf)) {
    context.fillStyle = colour;
    context.beginPath();
    for (let i = 0; i < nodes.length; ++i) {
      const node = layout.nodes[nodes[i]!]!;
      if (!isShown(node)) continue;
      context.moveTo(node.x + node.radius, node.y);
      context.arc(node.x, node.y, node.radius, 0, 2 * Math.PI);
    }
    context.fill();
  }
  context.lineWidth = 1 / view.k;
  // a dark rim: light fills (the top of cividis) keep a 3:1 boundary against the page (WCAG 2.2, 1.4.11)
  context.strokeStyle = nodeRim;
  context.beginPath();
  for (const node of layout.nodes) {
    if (!isShown(node)) continue;
    context.moveTo(node.x + node.radius, node.y);
    context.arc(node.x, node.y, node.radius, 0, 2 * Math.PI);
  }
  context.stroke();
  drawPins(context, layout, view.k);
  drawRegionMarks(context, layout, view, paint);
  for (const k of paint.region) {
    const node = layout.nodes[k];
    if (node) doubleRing(context, node, view.k, regionRing);
  }
  const chosen = paint.selected === null ? undefined : layout.nodes[paint.selected];
  if (chosen) doubleRing(context, chosen, view.k, selectionRing);
  const focused = paint.focused == null ? undefined : layout.nodes[paint.focused];
  if (focused) doubleRing(context, { x: focused.x, y: focused.y, radius: focused.radius + 7 / view.k }, view.k, focusRing);
  context.restore();
  drawNodeNumbers(context, layout, view, paint.width, paint.height);
  if (paint.lasso) drawLasso(context, paint.lasso);
  if (paint.label) drawNodeLabel(context, layout, view, paint.label, paint.width, paint.height);
}

/** The keyboard-focus ring: paper inside, the accent outside, 7 px out from the node (clear of the selection ring). */
export const focusRing: Ring = { light: "#ffffff", dark: focusColour, lightWidth: 1.5, darkWidth: 2.5 };

/** A pinned node (held where a person dragged it) carries a small ink dot on paper on its rim, up and to the right, clear of its number. */
function drawPins(context: CanvasRenderingContext2D, layout: Layout, k: number): void {
  context.beginPath();
  let any = false;
  for (const node of layout.nodes) {
    if (node.fx == null) continue;
    any = true;
    const x = node.x + node.radius * Math.SQRT1_2;
    const y = node.y - node.radius * Math.SQRT1_2;
    context.moveTo(x + 3.5 / k, y);
    context.arc(x, y, 3.5 / k, 0, 2 * Math.PI);
  }
  if (!any) return;
  context.fillStyle = "#23272f"; // --ink in styles.css
  context.fill();
  context.lineWidth = 1.5 / k;
  context.strokeStyle = "#ffffff";
  context.stroke();
}

/** The topmost node under a screen point, or null. */
export function hitNode(layout: Layout, view: View, screenX: number, screenY: number): number | null {
  const x = (screenX - view.x) / view.k;
  const y = (screenY - view.y) / view.k;
  for (let i = layout.nodes.length - 1; i >= 0; --i) {
    const node = layout.nodes[i]!;
    const slack = Math.max(node.radius, 6 / view.k);
    if ((node.x - x) ** 2 + (node.y - y) ** 2 <= slack * slack) return node.index;
  }
  return null;
}
