import { forceCollide, forceLink, forceManyBody, forceSimulation, forceX, forceY, type SimulationNodeDatum } from "d3-force";
import { useEffect, useRef } from "react";
import type { CoverResult } from "../../core/index.ts";
import { maxDrawnEdges } from "./drawLimits.ts";
import { nodeRadius } from "./scales.ts";

export interface LayoutNode extends SimulationNodeDatum {
  readonly index: number;
  readonly radius: number;
  x: number;
  y: number;
}

export interface Layout {
  readonly nodes: readonly LayoutNode[];
  readonly links: readonly { readonly source: LayoutNode; readonly target: LayoutNode; readonly shared: number }[];
}

/**
 * Owns the d3-force simulation for a result: one body per node (area ∝ members), a spring per
 * edge (the 4,000 sharing the most rows when there are more), charge, collision, and a weak pull to the centre so separate components stay in view.
 * d3-force seeds its own initial placement, so the same result lays out the same way.
 * Calls `onTick` after every step; the simulation stops on a new result or unmount.
 */
export function useForceLayout(result: CoverResult | null, onTick: (layout: Layout) => void): React.RefObject<Layout | null> {
  const layout = useRef<Layout | null>(null);
  const tick = useRef(onTick);
  tick.current = onTick;
  useEffect(() => {
    if (!result) {
      layout.current = null;
      return;
    }
    const { offsets } = result.members;
    let maxSize = 1;
    for (let k = 0; k < result.landmarks.length; ++k) maxSize = Math.max(maxSize, offsets[k + 1]! - offsets[k]!);
    const nodes: LayoutNode[] = Array.from(result.landmarks, (_, k) => ({ index: k, radius: nodeRadius(offsets[k + 1]! - offsets[k]!, maxSize), x: 0, y: 0 }));
    const { source, target, shared } = result.edges;
    // the strongest edges only (ties to file order), so a dense graph still lays out and draws in a frame
    let chosen = Array.from(source, (_, e) => e);
    if (chosen.length > maxDrawnEdges) chosen = chosen.sort((a, b) => shared[b]! - shared[a]! || a - b).slice(0, maxDrawnEdges);
    const links = chosen.map((e) => ({ source: nodes[source[e]!]!, target: nodes[target[e]!]!, shared: shared[e]! }));
    const current: Layout = { nodes, links };
    layout.current = current;
    const simulation = forceSimulation<LayoutNode>(nodes)
      .force("link", forceLink<LayoutNode, (typeof links)[number]>(links).distance((l) => l.source.radius + l.target.radius + 14).strength(0.7))
      .force("charge", forceManyBody<LayoutNode>().strength(-60))
      .force("collide", forceCollide<LayoutNode>((n) => n.radius + 2))
      .force("x", forceX<LayoutNode>(0).strength(0.05))
      .force("y", forceY<LayoutNode>(0).strength(0.05))
      .on("tick", () => tick.current(current));
    return () => {
      simulation.stop();
    };
  }, [result]);
  return layout;
}
