import { useEffect, useRef, type PointerEvent } from "react";
import type { Point } from "./pointInPolygon.ts";
import type { View } from "./view.ts";
import { panView, pinchView, toWorld, wheelFactor, zoomAround } from "./viewTransform.ts";

/** Smallest movement, in screen pixels, that makes a press a drag rather than a click. */
const dragThreshold = 4; // common practice, no source

export interface GestureTarget {
  /** The view of the latest drawing, or null before the first. */
  readonly view: () => View | null;
  readonly setView: (view: View) => void;
  /** The node under a canvas point, or null. */
  readonly nodeAt: (x: number, y: number) => number | null;
  /** True when a plain drag on empty space draws a lasso (the lasso mode) rather than pans. */
  readonly lassoMode: () => boolean;
  readonly pin: (node: number, world: Point) => void;
  readonly release: () => void;
  readonly finishLasso: (polygon: readonly Point[], additive: boolean) => void;
  readonly hover: (node: number | null) => void;
  readonly redraw: () => void;
}

type Gesture =
  | { readonly kind: "pan"; readonly from: Point; readonly start: View; moved: boolean }
  | { readonly kind: "node"; readonly node: number; readonly from: Point; moved: boolean }
  | { readonly kind: "lasso"; readonly points: Point[]; moved: boolean }
  | { readonly kind: "pinch"; readonly a: number; readonly b: number; readonly starts: readonly [Point, Point]; readonly start: View; moved: true };

export interface PointerGestures {
  /** The lasso being drawn (canvas CSS pixels), or null. */
  readonly lasso: () => readonly Point[] | null;
  /** True right after a drag ended, so the click that follows the pointer-up is not a click on the graph. */
  readonly justDragged: () => boolean;
  readonly onPointerDown: (event: PointerEvent<HTMLCanvasElement>) => void;
  readonly onPointerMove: (event: PointerEvent<HTMLCanvasElement>) => void;
  readonly onPointerUp: (event: PointerEvent<HTMLCanvasElement>) => void;
  readonly onPointerCancel: (event: PointerEvent<HTMLCanvasElement>) => void;
  readonly onPointerLeave: () => void;
}

/**
 * The canvas's pointer gestures, one at a time: a drag on a node moves it and pins it there; a drag
 * on empty space pans (or, in lasso mode or with shift held, draws a lasso; shift adds to the
 * selection); two pointers pinch-zoom and pan; the wheel zooms about the pointer. A press that
 * moves less than 4 px stays a click. `shown` says whether the canvas is on the page.
 */
export function usePointerGestures(canvas: React.RefObject<HTMLCanvasElement | null>, shown: boolean, target: GestureTarget): PointerGestures {
  const on = useRef(target);
  on.current = target;
  const pointers = useRef(new Map<number, Point>());
  const gesture = useRef<Gesture | null>(null);
  const dragged = useRef(false);
  useEffect(() => {
    const element = canvas.current;
    if (!element) return;
    // a native listener: React's wheel listener is passive and could not keep the page from scrolling or zooming
    const onWheel = (event: WheelEvent): void => {
      const view = on.current.view();
      if (!view) return;
      event.preventDefault();
      const rect = element.getBoundingClientRect();
      on.current.setView(zoomAround(view, wheelFactor(event.deltaY, event.deltaMode, event.ctrlKey), { x: event.clientX - rect.left, y: event.clientY - rect.top }));
      on.current.redraw();
    };
    element.addEventListener("wheel", onWheel, { passive: false });
    return () => element.removeEventListener("wheel", onWheel);
  }, [canvas, shown]); // a canvas taken away (a graph too large to draw) and shown again is a new element
  const at = (event: PointerEvent<HTMLCanvasElement>): Point => {
    const rect = event.currentTarget.getBoundingClientRect();
    return { x: event.clientX - rect.left, y: event.clientY - rect.top };
  };
  const end = (): void => {
    const was = gesture.current;
    gesture.current = null;
    if (was?.kind === "node" && was.moved) on.current.release();
    if (was?.moved) dragged.current = true;
  };
  return {
    lasso: () => (gesture.current?.kind === "lasso" ? gesture.current.points : null),
    justDragged: () => {
      const was = dragged.current;
      dragged.current = false;
      return was;
    },
    onPointerDown(event) {
      dragged.current = false;
      const p = at(event);
      pointers.current.set(event.pointerId, p);
      try {
        event.currentTarget.setPointerCapture?.(event.pointerId);
      } catch {
        // a pointer that is already gone (or a scripted one) cannot be captured; the gesture works without
      }
      const view = on.current.view();
      if (!view) return;
      if (pointers.current.size === 2) {
        // a second finger turns whatever the first began into a pinch
        const [[a, pa], [b, pb]] = [...pointers.current] as [[number, Point], [number, Point]];
        if (gesture.current?.kind === "node" && gesture.current.moved) on.current.release();
        gesture.current = { kind: "pinch", a, b, starts: [pa, pb], start: view, moved: true };
        on.current.redraw();
        return;
      }
      if (pointers.current.size > 2 || (event.pointerType === "mouse" && event.button !== 0)) return;
      const node = on.current.nodeAt(p.x, p.y);
      if (node !== null) gesture.current = { kind: "node", node, from: p, moved: false };
      else if (on.current.lassoMode() || event.shiftKey) gesture.current = { kind: "lasso", points: [p], moved: false };
      else gesture.current = { kind: "pan", from: p, start: view, moved: false };
    },
    onPointerMove(event) {
      const p = at(event);
      if (pointers.current.has(event.pointerId)) pointers.current.set(event.pointerId, p);
      const g = gesture.current;
      if (!g) {
        if (event.buttons === 0) on.current.hover(on.current.nodeAt(p.x, p.y));
        return;
      }
      if (g.kind === "pinch") {
        const a = pointers.current.get(g.a);
        const b = pointers.current.get(g.b);
        if (a && b) on.current.setView(pinchView(g.start, g.starts[0], g.starts[1], a, b));
      } else if (g.kind === "lasso") {
        const last = g.points[g.points.length - 1]!;
        if (Math.hypot(p.x - last.x, p.y - last.y) < 2) return;
        g.points.push(p);
        const first = g.points[0]!;
        g.moved ||= g.points.some((q) => Math.max(Math.abs(q.x - first.x), Math.abs(q.y - first.y)) >= dragThreshold);
      } else {
        g.moved ||= Math.hypot(p.x - g.from.x, p.y - g.from.y) >= dragThreshold;
        if (!g.moved) return;
        if (g.kind === "pan") on.current.setView(panView(g.start, p.x - g.from.x, p.y - g.from.y));
        else {
          const view = on.current.view();
          if (!view) return;
          // the view holds still under a dragged node (a fitted view would refit as the node moves)
          on.current.setView(view);
          on.current.pin(g.node, toWorld(view, p));
        }
      }
      on.current.redraw();
    },
    onPointerUp(event) {
      pointers.current.delete(event.pointerId);
      const g = gesture.current;
      if (g?.kind === "lasso" && g.moved && g.points.length >= 3) on.current.finishLasso(g.points, event.shiftKey);
      // lifting one finger of a pinch ends it; the other finger does nothing until it is lifted too
      end();
      on.current.redraw();
    },
    onPointerCancel(event) {
      pointers.current.delete(event.pointerId);
      end();
      on.current.redraw();
    },
    onPointerLeave: () => on.current.hover(null),
  };
}
