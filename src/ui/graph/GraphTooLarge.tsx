import { maxDrawnNodes } from "./drawLimits.ts";

/** In place of the canvas when a graph has more nodes than can be laid out. */
export function GraphTooLarge({ nodes }: { nodes: number }) {
  return (
    <p className="too-large" role="status" data-testid="graph-too-large">
      This graph has {nodes.toLocaleString("en-US")} nodes, more than the {maxDrawnNodes.toLocaleString("en-US")} that can be laid out
      here without freezing the page. Raise the radius to draw it; its counts, statistics and exports are complete.
    </p>
  );
}
