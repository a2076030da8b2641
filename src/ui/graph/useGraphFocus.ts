import { useEffect, useMemo, useRef, useState, type KeyboardEvent } from "react";
import type { CoverResult } from "../../core/index.ts";
import { actions } from "../../state/actions.ts";
import type { NodeFill } from "../../state/nodeFill.ts";
import { workbenchStore } from "../../state/store.ts";
import { arrowAngles, neighbourInDirection } from "./neighbourInDirection.ts";
import { neighbourLists, neighboursOf } from "./neighbourLists.ts";
import { colourOfNode, nodeCaption } from "./nodeCaption.ts";
import type { Layout } from "./useForceLayout.ts";
import type { ViewTransform } from "./useViewTransform.ts";
import { panView, toScreen, zoomAround } from "./viewTransform.ts";

/** Zoom step of the + and − keys and buttons (our choice, no source). */
export const zoomStep = 1.5;
/** A focused node closer than this to the canvas edge (CSS px) brings the view along (our choice, no source). */
const keepInView = 40;

export interface GraphFocus {
  /** The node with keyboard focus (0-based), or null. */
  readonly focused: number | null;
  /** True while the canvas has keyboard focus. */
  readonly active: boolean;
  /** What the live region says about the focused node ("" when none). */
  readonly announcement: string;
  /** The words for any node (the hover label uses them too). */
  readonly captionOf: (node: number) => string;
  readonly onFocus: (event: React.FocusEvent<HTMLCanvasElement>) => void;
  readonly onBlur: () => void;
  readonly onKeyDown: (event: KeyboardEvent<HTMLCanvasElement>) => void;
}

export interface FocusTarget {
  readonly layout: () => Layout | null;
  readonly view: ViewTransform;
  readonly size: () => { width: number; height: number };
  readonly redraw: () => void;
}

const isFocusVisible = (element: Element): boolean => {
  try {
    return element.matches(":focus-visible");
  } catch {
    return true; // a DOM without the selector: treat focus as the keyboard's
  }
};

/**
 * Keyboard focus on the graph, apart from the selection: the canvas takes focus, a node gets it
 * (the open node, else the one nearest the middle of the canvas), the arrow keys move it to the
 * neighbour in that direction (neighbourInDirection.ts), Enter opens it (shift+Enter adds it to the
 * selection or takes it out, as shift-click does), + and − zoom about it. A new result drops it.
 */
export function useGraphFocus(result: CoverResult | null, fill: NodeFill | null, target: FocusTarget): GraphFocus {
  const [focused, setFocused] = useState<number | null>(null);
  const [active, setActive] = useState(false);
  const on = useRef(target);
  on.current = target;
  const lists = useMemo(() => (result ? neighbourLists(result.landmarks.length, result.edges.source, result.edges.target) : null), [result]);
  useEffect(() => setFocused(null), [result]);
  const captionOf = (node: number): string => {
    if (!result || !lists) return "";
    const { offsets } = result.members;
    return nodeCaption({ node, rows: offsets[node + 1]! - offsets[node]!, colour: colourOfNode(fill, node), neighbours: neighboursOf(lists, node).length });
  };

  const startNode = (): number | null => {
    const layout = on.current.layout();
    const view = on.current.view.current();
    if (!layout || !view || layout.nodes.length === 0) return null;
    const open = workbenchStore.getState().selectedNode;
    if (open !== null && open < layout.nodes.length) return open;
    const { width, height } = on.current.size();
    let best = 0;
    let bestDistance = Infinity;
    for (const node of layout.nodes) {
      const p = toScreen(view, node);
      const distance = (p.x - width / 2) ** 2 + (p.y - height / 2) ** 2;
      if (distance < bestDistance) [best, bestDistance] = [node.index, distance];
    }
    return best;
  };
  const moveTo = (node: number): void => {
    setFocused(node);
    const layout = on.current.layout();
    const view = on.current.view.current();
    const position = layout?.nodes[node];
    if (!view || !position) return;
    // the view comes along when focus walks off the canvas
    const { width, height } = on.current.size();
    const p = toScreen(view, position);
    const dx = p.x < keepInView ? keepInView - p.x : p.x > width - keepInView ? width - keepInView - p.x : 0;
    const dy = p.y < keepInView ? keepInView - p.y : p.y > height - keepInView ? height - keepInView - p.y : 0;
    if (dx !== 0 || dy !== 0) on.current.view.set(panView(view, dx, dy));
  };
  const activate = (): void => {
    setActive(true);
    if (focused === null) {
      const start = startNode();
      if (start !== null) moveTo(start);
    }
    on.current.redraw();
  };
  return {
    focused,
    active,
    announcement: focused === null ? "" : captionOf(focused),
    captionOf,
    onFocus(event) {
      // a click focuses the canvas too; the ring and the announcement wait for the keyboard
      if (isFocusVisible(event.currentTarget)) activate();
    },
    onBlur() {
      setActive(false);
      on.current.redraw();
    },
    onKeyDown(event) {
      if (event.ctrlKey || event.metaKey || event.altKey) return;
      const angle = arrowAngles[event.key];
      const layout = on.current.layout();
      if (!active && (angle !== undefined || event.key === "Enter")) activate();
      if (angle !== undefined) {
        event.preventDefault();
        // positions in layout units: the view scales both axes alike and never rotates, so the angles are those on screen
        if (focused === null || !lists || !layout) return;
        const next = neighbourInDirection(focused, neighboursOf(lists, focused), layout.nodes, angle);
        if (next !== null) moveTo(next);
      } else if (event.key === "Enter" && focused !== null) {
        event.preventDefault();
        void actions().selectNode(focused, event.shiftKey);
      } else if (event.key === "+" || event.key === "=" || event.key === "-") {
        const view = on.current.view.current();
        if (!view) return;
        event.preventDefault();
        const { width, height } = on.current.size();
        const node = focused === null ? undefined : layout?.nodes[focused];
        const about = node ? toScreen(view, node) : { x: width / 2, y: height / 2 };
        on.current.view.set(zoomAround(view, event.key === "-" ? 1 / zoomStep : zoomStep, about));
        on.current.redraw();
      }
    },
  };
}
