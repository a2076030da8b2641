import { useMemo, useRef } from "react";
import { fitTransform } from "./drawGraph.ts";
import type { Point } from "./pointInPolygon.ts";
import type { Layout } from "./useForceLayout.ts";
import type { View } from "./view.ts";
import { toScreen } from "./viewTransform.ts";

/**
 * Where the graph is looked at from. Until a person zooms or pans, the view follows the fit (every
 * drawing fits the layout as it settles); after that it stays where they put it, until "Fit" or a
 * new layout. "Find a row" adds an offset on top, which goes back to zero when the search ends.
 */
export interface ViewTransform {
  /** The view for this drawing of `layout` on a canvas of the given CSS size; remembered as `current`. */
  readonly resolve: (layout: Layout, width: number, height: number) => View;
  /** The view of the latest drawing, or null before the first. */
  readonly current: () => View | null;
  /** What "find a row" added to the view ({ x: 0, y: 0 } otherwise). */
  readonly offset: () => Point;
  /** True while the view follows the fit (nobody zoomed or panned since the last fit). */
  readonly isFitted: () => boolean;
  /** A person moved the view: it stays at `view` from now on. */
  readonly set: (view: View) => void;
  /** Back to following the fit. */
  readonly fit: () => void;
  /** Centres the world point `world` of `layout` on the canvas by an offset (find a row); null removes the offset. */
  readonly centreOn: (layout: Layout, world: Point | null, width: number, height: number) => void;
}

export function useViewTransform(): ViewTransform {
  const chosen = useRef<View | null>(null);
  const offset = useRef<Point>({ x: 0, y: 0 });
  const current = useRef<View | null>(null);
  const drawn = useRef<Layout | null>(null);
  // the view the offset is added to: the person's, or the fit of this layout on this canvas
  const base = (layout: Layout, width: number, height: number): View => chosen.current ?? fitTransform(layout, width, height);
  // a new layout (result or seed) is fitted afresh
  const adopt = (layout: Layout): void => {
    if (drawn.current === layout) return;
    chosen.current = null;
    offset.current = { x: 0, y: 0 };
    drawn.current = layout;
  };
  return useMemo<ViewTransform>(
    () => ({
      resolve(layout, width, height) {
        adopt(layout);
        const view = base(layout, width, height);
        current.current = { k: view.k, x: view.x + offset.current.x, y: view.y + offset.current.y };
        return current.current;
      },
      current: () => current.current,
      offset: () => offset.current,
      isFitted: () => chosen.current === null,
      set(view) {
        chosen.current = view;
        offset.current = { x: 0, y: 0 };
        current.current = view;
      },
      fit() {
        chosen.current = null;
        offset.current = { x: 0, y: 0 };
      },
      centreOn(layout, world, width, height) {
        adopt(layout);
        if (!world) {
          offset.current = { x: 0, y: 0 };
          return;
        }
        const at = toScreen(base(layout, width, height), world);
        offset.current = { x: width / 2 - at.x, y: height / 2 - at.y };
      },
    }),
    [],
  );
}
