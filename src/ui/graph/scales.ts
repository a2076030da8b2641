import type { NodeFill } from "../../state/nodeFill.ts";
import { levelColor, missingColor, plainColor } from "../../core/picture/colourSchemes.ts";
import { nodeColorScale } from "../../core/picture/nodeColorScale.ts";

// The schemes live in core (core/picture/colourSchemes.ts), shared with the saved picture and `shoal draw`
export { categoricalSchemeName, colorSchemeName, levelColor, missingColor, nodeRim, okabeIto, otherColor, plainColor } from "../../core/picture/colourSchemes.ts";
export { nodeColorScale } from "../../core/picture/nodeColorScale.ts";
export { nodeRadius } from "../../core/picture/nodeRadius.ts";

/** The fill colour of each node for a fill choice. */
export function fillColors(fill: NodeFill | null): (node: number) => string {
  if (!fill) return () => plainColor;
  if (fill.kind === "categorical") return (node) => levelColor(fill.level[node] ?? -1);
  const scale = nodeColorScale(fill.values);
  return (node) => {
    const value = fill.values[node];
    return value === undefined || Number.isNaN(value) || !scale ? missingColor : scale(value);
  };
}
