import { useCallback, useEffect, useRef } from "react";
import { actions } from "../../state/actions.ts";
import { selectNodeFill } from "../../state/selectors.ts";
import { useWorkbench } from "../useWorkbench.ts";
import { drawGraph, fitTransform, hitNode, type View } from "./drawGraph.ts";
import { maxDrawnNodes } from "./drawLimits.ts";
import { fillColors } from "./scales.ts";
import { useForceLayout, type Layout } from "./useForceLayout.ts";

/** The cover graph on a canvas: node area ∝ members, fill by the chosen column's node mean. */
export function ForceGraph() {
  const built = useWorkbench((s) => s.result);
  const tooLarge = built !== null && built.landmarks.length > maxDrawnNodes;
  const result = tooLarge ? null : built;
  const selected = useWorkbench((s) => s.selectedNode);
  const fill = useWorkbench(selectNodeFill);
  const region = useWorkbench((s) => s.selection);
  const canvas = useRef<HTMLCanvasElement>(null);
  const view = useRef<View | null>(null);
  const marked = useRef<Layout | null>(null);
  const paint = useRef({ selected, fillOf: fillColors(fill), region });
  paint.current = { selected, fillOf: fillColors(fill), region };

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
    const { fillOf, selected: chosen, region: selection } = paint.current;
    drawGraph(context, layout, view.current, { width, height, fillOf, selected: chosen, region: selection });
    if (marked.current !== layout) performance.mark("shoal:graph-drawn"); // the first drawing of this result's layout
    marked.current = layout;
  }, []);

  const busy = useWorkbench((s) => s.build.state === "running" || s.stability.state === "running" || s.loadStatus === "loading");
  const layout = useForceLayout(result, draw, busy);
  useEffect(() => {
    if (layout.current) draw(layout.current);
  }, [selected, fill, region, draw, layout]);
  useEffect(() => {
    const element = canvas.current;
    if (!element || typeof ResizeObserver === "undefined") return;
    const observer = new ResizeObserver(() => layout.current && draw(layout.current));
    observer.observe(element);
    return () => observer.disconnect();
  }, [draw, layout]);

  if (tooLarge) {
    return (
      <p className="too-large" role="status" data-testid="graph-too-large">
        This graph has {built.landmarks.length.toLocaleString("en-US")} nodes, more than the {maxDrawnNodes.toLocaleString("en-US")} that can be laid out
        here without freezing the page. Raise the radius to draw it; its counts, statistics and exports are complete.
      </p>
    );
  }
  return (
    <canvas
      ref={canvas}
      className="force-graph"
      data-testid="graph-canvas"
      role="img"
      aria-label={result ? `cover graph with ${result.landmarks.length} nodes and ${result.edges.source.length} edges; use the node list to open a node; shift-click adds a node to the region` : "no graph built yet"}
      onClick={(event) => {
        const rect = event.currentTarget.getBoundingClientRect();
        const hit = layout.current && view.current ? hitNode(layout.current, view.current, event.clientX - rect.left, event.clientY - rect.top) : null;
        actions().selectNode(hit, event.shiftKey);
      }}
    />
  );
}
