import { useCallback, useEffect, useMemo, useRef, useState } from "react";
import { actions } from "../../state/actions.ts";
import { selectActiveShare, selectRegionOutlines, selectRowPlace } from "../../state/regionSelectors.ts";
import { selectNodeFill } from "../../state/selectors.ts";
import { useWorkbench } from "../useWorkbench.ts";
import { drawGraph, hitNode } from "./drawGraph.ts";
import { maxDrawnNodes } from "./drawLimits.ts";
import { GraphTooLarge } from "./GraphTooLarge.tsx";
import { GraphToolbar } from "./GraphToolbar.tsx";
import { installGraphProbe } from "./graphProbe.ts";
import { pointsInPolygon } from "./pointInPolygon.ts";
import { registerPictureSource } from "./pictureSource.ts";
import { fillColors } from "./scales.ts";
import { useForceLayout } from "./useForceLayout.ts";
import { useFrameScheduler } from "./useFrameScheduler.ts";
import { useGraphFocus, zoomStep } from "./useGraphFocus.ts";
import { useRowCentring } from "./useRowCentring.ts";
import { usePointerGestures } from "./usePointerGestures.ts";
import { useViewTransform } from "./useViewTransform.ts";
import { toScreen, zoomAround } from "./viewTransform.ts";

const noNodes: readonly number[] = [];

