import type { NodeFill } from "../../state/nodeFill.ts";
import { formatNumber, plural } from "../format.ts";

export interface NodeCaptionParts {
  /** 0-based node; shown as node + 1. */
  readonly node: number;
  readonly rows: number;
  /** What colours the node and its value as text ("node mean of pressure", "0.41"), or null when nothing does. */
  readonly colour: { readonly caption: string; readonly value: string } | null;
  readonly neighbours: number;
}

/** The words for a node, as the live region announces it and the label shows it: "node 12, 34 rows, node mean of pressure 0.41, 3 neighbours". */
export function nodeCaption({ node, rows, colour, neighbours }: NodeCaptionParts): string {
  const parts = [`node ${node + 1}`, plural(rows, "row")];
  if (colour) parts.push(`${colour.caption} ${colour.value}`);
  parts.push(plural(neighbours, "neighbour"));
  return parts.join(", ");
}

/** The fill's caption and node k's value in it (4 significant digits, or the level's name), for `nodeCaption`. */
export function colourOfNode(fill: NodeFill | null, k: number): NodeCaptionParts["colour"] {
  if (!fill) return null;
  if (fill.kind === "sequential") return { caption: fill.caption, value: formatNumber(fill.values[k] ?? NaN) };
  const level = fill.level[k] ?? -1;
  return { caption: fill.caption, value: level < 0 ? "missing" : (fill.levels[level] ?? "missing") };
}
