/** Screen = layout · k + (x, y). */
export interface FrameTransform {
  readonly k: number;
  readonly x: number;
  readonly y: number;
}

/**
 * Fits the bodies' bounding box (centre ± radius) into a box of `width` × `height` at (left, top)
 * with a margin on every side, scaled uniformly and centred; never zooms past 1.6× (as the workbench).
 * No bodies, or a box with no extent, gives scale 1 centred. O(n).
 * @example fitFrame([0], [0], [10], { left: 0, top: 0, width: 100, height: 100, margin: 10 }) // => { k: 1.6, x: 50, y: 50 }
 */
export function fitFrame(
  xs: ArrayLike<number>,
  ys: ArrayLike<number>,
  radii: ArrayLike<number>,
  box: { readonly left: number; readonly top: number; readonly width: number; readonly height: number; readonly margin: number },
): FrameTransform {
  let x0 = Infinity, y0 = Infinity, x1 = -Infinity, y1 = -Infinity;
  for (let i = 0; i < xs.length; ++i) {
    const r = radii[i]!;
    x0 = Math.min(x0, xs[i]! - r);
    y0 = Math.min(y0, ys[i]! - r);
    x1 = Math.max(x1, xs[i]! + r);
    y1 = Math.max(y1, ys[i]! + r);
  }
  const cx = box.left + box.width / 2;
  const cy = box.top + box.height / 2;
  if (!(x1 > x0) || !(y1 > y0)) return { k: 1, x: cx, y: cy };
  const k = Math.min(1.6, (box.width - 2 * box.margin) / (x1 - x0), (box.height - 2 * box.margin) / (y1 - y0));
  return { k, x: cx - (k * (x0 + x1)) / 2, y: cy - (k * (y0 + y1)) / 2 };
}
