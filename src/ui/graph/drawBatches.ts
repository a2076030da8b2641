import { edgeWidth, edgeWidths } from "./edgeWidth.ts";
import type { Layout } from "./useForceLayout.ts";

type Link = Layout["links"][number];

// drawing order worked out once per layout (edges by width) and once per colouring (nodes by colour),
// not per frame: at 5,000 nodes the frame budget has no room for regrouping
const edgeBatchCache = new WeakMap<Layout, { readonly byShared: boolean; readonly batches: readonly { readonly width: number; readonly links: readonly Link[] }[] }>();
const fillBatchCache = new WeakMap<(node: number) => string, { readonly layout: Layout; readonly batches: readonly { readonly colour: string; readonly nodes: readonly number[] }[] }>();

/** The layout's edges grouped by stroke width (one width for all, or by shared rows); cached per layout. */
export function edgeBatches(layout: Layout, byShared: boolean): readonly { readonly width: number; readonly links: readonly Link[] }[] {
  const cached = edgeBatchCache.get(layout);
  if (cached && cached.byShared === byShared) return cached.batches;
  let mostShared = 0;
  for (const link of layout.links) mostShared = Math.max(mostShared, link.shared);
  const groups = new Map<number, Link[]>();
  for (const link of layout.links) {
    const width = byShared ? edgeWidth(link.shared, mostShared) : edgeWidths.plain;
    let group = groups.get(width);
    if (!group) groups.set(width, (group = []));
    group.push(link);
  }
  const batches = [...groups].map(([width, links]) => ({ width, links }));
  edgeBatchCache.set(layout, { byShared, batches });
  return batches;
}

/** The layout's nodes grouped by fill colour; cached per colouring function, so pass the same function while the colours stay. */
export function fillBatches(layout: Layout, fillOf: (node: number) => string): readonly { readonly colour: string; readonly nodes: readonly number[] }[] {
  const cached = fillBatchCache.get(fillOf);
  if (cached && cached.layout === layout) return cached.batches;
  const groups = new Map<string, number[]>();
  for (const node of layout.nodes) {
    const colour = fillOf(node.index);
    let group = groups.get(colour);
    if (!group) groups.set(colour, (group = []));
    group.push(node.index);
  }
  const batches = [...groups].map(([colour, nodes]) => ({ colour, nodes }));
  fillBatchCache.set(fillOf, { layout, batches });
  return batches;
}
