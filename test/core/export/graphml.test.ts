// graph.graphml against nodes.csv and edges.csv, read back with a general-purpose graph library
// (graphology 0.26 with graphology-graphml 0.5, whose Node parser uses @xmldom/xmldom).
import { readFileSync } from "node:fs";
import Graph from "graphology";
import { parse } from "graphology-graphml";
import { describe, expect, it } from "vitest";
import { buildCover, coverExports, graphml, parseCsvText, type CoverParams } from "../../../src/core/index.ts";
import { assertClose } from "../../assertClose.ts";
import { lineCsv, lineSd } from "../support/lineCsv.ts";

const lineParsed = parseCsvText(lineCsv);
const lineParams: CoverParams = { features: ["x"], scale: "zscore", metric: "euclidean", radius: 1.5 / lineSd, landmarks: "greedy-file-order", seed: 1 };
const lineResult = buildCover(lineParsed, lineParams);
// From buildCover.test.ts: balls {0, 1}, {1, 3, 4}, {5, 6} (0-based parsed rows), landmarks at rows 0, 3, 5.
const regions = [
  { name: "first two", rows: Uint32Array.of(0, 1) },
  { name: "half of node 1", rows: Uint32Array.of(1, 3) },
];

/** Splits a CSV of plain cells (no quotes) into header and rows. */
function csvRows(text: string): { header: string[]; rows: string[][] } {
  const [header, ...rows] = text.trimEnd().split("\n").map((line) => line.split(","));
  return { header: header!, rows };
}

