import { outlineStyle } from "../../core/picture/colourSchemes.ts";
import type { View } from "./view.ts";
import type { Point } from "./pointInPolygon.ts";
import type { Layout } from "./useForceLayout.ts";

// one home for the outline styles: core/picture/colourSchemes.ts, shared with the saved picture
export { outlineSchemeName, outlineStyle, type OutlineStyle } from "../../core/picture/colourSchemes.ts";

export interface RegionMarks {
  /** Per region: its place in the list (the style) and the nodes most of whose rows lie in it. */
  readonly outlines?: readonly { readonly style: number; readonly nodes: readonly number[] }[];
  /** Share of each node's rows in the active region, drawn as an arc from twelve o'clock; with the active region's style. */
  readonly share?: { readonly values: Float64Array; readonly style: number } | null;
  /** Nodes holding the row looked for. */
  readonly found?: readonly number[];
  /** The lasso being drawn, in screen pixels. */
  readonly lasso?: readonly Point[] | null;
}

const ink = "#23272f"; // --ink in styles.css

/** Draws region outlines, the active region's share arcs and the found-row marks, in world coordinates (the view's transform is set). */
export function drawRegionMarks(context: CanvasRenderingContext2D, layout: Layout, view: View, marks: RegionMarks): void {
  const k = view.k;
  if (marks.share) {
    const { values, style } = marks.share;
    context.strokeStyle = outlineStyle(style).colour;
    context.lineWidth = 3 / k;
    context.setLineDash([]);
    for (const node of layout.nodes) {
      const share = values[node.index] ?? 0;
      if (!(share > 0)) continue;
      context.beginPath();
      context.arc(node.x, node.y, node.radius + 3.5 / k, -Math.PI / 2, -Math.PI / 2 + 2 * Math.PI * share);
      context.stroke();
    }
  }
  for (const outline of marks.outlines ?? []) {
    const { colour, dash } = outlineStyle(outline.style);
    context.strokeStyle = colour;
    context.lineWidth = 2 / k;
    context.setLineDash(dash.map((d) => d / k));
    const gap = (8 + 3 * (outline.style % 4)) / k;
    context.beginPath();
    for (const index of outline.nodes) {
      const node = layout.nodes[index];
      if (!node) continue;
      context.moveTo(node.x + node.radius + gap, node.y);
      context.arc(node.x, node.y, node.radius + gap, 0, 2 * Math.PI);
    }
    context.stroke();
  }
  context.setLineDash([]);
  // the row looked for: four ink ticks around each node holding it, like sights
  context.strokeStyle = ink;
  context.lineWidth = 2 / k;
  context.beginPath();
  for (const index of marks.found ?? []) {
    const node = layout.nodes[index];
    if (!node) continue;
    const inner = node.radius + 6 / k;
    const outer = node.radius + 16 / k;
    for (const [dx, dy] of [[1, 0], [-1, 0], [0, 1], [0, -1]] as const) {
      context.moveTo(node.x + dx * inner, node.y + dy * inner);
      context.lineTo(node.x + dx * outer, node.y + dy * outer);
    }
  }
  context.stroke();
}

/** Draws the lasso in screen pixels (call with the identity transform of the page's pixel ratio). */
export function drawLasso(context: CanvasRenderingContext2D, lasso: readonly Point[]): void {
  if (lasso.length < 2) return;
  context.beginPath();
  context.moveTo(lasso[0]!.x, lasso[0]!.y);
  for (const p of lasso.slice(1)) context.lineTo(p.x, p.y);
  context.closePath();
  context.fillStyle = "rgba(35, 39, 47, 0.08)";
  context.fill();
  context.strokeStyle = ink;
  context.lineWidth = 1.5;
  context.setLineDash([4, 4]);
  context.stroke();
  context.setLineDash([]);
}
