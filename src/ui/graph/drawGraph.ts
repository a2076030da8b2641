import { drawLasso, drawRegionMarks, type RegionMarks } from "./drawRegionMarks.ts";
import type { Layout } from "./useForceLayout.ts";
import type { View } from "./view.ts";

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
  /** Fill colour of node k. */
  readonly fillOf: (node: number) => string;
  readonly selected: number | null;
  /** Nodes of the selection, ringed. */
  readonly region: readonly number[];
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

export function drawGraph(context: CanvasRenderingContext2D, layout: Layout, view: View, paint: Paint): void {
  context.clearRect(0, 0, paint.width, paint.height);
  context.save();
  context.translate(view.x, view.y);
  context.scale(view.k, view.k);
  // edges batched by width class (one stroke per class): thousands of single strokes cost seconds per frame
  const widthClasses = new Map<number, Layout["links"][number][]>();
  for (const link of layout.links) {
    const width = Math.min(8, Math.round(Math.log2(link.shared)));
    let group = widthClasses.get(width);
    if (!group) widthClasses.set(width, (group = []));
    group.push(link);
  }
  context.strokeStyle = "rgba(70, 80, 95, 0.45)";
  // …and at most 256 segments per stroke: one path of thousands of crossing segments is slow to rasterise
  for (const [width, links] of widthClasses) {
    context.lineWidth = (0.6 + width) / view.k;
    for (let first = 0; first < links.length; first += segmentsPerStroke) {
      context.beginPath();
      for (const link of links.slice(first, first + segmentsPerStroke)) {
        context.moveTo(link.source.x, link.source.y);
        context.lineTo(link.target.x, link.target.y);
      }
      context.stroke();
    }
  }
  for (const node of layout.nodes) {
    context.fillStyle = paint.fillOf(node.index);
    context.beginPath();
    context.arc(node.x, node.y, node.radius, 0, 2 * Math.PI);
    context.fill();
  }
  context.lineWidth = 1 / view.k;
  context.strokeStyle = "#f7f4ec";
  context.beginPath();
  for (const node of layout.nodes) {
    context.moveTo(node.x + node.radius, node.y);
    context.arc(node.x, node.y, node.radius, 0, 2 * Math.PI);
  }
  context.stroke();
  drawRegionMarks(context, layout, view, paint);
  for (const k of paint.region) {
    const node = layout.nodes[k];
    if (node) doubleRing(context, node, view.k, regionRing);
  }
  const chosen = paint.selected === null ? undefined : layout.nodes[paint.selected];
  if (chosen) doubleRing(context, chosen, view.k, selectionRing);
  context.restore();
  if (paint.lasso) drawLasso(context, paint.lasso);
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
