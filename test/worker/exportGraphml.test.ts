// The workbench's export zip carries graph.graphml, with the named regions sent along as region attributes.
import { strFromU8, unzipSync } from "fflate";
import Graph from "graphology";
import { parse } from "graphology-graphml";
import { describe, expect, it } from "vitest";
import { buildCover, parseCsvText, type CoverParams } from "../../src/core/index.ts";
import { createHandler } from "../../src/worker/handle.ts";
import { loadText, now } from "./answers.ts";

// x = 0, 0.5, 5, 5.5 at radius 1 (no scaling): balls {0, 1} and {2, 3}, worked by hand
const csv = "id,x\na,0\nb,0.5\nc,5\nd,5.5\n";
const params: CoverParams = Object.freeze({ features: ["x"], scale: "none", metric: "euclidean", radius: 1, landmarks: "greedy-file-order", seed: 1 });

describe("worker: exportZip with graph.graphml", () => {
  it("holds graph.graphml with region_<name> true on node 1 for a region of rows a and b, false on node 2", () => {
    const handle = createHandler();
    now(handle(loadText(1, csv), () => {}));
    const result = buildCover(parseCsvText(csv), params);
    const context = { fileName: "t.csv", fileSize: csv.length, idColumn: "id", outcomes: [], regions: [{ name: "left & <near>", rows: Uint32Array.of(0, 1) }] };
    const answer = now(handle({ id: 2, type: "exportZip", result, context }, () => {}));
    if (answer.type !== "zipped") throw new Error(`expected zipped, got ${JSON.stringify(answer)}`);
    const graph = parse(Graph, strFromU8(unzipSync(answer.bytes)["graph.graphml"]!));
    expect(graph.getNodeAttributes("1")).toEqual({ landmark_row: 1, size: 2, mean_x: 0.25, "region_left & <near>": true }); // worked by hand
    expect(graph.getNodeAttributes("2")).toEqual({ landmark_row: 3, size: 2, mean_x: 5.25, "region_left & <near>": false }); // worked by hand
    expect(graph.size).toBe(0); // the balls share no row
  });
});
