import { forceCollide, forceLink, forceManyBody, forceSimulation, forceX, forceY, type Simulation, type SimulationNodeDatum } from "d3-force";
import { useEffect, useRef } from "react";
import type { CoverResult } from "../../core/index.ts";
import { keepLayoutPositions, seedLayoutPositions } from "../../state/session/layoutPositions.ts";
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

/** Bodies and springs for a result: one body per node (area ∝ members), the strongest edges as springs. */
function layoutOf(result: CoverResult): Layout {
  const { offsets } = result.members;
  let maxSize = 1;
  for (let k = 0; k < result.landmarks.length; ++k) maxSize = Math.max(maxSize, offsets[k + 1]! - offsets[k]!);
  const nodes: LayoutNode[] = Array.from(result.landmarks, (_, k) => ({ index: k, radius: nodeRadius(offsets[k + 1]! - offsets[k]!, maxSize), x: NaN, y: NaN }));
  const { source, target, shared } = result.edges;
  // the strongest edges only (ties to file order), so a dense graph still lays out and draws in a frame
  let chosen = Array.from(source, (_, e) => e);
  if (chosen.length > maxDrawnEdges) chosen = chosen.sort((a, b) => shared[b]! - shared[a]! || a - b).slice(0, maxDrawnEdges);
  const links = chosen.map((e) => ({ source: nodes[source[e]!]!, target: nodes[target[e]!]!, shared: shared[e]! }));
  return { nodes, links };
}

/**
 * Owns the d3-force simulation for a result: one body per node (area ∝ members), a spring per
 * edge (the 4,000 sharing the most rows when there are more), charge, collision, and a weak pull to the centre so separate components stay in view.
 * d3-force places the bodies on its phyllotaxis spiral (x, y NaN), so the same result lays out the
 * same way and the first frames are not one knot of crossing edges.
 * The simulation starts in a task after the render that brought the result; `onTick` is called
 * after every step; the simulation stops on a new result or unmount, and waits while `paused`.
 */
export function useForceLayout(result: CoverResult | null, onTick: (layout: Layout) => void, paused = false): React.RefObject<Layout | null> {
  const layout = useRef<Layout | null>(null);
  const tick = useRef(onTick);
  tick.current = onTick;
  const simulationRef = useRef<Simulation<LayoutNode, undefined> | null>(null);
  const pausedRef = useRef(paused);
  pausedRef.current = paused;
  useEffect(() => {
    layout.current = null;
    if (!result) return;
    let simulation: Simulation<LayoutNode, undefined> | null = null;
    // set up in a task of its own: the answer's task already carries React's render of the result
    const start = setTimeout(() => {
      const current = layoutOf(result);
      const seeded = seedLayoutPositions(result, current.nodes); // a restored session's positions, for this very build
      layout.current = current;
      simulation = forceSimulation<LayoutNode>(current.nodes as LayoutNode[])
        .force("link", forceLink<LayoutNode, Layout["links"][number]>(current.links as Layout["links"][number][]).distance((l) => l.source.radius + l.target.radius + 14).strength(0.7))
        .force("charge", forceManyBody<LayoutNode>().strength(-60))
        .force("collide", forceCollide<LayoutNode>((n) => n.radius + 2))
        .force("x", forceX<LayoutNode>(0).strength(0.05))
        .force("y", forceY<LayoutNode>(0).strength(0.05))
        .on("tick", () => tick.current(current))
        .on("end", () => keepLayoutPositions(result, current.nodes));
      simulationRef.current = simulation;
      if (seeded) simulation.alpha(simulation.alphaMin()); // already at rest: one step, no new layout
      if (pausedRef.current) simulation.stop();
    }, 0);
    return () => {
      clearTimeout(start);
      simulation?.stop();
      simulationRef.current = null;
    };
  }, [result]);
  // while the worker builds, the old layout stands still: on two cores its ticks would slow the build
  useEffect(() => {
    const simulation = simulationRef.current;
    if (!simulation) return;
    if (paused) simulation.stop();
    else if (simulation.alpha() > simulation.alphaMin()) simulation.restart();
  }, [paused]);
  return layout;
}
