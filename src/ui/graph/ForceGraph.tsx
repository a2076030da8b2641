import { useCallback, useEffect, useRef } from "react";
import { actions } from "../../state/actions.ts";
import { selectActiveShare, selectRegionOutlines, selectRowPlace } from "../../state/regionSelectors.ts";
import { selectNodeFill } from "../../state/selectors.ts";
import { useWorkbench } from "../useWorkbench.ts";
import { drawGraph, fitTransform, hitNode } from "./drawGraph.ts";
import type { View } from "./view.ts";
import { maxDrawnNodes } from "./drawLimits.ts";
import { installGraphProbe } from "./graphProbe.ts";
import { pointsInPolygon } from "./pointInPolygon.ts";
import { registerPictureSource } from "./pictureSource.ts";
import { fillColors } from "./scales.ts";
import { useForceLayout, type Layout } from "./useForceLayout.ts";
import { useLasso } from "./useLasso.ts";

const noNodes: readonly number[] = [];

/** The cover graph on a canvas: node area ∝ members, fill by the chosen column's node mean; region outlines, the lasso, the row looked for. */
export function ForceGraph() {
  const built = useWorkbench((s) => s.result);
  const tooLarge = built !== null && built.landmarks.length > maxDrawnNodes;
  const result = tooLarge ? null : built;
  const selected = useWorkbench((s) => s.selectedNode);
  const fill = useWorkbench(selectNodeFill);
  const region = useWorkbench((s) => s.selection);
  const outlines = useWorkbench(selectRegionOutlines);
  const shareValues = useWorkbench(selectActiveShare);
  const activeStyle = useWorkbench((s) => s.regions.findIndex((r) => r.id === s.activeRegionId));
  const place = useWorkbench(selectRowPlace);
  const found = place?.kind === "found" ? place.nodes : noNodes;
  const canvas = useRef<HTMLCanvasElement>(null);
  const view = useRef<View | null>(null);
  const marked = useRef<Layout | null>(null);
  // added to the fitted view by "find a row"; back to zero with every new layout (the next fit) and when the search ends
  const offset = useRef({ x: 0, y: 0 });
  const share = shareValues ? { values: shareValues, style: activeStyle } : null;
  const paint = useRef({ selected, fillOf: fillColors(fill), region, outlines, share, found });
  paint.current = { selected, fillOf: fillColors(fill), region, outlines, share, found };

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
    if (marked.current !== layout) offset.current = { x: 0, y: 0 };
    const fit = fitTransform(layout, width, height);
    view.current = { k: fit.k, x: fit.x + offset.current.x, y: fit.y + offset.current.y };
    element.dataset.offset = `${offset.current.x},${offset.current.y}`;
    drawGraph(context, layout, view.current, { width, height, ...paint.current, lasso: lasso.points.current });
    if (marked.current !== layout) performance.mark("shoal:graph-drawn"); // the first drawing of this result's layout
    marked.current = layout;
  }, []); // lasso.points is a ref, read at drawing time

  const busy = useWorkbench((s) => s.build.state === "running" || s.stability.state === "running" || s.loadStatus === "loading");
  const layout = useForceLayout(result, draw, busy);
  const lasso = useLasso(
    (x, y) => !(layout.current && view.current && hitNode(layout.current, view.current, x, y) !== null),
    () => layout.current && draw(layout.current),
    (polygon, additive) => {
      const v = view.current;
      if (!layout.current || !v) return;
      const centres = layout.current.nodes.map((n) => ({ index: n.index, x: v.k * n.x + v.x, y: v.k * n.y + v.y }));
      actions().selectNodes(pointsInPolygon(centres, polygon), additive ? "add" : "replace");
    },
  );
  useEffect(() => {
    if (layout.current) draw(layout.current);
  }, [selected, fill, region, outlines, shareValues, draw, layout]);
  // centre the view on the nodes holding the row looked for
  useEffect(() => {
    const current = layout.current;
    const element = canvas.current;
    if (!current || !element) return;
    if (found.length === 0) {
      // the search ended (or found nothing): back to the fitted view
      if (offset.current.x !== 0 || offset.current.y !== 0) {
        offset.current = { x: 0, y: 0 };
        draw(current);
      }
      return;
    }
    const fit = fitTransform(current, element.clientWidth, element.clientHeight);
    const nodes = found.map((k) => current.nodes[k]!).filter(Boolean);
    const cx = nodes.reduce((sum, n) => sum + n.x, 0) / nodes.length;
    const cy = nodes.reduce((sum, n) => sum + n.y, 0) / nodes.length;
    offset.current = { x: element.clientWidth / 2 - (fit.k * cx + fit.x), y: element.clientHeight / 2 - (fit.k * cy + fit.y) };
    draw(current);
  }, [found, draw, layout]);
  useEffect(() => {
    const element = canvas.current;
    if (!element || typeof ResizeObserver === "undefined") return;
    const observer = new ResizeObserver(() => layout.current && draw(layout.current));
    observer.observe(element);
    return () => observer.disconnect();
  }, [draw, layout]);
  useEffect(() => registerPictureSource({ layout: () => layout.current, canvas: () => canvas.current }), [layout]);
  useEffect(() => installGraphProbe(() => layout.current, () => view.current, () => offset.current), [layout]);

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
      aria-label={result ? `cover graph with ${result.landmarks.length} nodes and ${result.edges.source.length} edges; use the node list to open a node; shift-click adds a node to the selection; drag on empty space to lasso nodes` : "no graph built yet"}
      onPointerDown={lasso.onPointerDown}
      onPointerMove={lasso.onPointerMove}
      onPointerUp={lasso.onPointerUp}
      onClick={(event) => {
        if (lasso.justEnded()) return;
        const rect = event.currentTarget.getBoundingClientRect();
        const hit = layout.current && view.current ? hitNode(layout.current, view.current, event.clientX - rect.left, event.clientY - rect.top) : null;
        actions().selectNode(hit, event.shiftKey);
      }}
    />
  );
}
