import { workbenchStore } from "../../state/store.ts";
import type { View } from "./view.ts";
import type { Layout } from "./useForceLayout.ts";

/**
 * What the browser tests read of the drawn graph, on `window.shoalGraph`: each node's centre in
 * CSS pixels of the canvas (0-based node numbers), and the offset that "find a row" added to the
 * fitted view ({ x: 0, y: 0 } after a fit), the selected nodes and the regions' rows (0-based)
 * as plain arrays. Read-only; it changes nothing.
 */
export interface GraphProbe {
  readonly nodes: () => { readonly node: number; readonly x: number; readonly y: number }[];
  readonly offset: () => { readonly x: number; readonly y: number };
  readonly selection: () => number[];
  readonly regions: () => { readonly name: string; readonly rows: number[] }[];
}

/**
 * Puts the probe on `window` when the page was opened with `?probe` in its URL (the browser tests
 * do; a user's page never carries it, so the regions' rows stay off `window`); returns the
 * function that takes it away.
 */
export function installGraphProbe(layout: () => Layout | null, view: () => View | null, offset: () => { x: number; y: number }): () => void {
  if (!new URLSearchParams(window.location.search).has("probe")) return () => {};
  const probe: GraphProbe = {
    nodes: () => {
      const current = layout();
      const v = view();
      return current && v ? current.nodes.map((n) => ({ node: n.index, x: v.k * n.x + v.x, y: v.k * n.y + v.y })) : [];
    },
    offset: () => ({ ...offset() }),
    selection: () => [...workbenchStore.getState().selection],
    regions: () => workbenchStore.getState().regions.map((r) => ({ name: r.name, rows: Array.from(r.rows) })),
  };
  const host = window as unknown as { shoalGraph?: GraphProbe };
  host.shoalGraph = probe;
  return () => {
    if (host.shoalGraph === probe) delete host.shoalGraph;
  };
}
