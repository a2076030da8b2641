import type { CoverResult } from "../cover/buildCover.ts";
import { nodeMeans } from "../cover/nodeMeans.ts";
import { majorityNodes } from "../regions/majorityNodes.ts";
import type { ParsedTable } from "../table/types.ts";
import { escapeXml } from "./escapeXml.ts";
import type { Region } from "./regionRowsCsv.ts";

export interface GraphmlContext {
  /** Outcome columns whose node means follow the features', as in nodes.csv. */
  readonly outcomes: readonly string[];
  /** Named regions (0-based parsed-table rows): one boolean attribute `region_<name>` each. */
  readonly regions?: readonly Region[];
}

/**
 * graph.graphml: the cover graph in GraphML 1.0 (an open standard; graphml.graphdrawing.org), undirected.
 * Node ids are the node numbers that nodes.csv shows (from 1); node attributes carry nodes.csv's
 * column names: `landmark_row` and `size` (int), `mean_<column>` (double; a mean that is NaN, a
 * node with no present value, has no data element), then `region_<name>` (boolean: true when most
 * of the node's rows lie in the region, `majorityNodes`). Edges carry `shared` (int), as edges.csv.
 * Key ids are generated (`k0`, `k1`, …) so that they are valid XML names whatever the column or
 * region is called; `attr.name` keeps the name exactly (escaped by `escapeXml`). Numbers are in
 * JavaScript's shortest round-trip form; ±Infinity as XML Schema's INF and -INF.
 * O(memberships · columns + nodes · (columns + regions) + edges).
 * @example graphml(parseCsvText("x\n3\n5\n"), buildCover(parsed, { features: ["x"], scale: "none", radius: 10, … }), { outcomes: [] })
 *   // => one node, `<node id="1">`, with `<data key="k2">4</data>` (mean_x of 3 and 5)
 */
export function graphml(parsed: ParsedTable, result: CoverResult, context: GraphmlContext): string {
  const nodes = result.landmarks.length;
  const { offsets } = result.members;
  const meanColumns = [...new Set([...result.params.features, ...context.outcomes])];
  const means = meanColumns.map((name) => nodeMeans(columnNumbers(parsed, name), result.members));
  const regions = context.regions ?? [];
  const inRegion = regions.map((region) => {
    const flags = new Uint8Array(nodes);
    for (const k of majorityNodes(result.members, region.rows, result.rowsRead)) flags[k] = 1;
    return flags;
  });

  const keys = [
    { type: "int", name: "landmark_row" },
    { type: "int", name: "size" },
    ...meanColumns.map((name) => ({ type: "double", name: `mean_${name}` })),
    ...regions.map((region) => ({ type: "boolean", name: `region_${region.name}` })),
  ];
  const edgeKey = `k${keys.length}`;
  const lines = [
    '<?xml version="1.0" encoding="UTF-8"?>',
    '<graphml xmlns="http://graphml.graphdrawing.org/xmlns" xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance" xsi:schemaLocation="http://graphml.graphdrawing.org/xmlns http://graphml.graphdrawing.org/xmlns/1.0/graphml.xsd">',
    ...keys.map((key, i) => `  <key id="k${i}" for="node" attr.name="${escapeXml(key.name)}" attr.type="${key.type}"/>`),
    `  <key id="${edgeKey}" for="edge" attr.name="shared" attr.type="int"/>`,
    '  <graph id="cover" edgedefault="undirected">',
  ];
  const meanKey = 2;
  const regionKey = meanKey + meanColumns.length;
  for (let k = 0; k < nodes; ++k) {
    lines.push(`    <node id="${k + 1}">`);
    lines.push(`      <data key="k0">${result.landmarks[k]! + 1}</data>`);
    lines.push(`      <data key="k1">${offsets[k + 1]! - offsets[k]!}</data>`);
    for (let c = 0; c < means.length; ++c) {
      const mean = means[c]![k]!;
      if (!Number.isNaN(mean)) lines.push(`      <data key="k${meanKey + c}">${xsdDouble(mean)}</data>`);
    }
    for (let r = 0; r < inRegion.length; ++r) lines.push(`      <data key="k${regionKey + r}">${inRegion[r]![k] === 1}</data>`);
    lines.push("    </node>");
  }
  const { source, target, shared } = result.edges;
  for (let e = 0; e < source.length; ++e) {
    lines.push(`    <edge id="e${e + 1}" source="${source[e]! + 1}" target="${target[e]! + 1}"><data key="${edgeKey}">${shared[e]!}</data></edge>`);
  }
  lines.push("  </graph>", "</graphml>");
  return `${lines.join("\n")}\n`;
}

function xsdDouble(value: number): string {
  return value === Infinity ? "INF" : value === -Infinity ? "-INF" : String(value);
}

function columnNumbers(parsed: ParsedTable, name: string): Float64Array {
  const column = parsed.columns.find((c) => c.name === name);
  if (!column) throw new Error(`unknown column: ${name}`);
  return column.numbers;
}
