import { describe, expect, it } from "vitest";
import { buildCover, coverExports, exportSchemaVersion, parseCsvText, type CoverParams } from "../../../src/core/index.ts";
import { lineCsv, lineSd } from "../support/lineCsv.ts";

const parsed = parseCsvText(lineCsv);
const params: CoverParams = { features: ["x"], scale: "zscore", metric: "euclidean", radius: 1.5 / lineSd, landmarks: "greedy-file-order", seed: 1 };
const result = buildCover(parsed, params);
const context = { fileName: "line.csv", fileSize: 123, idColumn: "id", outcomes: ["y"] } as const;
const files = coverExports(parsed, result, context);

// From buildCover.test.ts: landmarks at file rows 0, 3, 5 and balls {0, 1}, {1, 3, 4}, {5, 6} (0-based),
// that is data records 1, 4, 6 and {1, 2}, {2, 4, 5}, {6, 7} (1-based, counting the dropped record 3).
describe("coverExports", () => {
  it("nodes.csv lists node, 1-based landmark row, size and the node means of the features then the outcomes", () => {
    // mean_x: (0 + 1)/2 = 0.5, (1 + 2 + 3)/3 = 2, (5 + 6)/2 = 5.5;
    // mean_y: (10 + 20)/2 = 15, (20 + 40)/2 = 30 (record 5 has no y), (60 + 70)/2 = 65.
    expect(files["nodes.csv"]).toBe(
      "node,landmark_row,size,mean_x,mean_y\n" + "1,1,2,0.5,15\n" + "2,4,3,2,30\n" + "3,6,2,5.5,65\n", // worked by hand
    );
  });

  it("members.csv lists node, 1-based row and the id, neutralising an id that starts with =", () => {
    expect(files["members.csv"]).toBe(
      "node,row,id\n" + "1,1,p1\n" + "1,2,p2\n" + "2,2,p2\n" + "2,4,p4\n" + "2,5,p5\n" + "3,6,p6\n" + "3,7,'=p7\n", // worked by hand
    );
  });

  it("edges.csv lists 1-based source and target and the shared count", () => {
    expect(files["edges.csv"]).toBe("source,target,shared\n1,2,1\n"); // worked by hand
  });

  it("summary.json records the schema, input, parameters, row counts, dropped rows (1-based) and graph sizes", () => {
    expect(files["summary.json"].endsWith("}\n")).toBe(true);
    const summary = JSON.parse(files["summary.json"]);
    expect(summary).toMatchObject({
      schema: "shoal-cover-export",
      schemaVersion: 2,
      input: { fileName: "line.csv", fileSize: 123, reading: null },
      params: { features: ["x"], scale: "zscore", metric: "euclidean", radius: 1.5 / lineSd, landmarks: "greedy-file-order", seed: 1, idColumn: "id", outcomes: ["y"] },
      rows: { read: 7, used: 6, dropped: 1, firstDroppedRows: [3] }, // worked by hand: record 3 (p3) has no x
      constantColumns: [],
      nodes: 3, // worked by hand
      edges: 1, // worked by hand
      components: 2, // worked by hand
      cycleRank: 0, // simple formula: E − V + C = 1 − 3 + 2
      memberships: 7, // worked by hand: 2 + 3 + 2
    });
    expect(exportSchemaVersion).toBe(2); // version 2: input.reading and numeric row labels as read
  });

  it("the radius in summary.json reads back as the same double", () => {
    expect(JSON.parse(files["summary.json"]).params.radius).toBe(params.radius);
  });

  it("without an id column members.csv has node and row only; a feature named as an outcome is listed once", () => {
    const plain = coverExports(parsed, result, { ...context, idColumn: null, outcomes: ["x"] });
    expect(plain["members.csv"].split("\n")[0]).toBe("node,row");
    expect(plain["members.csv"].split("\n")[1]).toBe("1,1");
    expect(plain["nodes.csv"].split("\n")[0]).toBe("node,landmark_row,size,mean_x");
  });

  it("a node whose outcome values are all missing gets an empty mean cell", () => {
    const table = parseCsvText("x,y\n0,NA\n10,5\n");
    const built = buildCover(table, { ...params, radius: 0.1 });
    const nodes = coverExports(table, built, { ...context, idColumn: null, outcomes: ["y"] })["nodes.csv"];
    expect(nodes).toBe("node,landmark_row,size,mean_x,mean_y\n1,1,1,0,\n2,2,1,10,5\n"); // worked by hand: two far-apart singletons
  });

  it("lists at most the first 20 dropped rows in summary.json but counts all of them", () => {
    const text = `x\n${Array.from({ length: 30 }, (_, i) => (i < 25 ? "NA" : String(i))).join("\n")}\n`;
    const table = parseCsvText(text);
    const summary = JSON.parse(coverExports(table, buildCover(table, { ...params, radius: 1 }), { ...context, idColumn: null, outcomes: [] })["summary.json"]);
    expect(summary.rows.dropped).toBe(25);
    expect(summary.rows.firstDroppedRows).toEqual(Array.from({ length: 20 }, (_, i) => i + 1));
  });

  it("throws for an unknown id or outcome column", () => {
    expect(() => coverExports(parsed, result, { ...context, idColumn: "nope" })).toThrow("unknown column: nope");
    expect(() => coverExports(parsed, result, { ...context, outcomes: ["nope"] })).toThrow("unknown column: nope");
  });

  it("a numeric id column is written as its numbers: 7 and 8", () => {
    const table = parseCsvText("code,x\n7,0\n8,10\n");
    const built = buildCover(table, { ...params, radius: 0.1 });
    expect(coverExports(table, built, { ...context, idColumn: "code", outcomes: [] })["members.csv"]).toBe("node,row,code\n1,1,7\n2,2,8\n");
  });

  // Bug (src/core/export/coverExports.ts:46 with :89): a numeric id column is turned into text by
  // csvNumber and then passed through csvText, so a negative id −5 is written "'-5", although
  // csvCell.ts promises "numbers are never altered". Reachable through setRole(column, "id").
  it("a numeric id column with a negative value is written unaltered: -5, not '-5", () => {
    const table = parseCsvText("code,x\n-5,0\n8,10\n");
    const built = buildCover(table, { ...params, radius: 0.1 });
    expect(coverExports(table, built, { ...context, idColumn: "code", outcomes: [] })["members.csv"]).toBe("node,row,code\n1,1,-5\n2,2,8\n");
  });

  it("a numeric row label is written exactly as read: 007 and 12345678901234567890123, not 7 and 1.2345678901234568e+22", () => {
    const table = parseCsvText("code,x\n007,0\n12345678901234567890123,10\n");
    const built = buildCover(table, { ...params, radius: 0.1 });
    expect(coverExports(table, built, { ...context, idColumn: "code", outcomes: [] })["members.csv"]).toBe(
      "node,row,code\n1,1,007\n2,2,12345678901234567890123\n", // the cells of the file
    );
  });

  it("summary.json stores how the file was read under the command's names (delimiter pipe, ragged pad)", () => {
    const reading = { format: "delimited", delimiter: "pipe", decimal: ".", ragged: "pad" } as const;
    const summary = JSON.parse(coverExports(parsed, result, { ...context, reading })["summary.json"]);
    expect(summary.input).toEqual({ fileName: "line.csv", fileSize: 123, reading: { format: "delimited", delimiter: "pipe", decimal: ".", ragged: "pad" } });
  });
});
