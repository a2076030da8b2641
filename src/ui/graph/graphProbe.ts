import { workbenchStore } from "../../state/store.ts";
import type { Layout } from "./useForceLayout.ts";
import type { ViewTransform } from "./useViewTransform.ts";
import { toScreen } from "./viewTransform.ts";

/**
 * What the browser tests read of the drawn graph, on `window.shoalGraph`: each node's centre in
 * CSS pixels of the canvas (0-based node numbers), the view (screen = world · k + (x, y)), the
 * offset that "find a row" added to the view ({ x: 0, y: 0 } otherwise), the node with keyboard
 * focus, the graph's edges, how many times the canvas was drawn and how long that took, the selected nodes and the
 * regions' rows (0-based) as plain arrays. Read-only; it changes nothing.
 */
export interface GraphProbe {
  readonly nodes: () => { readonly node: number; readonly x: number; readonly y: number; readonly pinned: boolean }[];
  readonly view: () => { readonly k: number; readonly x: number; readonly y: number } | null;
  readonly fitted: () => boolean;
  readonly offset: () => { readonly x: number; readonly y: number };
  readonly focused: () => number | null;
  readonly edges: () => [number, number][];
  readonly drawings: () => number;
  /** Milliseconds spent drawing, over all drawings so far. */
  readonly drawingMs: () => number;
  readonly selection: () => number[];
  readonly regions: () => { readonly name: string; readonly rows: number[] }[];
}

/** Read from the graph component for the probe. */
export interface ProbeSources {
  readonly focused: () => number | null;
  readonly drawings: () => number;
  readonly drawingMs: () => number;
}

/**
 * Puts the probe on `window` when the page was opened with `?probe` in its URL (the browser tests
 * do; a user's page never carries it, so the regions' rows stay off `window`); returns the
 * function that takes it away.
 */
export function installGraphProbe(layout: () => Layout | null, view: ViewTransform, sources: ProbeSources): () => void {
  if (!new URLSearchParams(window.location.search).has("probe")) return () => {};
  const probe: GraphProbe = {
    nodes: () => {
      const current = layout();
      const v = view.current();
      return current && v ? current.nodes.map((n) => ({ node: n.index, ...toScreen(v, n), pinned: n.fx != null })) : [];
    },
    view: () => {
      const v = view.current();
      return v ? { ...v } : null;
    },
    fitted: () => view.isFitted(),
    offset: () => ({ ...view.offset() }),
    focused: sources.focused,
    edges: () => {
      const result = workbenchStore.getState().result;
      return result ? Array.from(result.edges.source, (a, e) => [a, result.edges.target[e]!] as [number, number]) : [];
    },
    drawings: sources.drawings,
    drawingMs: sources.drawingMs,
    selection: () => [...workbenchStore.getState().selection],
    regions: () => workbenchStore.getState().regions.map((r) => ({ name: r.name, rows: Array.from(r.rows) })),
  };
  const host = window as unknown as { shoalGraph?: GraphProbe };
  host.shoalGraph = probe;
  return () => {
    if (host.shoalGraph === probe) delete host.shoalGraph;
  };
}