describe("graphml", () => {
  it("writes the small line's three nodes and one edge exactly (worked by hand from buildCover.test.ts's balls)", () => {
    const text = graphml(lineParsed, lineResult, { outcomes: ["y"] });
    const nodes = text.split("\n").filter((line) => line.includes("<data") || line.includes("<node") || line.includes("<edge"));
    expect(nodes).toEqual([
      '    <node id="1">',
      '      <data key="k0">1</data>', // landmark_row: record 1, worked by hand
      '      <data key="k1">2</data>', // size 2, worked by hand
      '      <data key="k2">0.5</data>', // mean_x (0 + 1)/2, worked by hand
      '      <data key="k3">15</data>', // mean_y (10 + 20)/2, worked by hand
      '    <node id="2">',
      '      <data key="k0">4</data>', // record 4 (record 3 was dropped but still counts), worked by hand
      '      <data key="k1">3</data>', // worked by hand
      '      <data key="k2">2</data>', // (1 + 2 + 3)/3, worked by hand
      '      <data key="k3">30</data>', // (20 + 40)/2, record 5 has no y, worked by hand
      '    <node id="3">',
      '      <data key="k0">6</data>', // worked by hand
      '      <data key="k1">2</data>', // worked by hand
      '      <data key="k2">5.5</data>', // (5 + 6)/2, worked by hand
      '      <data key="k3">65</data>', // (60 + 70)/2, worked by hand
      '    <edge id="e1" source="1" target="2"><data key="k4">1</data></edge>', // nodes 1 and 2 share row 1, worked by hand
    ]);
    expect(text.startsWith('<?xml version="1.0" encoding="UTF-8"?>\n<graphml xmlns="http://graphml.graphdrawing.org/xmlns"')).toBe(true);
    expect(text.endsWith("  </graph>\n</graphml>\n")).toBe(true);
  });

  it("the @example: x = 3, 5 in one ball of radius 10 gives one node with mean_x 4 (worked by hand)", () => {
    const parsed = parseCsvText("x\n3\n5\n");
    const result = buildCover(parsed, { features: ["x"], scale: "none", metric: "euclidean", radius: 10, landmarks: "greedy-file-order", seed: 1 });
    const text = graphml(parsed, result, { outcomes: [] });
    expect(text).toContain('<node id="1">');
    expect(text).toContain('<data key="k2">4</data>'); // (3 + 5)/2, worked by hand
    expect(text).not.toContain('<node id="2">');
  });

  it("a node with no value of a column has no data element for its mean (NaN is left out, not written)", () => {
    // rows 0 and 1 (x = 0, 0.1) share a ball of radius 1 and have no y; row 2 (x = 5, y = 1) is alone: worked by hand
    const parsed = parseCsvText("x,y\n0,\n0.1,\n5,1\n");
    const result = buildCover(parsed, { features: ["x"], scale: "none", metric: "euclidean", radius: 1, landmarks: "greedy-file-order", seed: 1 });
    const graph = parse(Graph, graphml(parsed, result, { outcomes: ["y"] }));
    expect(graph.getNodeAttributes("1")).toEqual({ landmark_row: 1, size: 2, mean_x: 0.05 }); // no mean_y; 0.1 / 2 = 0.05 in doubles, worked by hand
    expect(graph.getNodeAttributes("2")).toEqual({ landmark_row: 3, size: 1, mean_x: 5, mean_y: 1 }); // worked by hand
  });

  it("region_<name> is true exactly where most of a node's rows lie in the region (exactly half is not most)", () => {
    const graph = parse(Graph, graphml(lineParsed, lineResult, { outcomes: [], regions }));
    const flags = (name: string): boolean[] => ["1", "2", "3"].map((id) => graph.getNodeAttribute(id, name) as boolean);
    expect(flags("region_first two")).toEqual([true, false, false]); // shares 2/2, 1/3, 0/2: worked by hand
    expect(flags("region_half of node 1")).toEqual([false, true, false]); // shares 1/2, 2/3, 0/2: worked by hand
  });

  it("a column and a region named with XML's special characters round-trip exactly; key ids stay valid XML names", () => {
    const odd = 'a<b&c"d';
    const parsed = parseCsvText(`x,"${odd.replaceAll('"', '""')}"\n0,1\n0.5,2\n`);
    const result = buildCover(parsed, { features: ["x"], scale: "none", metric: "euclidean", radius: 1, landmarks: "greedy-file-order", seed: 1 });
    const regionName = `it's <"this"> & 'that' é`;
    const text = graphml(parsed, result, { outcomes: [odd], regions: [{ name: regionName, rows: Uint32Array.of(0, 1) }] });
    const graph = parse(Graph, text);
    expect(graph.getNodeAttributes("1")).toEqual({ landmark_row: 1, size: 2, mean_x: 0.25, [`mean_${odd}`]: 1.5, [`region_${regionName}`]: true }); // worked by hand
    for (const [, id] of text.matchAll(/<key id="([^"]*)"/g)) expect(id).toMatch(/^[A-Za-z_][A-Za-z0-9_.-]*$/); // XML 1.0 Name, ASCII subset (from memory)
  });

  it("a column name with a character XML 1.0 forbids (U+0001) is written as U+FFFD and the file still parses", () => {
    const parsed = parseCsvText("x,bad\u0001name\n0,1\n");
    const result = buildCover(parsed, { features: ["x"], scale: "none", metric: "euclidean", radius: 1, landmarks: "greedy-file-order", seed: 1 });
    const graph = parse(Graph, graphml(parsed, result, { outcomes: ["bad\u0001name"] }));
    expect(graph.getNodeAttributes("1")).toEqual({ landmark_row: 1, size: 1, mean_x: 0, "mean_bad\ufffdname": 1 }); // worked by hand
  });

  it("on the demo, graphology reads back nodes.csv's node count, every attribute, and edges.csv's edges with their shared counts", () => {
    const parsed = parseCsvText(readFileSync(new URL("../../../public/demo/pump-fleet.csv", import.meta.url), "utf8"));
    const features = ["age_years", "flow_m3h", "head_m", "power_kw", "efficiency_pct", "vibration_mm_s", "bearing_temp_c", "starts_per_day", "runtime_h_per_day", "suction_pressure_kpa"];
    const result = buildCover(parsed, { features, scale: "zscore", metric: "euclidean", radius: 0.5, landmarks: "greedy-file-order", seed: 1 });
    const context = { fileName: "pump-fleet.csv", fileSize: 0, idColumn: "pump_id", outcomes: ["failed_within_90d", "downtime_h"] };
    const files = coverExports(parsed, result, context);
    const graph = parse(Graph, graphml(parsed, result, context));
    const nodesCsv = csvRows(files["nodes.csv"]);
    const edgesCsv = csvRows(files["edges.csv"]);
    expect(graph.type).toBe("undirected");
    expect(graph.order).toBe(nodesCsv.rows.length); // nodes.csv, one line per node
    expect(graph.size).toBe(edgesCsv.rows.length); // edges.csv, one line per edge
    for (const row of nodesCsv.rows) {
      const expected: Record<string, number> = {};
      nodesCsv.header.forEach((name, c) => {
        if (name !== "node" && row[c] !== "") expected[name] = Number(row[c]);
      });
      assertClose(graph.getNodeAttributes(row[0]!), expected, { relative: 0 }); // nodes.csv's cells, exactly
    }
    for (const [source, target, shared] of edgesCsv.rows) {
      expect(graph.getEdgeAttribute(graph.edge(source!, target!)!, "shared")).toBe(Number(shared)); // edges.csv's shared
    }
  });
});
