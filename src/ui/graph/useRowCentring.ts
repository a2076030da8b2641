import { useEffect } from "react";
import type { Layout } from "./useForceLayout.ts";
import type { ViewTransform } from "./useViewTransform.ts";

/**
 * "Find a row" moves the view so that the centre of the nodes holding the row is the middle of the
 * canvas (an offset on top of the view, until the next layout); when the search ends the offset goes.
 */
export function useRowCentring(
  found: readonly number[],
  layout: React.RefObject<Layout | null>,
  view: ViewTransform,
  size: () => { width: number; height: number },
  redraw: () => void,
): void {
  useEffect(() => {
    const current = layout.current;
    if (!current) return;
    const nodes = found.map((k) => current.nodes[k]!).filter(Boolean);
    const centre = nodes.length === 0 ? null : { x: nodes.reduce((sum, n) => sum + n.x, 0) / nodes.length, y: nodes.reduce((sum, n) => sum + n.y, 0) / nodes.length };
    const { width, height } = size();
    view.centreOn(current, centre, width, height);
    redraw();
  }, [found, layout, view, redraw]); // size reads the canvas when called
}
