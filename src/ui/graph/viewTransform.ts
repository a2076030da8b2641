import type { Point } from "./pointInPolygon.ts";
import type { View } from "./view.ts";

/**
 * The zoom range, as the view's scale k (screen pixels per layout unit). A 5,000-node layout spans
 * about 3,000 units and fits at k ≈ 0.2; at 40 a 3-unit node is 120 px across. (our choice, no source)
 */
export const scaleRange = { min: 0.01, max: 40 } as const;

/** Screen point of a world point: s = k·w + t. */
export function toScreen(view: View, world: Point): Point {
  return { x: view.k * world.x + view.x, y: view.k * world.y + view.y };
}

/** World point under a screen point: w = (s − t) / k. */
export function toWorld(view: View, screen: Point): Point {
  return { x: (screen.x - view.x) / view.k, y: (screen.y - view.y) / view.k };
}

/** k clamped to `scaleRange`. */
export function clampScale(k: number): number {
  return Math.min(scaleRange.max, Math.max(scaleRange.min, k));
}

/** The view moved by (dx, dy) screen pixels. */
export function panView(view: View, dx: number, dy: number): View {
  return { k: view.k, x: view.x + dx, y: view.y + dy };
}

/**
 * Zoom about a screen point: the scale becomes clamp(k·factor) and the world point under `at`
 * stays under it: t' = at − k'·w with w = (at − t) / k.
 * Degenerate input: a factor that is not finite and positive leaves the view as it is.
 * @example zoomAround({ k: 1, x: 0, y: 0 }, 2, { x: 10, y: 20 }) // => { k: 2, x: -10, y: -20 }
 */
export function zoomAround(view: View, factor: number, at: Point): View {
  if (!(factor > 0) || !Number.isFinite(factor)) return view;
  const k = clampScale(view.k * factor);
  const world = toWorld(view, at);
  return { k, x: at.x - k * world.x, y: at.y - k * world.y };
}

/**
 * Zoom factor of one wheel event: 2^(−deltaY · unit), with unit 0.002 per pixel, 0.05 per line and
 * 1 per page (deltaMode 0, 1, 2), ten times as much with ctrl (a trackpad pinch arrives as a
 * ctrl-wheel). These are d3-zoom's default wheel delta (d3-zoom 3.0, zoom.js `defaultWheelDelta`).
 * @example wheelFactor(-500, 0, false) // => 2
 */
export function wheelFactor(deltaY: number, deltaMode: number, ctrlKey: boolean): number {
  const unit = deltaMode === 1 ? 0.05 : deltaMode ? 1 : 0.002;
  return 2 ** (-deltaY * unit * (ctrlKey ? 10 : 1));
}

/**
 * Two-finger zoom and pan: the view that keeps the world points first under `startA` and
 * `startB` (in the view `start`) under the fingers' midpoint, scaled by the ratio of the fingers'
 * distances: k' = clamp(k · |nowA − nowB| / |startA − startB|), and the world midpoint
 * m = ((startA + startB) / 2 − t) / k lands at (nowA + nowB) / 2. No rotation.
 * Degenerate input: fingers that started at one point only pan.
 * @example pinchView({ k: 1, x: 0, y: 0 }, { x: 0, y: 0 }, { x: 10, y: 0 }, { x: 0, y: 0 }, { x: 20, y: 0 }) // => { k: 2, x: 0, y: 0 }
 */
export function pinchView(start: View, startA: Point, startB: Point, nowA: Point, nowB: Point): View {
  const before = Math.hypot(startB.x - startA.x, startB.y - startA.y);
  const after = Math.hypot(nowB.x - nowA.x, nowB.y - nowA.y);
  const k = before > 0 ? clampScale((start.k * after) / before) : start.k;
  const middle = toWorld(start, { x: (startA.x + startB.x) / 2, y: (startA.y + startB.y) / 2 });
  return { k, x: (nowA.x + nowB.x) / 2 - k * middle.x, y: (nowA.y + nowB.y) / 2 - k * middle.y };
}
