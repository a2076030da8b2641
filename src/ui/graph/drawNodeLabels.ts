import type { Layout } from "./useForceLayout.ts";
import type { View } from "./view.ts";

const ink = "#23272f"; // --ink in styles.css
const paper = "#fbfaf6"; // --panel in styles.css
const rule = "#d9d3c7"; // --rule in styles.css

/** Node numbers are written inside nodes drawn at least this many pixels in radius, and on at most this many nodes (our choice, no source). */
export const numberedRadius = 11;
const maxNumbers = 600;

/**
 * Writes each node's number (1-based) in it when the view is zoomed in far enough for the number to
 * fit (radius ≥ 11 px on screen), for nodes on the canvas; zoomed out, no text is drawn at all.
 * Call with the page's pixel-ratio transform (screen pixels).
 */
export function drawNodeNumbers(context: CanvasRenderingContext2D, layout: Layout, view: View, width: number, height: number): void {
  let written = 0;
  context.font = "11px system-ui, sans-serif";
  context.textAlign = "center";
  context.textBaseline = "middle";
  context.lineWidth = 3;
  context.strokeStyle = paper;
  context.fillStyle = ink;
  for (const node of layout.nodes) {
    const r = view.k * node.radius;
    if (r < numberedRadius) continue;
    const x = view.k * node.x + view.x;
    const y = view.k * node.y + view.y;
    if (x < -r || y < -r || x > width + r || y > height + r) continue;
    const text = String(node.index + 1);
    context.strokeText(text, x, y);
    context.fillText(text, x, y);
    if (++written >= maxNumbers) break;
  }
}

/** A label box beside node `node` (hover or keyboard focus) in screen pixels, kept inside the canvas. */
export function drawNodeLabel(context: CanvasRenderingContext2D, layout: Layout, view: View, label: { readonly node: number; readonly text: string }, width: number, height: number): void {
  const node = layout.nodes[label.node];
  if (!node) return;
  context.font = "12px system-ui, sans-serif";
  context.textAlign = "left";
  context.textBaseline = "middle";
  const boxWidth = context.measureText(label.text).width + 12;
  const boxHeight = 22;
  const r = view.k * node.radius;
  let x = view.k * node.x + view.x + r + 8;
  let y = view.k * node.y + view.y - r - boxHeight;
  if (x + boxWidth > width) x = Math.max(0, view.k * node.x + view.x - r - 8 - boxWidth);
  y = Math.min(Math.max(0, y), Math.max(0, height - boxHeight));
  context.fillStyle = paper;
  context.strokeStyle = rule;
  context.lineWidth = 1;
  context.beginPath();
  context.rect(x + 0.5, y + 0.5, boxWidth, boxHeight);
  context.fill();
  context.stroke();
  context.fillStyle = ink;
  context.fillText(label.text, x + 6.5, y + boxHeight / 2 + 0.5);
}
