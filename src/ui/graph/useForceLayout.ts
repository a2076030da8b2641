import { forceCollide, forceLink, forceManyBody, forceSimulation, forceX, forceY, type Simulation, type SimulationNodeDatum } from "d3-force";
import { useEffect, useMemo, useRef, useState } from "react";
import type { CoverResult } from "../../core/index.ts";
import { randomSource } from "../../core/random.ts";
import { keepLayoutPositions, seedLayoutPositions } from "../../state/session/layoutPositions.ts";
import { maxDrawnEdges } from "./drawLimits.ts";
import { nodeRadius } from "./scales.ts";
import { spiralPlacement } from "./spiralPlacement.ts";

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

/** What a person can do to the running layout. */
export interface LayoutControls {
  /** Holds node k at the world point (x, y) until unpinned (a drag), and lets the others follow. */
  readonly pin: (k: number, x: number, y: number) => void;
  /** The drag let go: the node stays pinned and the layout cools down again. */
  readonly release: () => void;
  readonly unpinAll: () => void;
}

export interface ForceLayout {
  readonly layout: React.RefObject<Layout | null>;
  readonly controls: LayoutControls;
  /** How many nodes are pinned. */
  readonly pinned: number;
}

/** Bodies and springs for a result: one body per node (area ∝ members), the strongest edges as springs; bodies start on the seed's spiral. */
function layoutOf(result: CoverResult, seed: number): Layout {
  const { offsets } = result.members;
  let maxSize = 1;
  for (let k = 0; k < result.landmarks.length; ++k) maxSize = Math.max(maxSize, offsets[k + 1]! - offsets[k]!);
  const start = spiralPlacement(result.landmarks.length, seed);
  const nodes: LayoutNode[] = Array.from(result.landmarks, (_, k) => ({ index: k, radius: nodeRadius(offsets[k + 1]! - offsets[k]!, maxSize), x: start[2 * k]!, y: start[2 * k + 1]! }));
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
 * Bodies start on the phyllotaxis spiral in the order layout `seed` deals (spiralPlacement.ts), and
 * the simulation's own jitter draws from the same seed, so a result and a seed always lay out alike.
 * A new seed lays the same result out again and keeps pinned nodes where they are; a new result
 * starts afresh. Colours are not an input: changing them never restarts or moves anything.
 * The simulation starts in a task after the render that brought the result; `onTick` is called
 * after every step; the simulation stops on a new result or unmount, and waits while `paused`.
 */
export function useForceLayout(result: CoverResult | null, onTick: (layout: Layout) => void, paused = false, seed = 1): ForceLayout {
  const layout = useRef<Layout | null>(null);
  const laidOut = useRef<CoverResult | null>(null);
  const tick = useRef(onTick);
  tick.current = onTick;
  const simulationRef = useRef<Simulation<LayoutNode, undefined> | null>(null);
  const pausedRef = useRef(paused);
  pausedRef.current = paused;
  const [pinned, setPinned] = useState(0);
  useEffect(() => {
    // pins of the same result carry over to the new seed's layout
    const previous = laidOut.current === result ? layout.current : null;
    layout.current = null;
    if (!result) return;
    let simulation: Simulation<LayoutNode, undefined> | null = null;
    // set up in a task of its own: the answer's task already carries React's render of the result
    const start = setTimeout(() => {
      const current = layoutOf(result, seed);
      let count = 0;
      for (const old of previous?.nodes ?? []) {
        const node = current.nodes[old.index];
        if (!node || old.fx == null || old.fy == null) continue;
        node.x = node.fx = old.fx;
        node.y = node.fy = old.fy;
        ++count;
      }
      setPinned(count);
      const seeded = seedLayoutPositions(result, current.nodes); // a restored session's positions, for this very build
      layout.current = current;
      laidOut.current = result;
      simulation = forceSimulation<LayoutNode>()
        .randomSource(randomSource(seed))
        .nodes(current.nodes as LayoutNode[])
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
      tick.current(current);
    }, 0);
    return () => {
      clearTimeout(start);
      simulation?.stop();
      simulationRef.current = null;
    };
  }, [result, seed]);
  // while the worker builds, the old layout stands still: on two cores its ticks would slow the build
  useEffect(() => {
    const simulation = simulationRef.current;
    if (!simulation) return;
    if (paused) simulation.stop();
    else if (simulation.alpha() > simulation.alphaMin()) simulation.restart();
  }, [paused]);
  const controls = useMemo<LayoutControls>(() => {
    const reheat = (target: number): void => {
      const simulation = simulationRef.current;
      if (!simulation) return;
      simulation.alphaTarget(target);
      if (!pausedRef.current) simulation.alpha(Math.max(simulation.alpha(), target)).restart();
    };
    return {
      pin(k, x, y) {
        const node = layout.current?.nodes[k];
        if (!node) return;
        if (node.fx == null) setPinned((count) => count + 1);
        node.x = node.fx = x;
        node.y = node.fy = y;
        reheat(0.3); // d3-force's documented drag pattern: keep the others moving while the node is held
        if (layout.current) tick.current(layout.current);
      },
      release: () => reheat(0),
      unpinAll() {
        for (const node of layout.current?.nodes ?? []) node.fx = node.fy = null;
        setPinned(0);
        const simulation = simulationRef.current;
        if (simulation && !pausedRef.current) simulation.alpha(Math.max(simulation.alpha(), 0.3)).restart();
      },
    };
  }, []);
  return { layout, controls, pinned };
}