/** The cover graph on a canvas: node area ∝ members, fill by the chosen column's node mean; region outlines, the lasso, the row looked for; zoom, pan, pins and keyboard focus. */
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
  const busy = useWorkbench((s) => s.build.state === "running" || s.stability.state === "running" || s.loadStatus === "loading");
  const [seed, setSeed] = useState(1);
  const [lassoMode, setLassoMode] = useState(false);
  const [edgeWidthByShared, setEdgeWidthByShared] = useState(false);
  const canvas = useRef<HTMLCanvasElement>(null);
  const view = useViewTransform();
  const hovered = useRef<number | null>(null);
  // the layout last drawn, how many drawings so far and the milliseconds they took (read by the probe)
  const drawn = useRef({ layout: null as unknown, count: 0, ms: 0 });
  // colours worked out once per colouring, not per frame
  const fillOf = useMemo(() => {
    const colourOf = fillColors(fill);
    const colours = Array.from({ length: result?.landmarks.length ?? 0 }, (_, k) => colourOf(k));
    return (k: number): string => colours[k] ?? colourOf(k);
  }, [fill, result]);
  const size = (): { width: number; height: number } => ({ width: canvas.current?.clientWidth ?? 0, height: canvas.current?.clientHeight ?? 0 });

  const draw = useCallback(() => {
    const element = canvas.current;
    const current = layout.current;
    const context = element?.getContext("2d");
    if (!element || !context || !current) return;
    const began = performance.now();
    const ratio = window.devicePixelRatio || 1;
    const { width, height } = size();
    if (element.width !== Math.round(width * ratio) || element.height !== Math.round(height * ratio)) {
      element.width = Math.round(width * ratio);
      element.height = Math.round(height * ratio);
    }
    context.setTransform(ratio, 0, 0, ratio, 0, 0);
    const v = view.resolve(current, width, height);
    const offset = view.offset();
    element.dataset.offset = `${offset.x},${offset.y}`;
    const { focus: f, ...colours } = paint.current;
    const labelled = hovered.current ?? (f.active ? f.focused : null);
    const label = labelled === null || !current.nodes[labelled] ? null : { node: labelled, text: f.captionOf(labelled) };
    drawGraph(context, current, v, { width, height, ...colours, lasso: gestures.lasso(), focused: f.active ? f.focused : null, label });
    if (drawn.current.layout !== current) performance.mark("shoal:graph-drawn"); // the first drawing of this layout
    drawn.current.layout = current;
    drawn.current.count += 1;
    drawn.current.ms += performance.now() - began;
  }, []); // everything it reads is a ref or a stable function
  const redraw = useFrameScheduler(draw);
  const { layout, controls, pinned } = useForceLayout(result, redraw, busy, seed);
  const focus = useGraphFocus(result, fill, { layout: () => layout.current, view, size, redraw });
  const share = shareValues ? { values: shareValues, style: activeStyle } : null;
  const paint = useRef({ selected, fillOf, region, outlines, share, found, edgeWidthByShared, focus });
  paint.current = { selected, fillOf, region, outlines, share, found, edgeWidthByShared, focus };
  const gestures = usePointerGestures(canvas, !tooLarge, {
    view: () => view.current(),
    setView: view.set,
    nodeAt: (x, y) => (layout.current && view.current() ? hitNode(layout.current, view.current()!, x, y) : null),
    lassoMode: () => lassoMode,
    pin: (node, world) => controls.pin(node, world.x, world.y),
    release: controls.release,
    finishLasso(polygon, additive) {
      const v = view.current();
      if (!layout.current || !v) return;
      const centres = layout.current.nodes.map((n) => ({ index: n.index, ...toScreen(v, n) }));
      actions().selectNodes(pointsInPolygon(centres, polygon), additive ? "add" : "replace");
    },
    hover(node) {
      if (hovered.current === node) return;
      hovered.current = node;
      if (canvas.current) canvas.current.style.cursor = node === null ? "" : "pointer";
      redraw();
    },
    redraw,
  });
  useEffect(redraw, [selected, fillOf, region, outlines, shareValues, edgeWidthByShared, focus.focused, focus.active, redraw]);
  useRowCentring(found, layout, view, size, redraw);
  useEffect(() => {
    const element = canvas.current;
    if (!element || typeof ResizeObserver === "undefined") return;
    const observer = new ResizeObserver(redraw);
    observer.observe(element);
    return () => observer.disconnect();
  }, [redraw, result]);
  useEffect(() => registerPictureSource({ layout: () => layout.current, canvas: () => canvas.current }), [layout]);
  useEffect(
    () => installGraphProbe(() => layout.current, view, { focused: () => paint.current.focus.focused, drawings: () => drawn.current.count, drawingMs: () => drawn.current.ms }),
    [layout, view],
  );

  if (tooLarge) return <GraphTooLarge nodes={built.landmarks.length} />;
  const zoomBy = (factor: number): void => {
    const v = view.current();
    if (!v) return;
    const { width, height } = size();
    view.set(zoomAround(v, factor, { x: width / 2, y: height / 2 }));
    redraw();
  };
  return (
    <div className="graph-area">
      {result && (
        <GraphToolbar
          onFit={() => (view.fit(), redraw())} onZoom={zoomBy} zoomStep={zoomStep}
          lassoMode={lassoMode} onLassoMode={setLassoMode}
          layoutSeed={seed} onNewLayout={() => setSeed((s) => s + 1)}
          pinned={pinned} onUnpinAll={() => (controls.unpinAll(), redraw())}
          edgeWidthByShared={edgeWidthByShared} onEdgeWidthByShared={setEdgeWidthByShared}
        />
      )}
      <canvas
        ref={canvas}
        className={lassoMode ? "force-graph lasso-mode" : "force-graph"}
        data-testid="graph-canvas"
        tabIndex={result ? 0 : -1}
        role="application"
        aria-roledescription="cover graph"
        aria-label={result ? `cover graph with ${result.landmarks.length} nodes and ${result.edges.source.length} edges; arrow keys move between neighbouring nodes, Enter opens the node, + and − zoom, F fits; drag a node to pin it, drag empty space to move the view, shift-drag to lasso` : "no graph built yet"}
        onFocus={focus.onFocus}
        onBlur={focus.onBlur}
        onKeyDown={focus.onKeyDown}
        onPointerDown={gestures.onPointerDown}
        onPointerMove={gestures.onPointerMove}
        onPointerUp={gestures.onPointerUp}
        onPointerCancel={gestures.onPointerCancel}
        onPointerLeave={gestures.onPointerLeave}
        onClick={(event) => {
          if (gestures.justDragged()) return;
          const rect = event.currentTarget.getBoundingClientRect();
          const v = view.current();
          const hit = layout.current && v ? hitNode(layout.current, v, event.clientX - rect.left, event.clientY - rect.top) : null;
          actions().selectNode(hit, event.shiftKey);
        }}
      />
      <p className="visually-hidden" aria-live="polite" data-testid="graph-focus-announcement">
        {focus.announcement}
      </p>
    </div>
  );
}
