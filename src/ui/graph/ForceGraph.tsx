import { useCallback, useEffect, useRef } from "react";
import { actions } from "../../state/actions.ts";
import { selectNodeColorValues } from "../../state/selectors.ts";
import { useWorkbench } from "../useWorkbench.ts";
import { drawGraph, fitTransform, hitNode, type View } from "./drawGraph.ts";
import { nodeColorScale } from "./scales.ts";
import { useForceLayout, type Layout } from "./useForceLayout.ts";

/** The cover graph on a canvas: node area ∝ members, fill by the chosen column's node mean. */
export function ForceGraph() {
  const result = useWorkbench((s) => s.result);
  const selected = useWorkbench((s) => s.selectedNode);
  const values = useWorkbench(selectNodeColorValues);
  const canvas = useRef<HTMLCanvasElement>(null);
  const view = useRef<View | null>(null);
  const paint = useRef({ selected, values });
  paint.current = { selected, values };

  const draw = useCallback((layout: Layout) => {
    const element = canvas.current;
    const context = element?.getContext("2d");
    if (!element || !context) return;
    const ratio = window.devicePixelRatio || 1;
    const width = element.clientWidth;
    const height = element.clientHeight;
    if (element.width !== Math.round(width * ratio) || element.height !== Math.round(height * ratio)) {
      element.width = Math.round(width * ratio);
      element.height = Math.round(height * ratio);
    }
    context.setTransform(ratio, 0, 0, ratio, 0, 0);
    view.current = fitTransform(layout, width, height);
    const { values: colourValues, selected: chosen } = paint.current;
    drawGraph(context, layout, view.current, { width, height, values: colourValues, scale: colourValues ? nodeColorScale(colourValues) : null, selected: chosen });
  }, []);

  const layout = useForceLayout(result, draw);
  useEffect(() => {
    if (layout.current) draw(layout.current);
  }, [selected, values, draw, layout]);
  useEffect(() => {
    const element = canvas.current;
    if (!element || typeof ResizeObserver === "undefined") return;
    const observer = new ResizeObserver(() => layout.current && draw(layout.current));
    observer.observe(element);
    return () => observer.disconnect();
  }, [draw, layout]);

  return (
    <canvas
      ref={canvas}
      className="force-graph"
      data-testid="graph-canvas"
      role="img"
      aria-label={result ? `cover graph with ${result.landmarks.length} nodes and ${result.edges.source.length} edges; use the node list to open a node` : "no graph built yet"}
      onClick={(event) => {
        const rect = event.currentTarget.getBoundingClientRect();
        const hit = layout.current && view.current ? hitNode(layout.current, view.current, event.clientX - rect.left, event.clientY - rect.top) : null;
        actions().selectNode(hit);
      }}
    />
  );
}
