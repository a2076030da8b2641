// Node statistics and the export zip are computed by the worker's handler, not on the page's thread.
import { strFromU8, unzipSync } from "fflate";
import { describe, expect, it } from "vitest";
import { buildCover, coverExports, graphml, parseCsvText, zipExports, type CoverParams } from "../../src/core/index.ts";
import { createNodeStatistics } from "../../src/worker/createNodeStatistics.ts";
import { createHandler, transferables } from "../../src/worker/handle.ts";
import { lane, laneOf, type Answer } from "../../src/worker/protocol.ts";
import { assertClose } from "../assertClose.ts";
import { loadText, now } from "./answers.ts";

// x = 0, 1, 2, 3, 5, 6 (mean 17/6, sum of squared deviations 161/6, sample sd √(161/30)); y with row d missing
const csv = "id,x,y\na,0,10\nb,1,20\nc,2,40\nd,3,\ne,5,60\nf,6,70\n";
const ignore = (): void => {};
const summarised = (answer: Answer) => {
  if (answer.type !== "summarised") throw new Error(`expected summarised, got ${JSON.stringify(answer)}`);
  return answer.columns;
};

describe("worker: nodeStats", () => {
  it("node rows {1, 2, 3}: x mean 2 and standardised difference (2 − 17/6)/√(161/30); y has 2 values and 1 missing, mean 30", () => {
    const handle = createHandler();
    now(handle(loadText(1, csv), ignore));
    const [x, y] = summarised(now(handle({ id: 2, type: "nodeStats", rows: Uint32Array.of(1, 2, 3), columns: ["x", "y"] }, ignore)));
    expect(x!.name).toBe("x");
    assertClose(x!.summary.mean, 2); // worked by hand: (1 + 2 + 3)/3
    assertClose(x!.standardisedDifference, (2 - 17 / 6) / Math.sqrt(161 / 30)); // worked by hand (see the table's comment)
    expect(y!.summary).toMatchObject({ count: 2, missing: 1 }); // worked by hand: row d has no y
    assertClose(y!.summary.mean, 30); // worked by hand: (20 + 40)/2
  });

  it("the JSDoc example: row 2 of x = 1, 2, 3 has standardised difference 1 (mean 2, sd 1 over all rows)", () => {
    const [x] = createNodeStatistics(parseCsvText("x\n1\n2\n3\n"))(Uint32Array.of(2), ["x"]);
    assertClose(x!.standardisedDifference, 1); // worked by hand: (3 − 2)/1
  });

  it("after a new table is loaded the reference summaries are the new table's: x = 0, 10 gives difference (10 − 5)/√50", () => {
    const handle = createHandler();
    now(handle(loadText(1, csv), ignore));
    now(handle({ id: 2, type: "nodeStats", rows: Uint32Array.of(1), columns: ["x"] }, ignore));
    now(handle(loadText(3, "x\n0\n10\n"), ignore));
    const [x] = summarised(now(handle({ id: 4, type: "nodeStats", rows: Uint32Array.of(1), columns: ["x"] }, ignore)));
    assertClose(x!.standardisedDifference, 5 / Math.sqrt(50)); // worked by hand: mean 5, sample variance (25 + 25)/1 = 50
  });

  it("a name that is not a numeric column answers failed 'unknown numeric column: id'", () => {
    const handle = createHandler();
    now(handle(loadText(1, csv), ignore));
    expect(now(handle({ id: 2, type: "nodeStats", rows: Uint32Array.of(0), columns: ["id"] }, ignore))).toEqual({ id: 2, type: "failed", message: "unknown numeric column: id" });
  });
});

describe("worker: exportZip", () => {
  const params: CoverParams = Object.freeze({ features: ["x"], scale: "zscore", metric: "euclidean", radius: 0.6, landmarks: "greedy-file-order", seed: 1 });
  const context = { fileName: "t.csv", fileSize: csv.length, idColumn: "id", outcomes: ["y"] };

  it("answers the same bytes as zipping core's export tables directly, and transfers their buffer", () => {
    const handle = createHandler();
    now(handle(loadText(1, csv), ignore));
    const result = buildCover(parseCsvText(csv), params);
    const answer = now(handle({ id: 2, type: "exportZip", result, context }, ignore));
    if (answer.type !== "zipped") throw new Error(`expected zipped, got ${JSON.stringify(answer)}`);
    const reference = { ...coverExports(parseCsvText(csv), result, context), "graph.graphml": graphml(parseCsvText(csv), result, context) };
    expect(answer.bytes).toEqual(zipExports(reference)); // reference: core's writers on this thread
    expect(Object.keys(unzipSync(answer.bytes)).sort()).toEqual(["edges.csv", "graph.graphml", "members.csv", "nodes.csv", "summary.json"]);
    expect(strFromU8(unzipSync(answer.bytes)["members.csv"]!).split("\n")[0]).toBe("node,row,id");
    expect(transferables(answer)).toEqual([answer.bytes.buffer]);
  });

  it("without a table answers failed 'no table is loaded'", () => {
    const result = buildCover(parseCsvText(csv), params);
    expect(now(createHandler()({ id: 1, type: "exportZip", result, context }, ignore))).toEqual({ id: 1, type: "failed", message: "no table is loaded" });
  });
});

describe("protocol: lanes", () => {
  it("node statistics and the export run in the view lane, apart from builds (compute) and loads", () => {
    expect([laneOf("nodeStats"), laneOf("exportZip")]).toEqual([lane.view, lane.view]);
    expect(new Set([lane.view, lane.compute, lane.load]).size).toBe(3);
  });
});
