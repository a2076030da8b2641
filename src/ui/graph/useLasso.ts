import { useRef, type PointerEvent } from "react";
import type { Point } from "./pointInPolygon.ts";

/** Smallest lasso, in screen pixels of width or height, that counts as a drag rather than a click. */
const minimumExtent = 6; // common practice, no source

export interface LassoHandlers {
  /** The lasso being drawn (screen pixels of the canvas), or null. */
  readonly points: React.RefObject<Point[] | null>;
  /** True right after a lasso ended, so the click that follows the pointer-up is not a click on the graph. */
  readonly justEnded: () => boolean;
  readonly onPointerDown: (event: PointerEvent<HTMLCanvasElement>) => void;
  readonly onPointerMove: (event: PointerEvent<HTMLCanvasElement>) => void;
  readonly onPointerUp: (event: PointerEvent<HTMLCanvasElement>) => void;
}

/**
 * A free-hand lasso on a canvas: a drag that starts on empty space (where `startsOn` says no node
 * is) draws a polygon; on release `onFinish(polygon, additive)` gets it, with `additive` true when
 * shift was held. `onChange` is called as the lasso grows so the caller can redraw.
 */
export function useLasso(startsOn: (x: number, y: number) => boolean, onChange: () => void, onFinish: (polygon: readonly Point[], additive: boolean) => void): LassoHandlers {
  const points = useRef<Point[] | null>(null);
  const ended = useRef(false);
  const at = (event: PointerEvent<HTMLCanvasElement>): Point => {
    const rect = event.currentTarget.getBoundingClientRect();
    return { x: event.clientX - rect.left, y: event.clientY - rect.top };
  };
  return {
    points,
    justEnded: () => {
      const was = ended.current;
      ended.current = false;
      return was;
    },
    onPointerDown(event) {
      ended.current = false;
      if (event.button !== 0) return;
      const p = at(event);
      if (!startsOn(p.x, p.y)) return;
      points.current = [p];
      event.currentTarget.setPointerCapture?.(event.pointerId);
    },
    onPointerMove(event) {
      const lasso = points.current;
      if (!lasso) return;
      const p = at(event);
      const last = lasso[lasso.length - 1]!;
      if (Math.hypot(p.x - last.x, p.y - last.y) < 2) return;
      lasso.push(p);
      onChange();
    },
    onPointerUp(event) {
      const lasso = points.current;
      if (!lasso) return;
      points.current = null;
      const xs = lasso.map((p) => p.x);
      const ys = lasso.map((p) => p.y);
      const dragged = lasso.length >= 3 && Math.max(Math.max(...xs) - Math.min(...xs), Math.max(...ys) - Math.min(...ys)) >= minimumExtent;
      if (dragged) {
        ended.current = true;
        onFinish(lasso, event.shiftKey);
      }
      onChange();
    },
  };
}
