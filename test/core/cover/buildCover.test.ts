import { describe, expect, it } from "vitest";
import { buildCover, parseCsvText, type BuildPhase, type CoverParams } from "../../../src/core/index.ts";
import { allLists } from "../support/bruteForce.ts";
import { lineCsv, lineSd } from "../support/lineCsv.ts";

const params = (patch: Partial<CoverParams> = {}): CoverParams =>
  Object.freeze({ features: ["x"], scale: "zscore", metric: "euclidean", radius: 1, landmarks: "greedy-file-order", seed: 1, ...patch });

const parsed = Object.freeze(parseCsvText(lineCsv));

describe("buildCover on a parsed file", () => {
  it("keeps the row numbers of the file: record p3 with a missing x is dropped as row 2, after a quoted newline and a blank line", () => {
    const result = buildCover(parsed, params());
    expect(result.rowsRead).toBe(7);
    expect(Array.from(result.usedRows)).toEqual([0, 1, 3, 4, 5, 6]); // worked by hand, see lineCsv.ts
    expect(Array.from(result.droppedRows)).toEqual([2]); // worked by hand
  });

  it("at raw radius 1.5 (scaled 1.5/sd) gives landmarks at rows 0, 3, 5 and balls {0, 1}, {1, 3, 4}, {5, 6} in file rows", () => {
    // The line case with r = 1 (lineByHand.test.ts): a raw radius 1.5 decides every pair as r = 1 does,
    // since the raw gaps are integers. Local landmarks 0, 2, 4 and balls {0, 1}, {1, 2, 3}, {4, 5}
    // map through usedRows = 0, 1, 3, 4, 5, 6 to file rows 0, 3, 5 and {0, 1}, {1, 3, 4}, {5, 6}.
    const result = buildCover(parsed, params({ radius: 1.5 / lineSd }));
    expect(Array.from(result.landmarks)).toEqual([0, 3, 5]); // worked by hand
    expect(allLists(result.members)).toEqual([[0, 1], [1, 3, 4], [5, 6]]); // worked by hand
    expect([Array.from(result.edges.source), Array.from(result.edges.target), Array.from(result.edges.shared)]).toEqual([[0], [1], [1]]); // worked by hand
    expect(Array.from(result.component)).toEqual([0, 0, 1]); // worked by hand
    expect(result.componentCount).toBe(2); // worked by hand
    expect(result.constantColumns).toEqual([]);
  });

  it("at raw radius 2.5 (scaled 2.5/sd) gives landmarks at rows 0, 4, 6 and a path with weights 2 and 1", () => {
    // As r = 2 in lineByHand.test.ts: local landmarks 0, 3, 5 → file rows 0, 4, 6; balls
    // {0, 1, 2}, {1, 2, 3, 4}, {4, 5} → {0, 1, 3}, {1, 3, 4, 5}, {5, 6}.
    const result = buildCover(parsed, params({ radius: 2.5 / lineSd }));
    expect(Array.from(result.landmarks)).toEqual([0, 4, 6]); // worked by hand
    expect(allLists(result.members)).toEqual([[0, 1, 3], [1, 3, 4, 5], [5, 6]]); // worked by hand
    expect([Array.from(result.edges.source), Array.from(result.edges.target), Array.from(result.edges.shared)]).toEqual([[0, 1], [1, 2], [2, 1]]); // worked by hand
    expect(result.componentCount).toBe(1); // worked by hand
  });

  it("a radius above the scaled diameter 6/sd gives one node holding every used row", () => {
    const result = buildCover(parsed, params({ radius: 6.5 / lineSd }));
    expect(Array.from(result.landmarks)).toEqual([0]); // worked by hand
    expect(allLists(result.members)).toEqual([[0, 1, 3, 4, 5, 6]]); // worked by hand
    expect(result.edges.source.length).toBe(0);
  });

  it("copies the parameters into the result, features included", () => {
    const input = params({ radius: 0.5, landmarks: "greedy-shuffled", seed: 7 });
    const result = buildCover(parsed, input);
    expect(result.params).toEqual(input);
    expect(result.params.features).not.toBe(input.features);
  });

  it("the random rule is reproducible: the same seed gives the same graph", () => {
    const a = buildCover(parsed, params({ radius: 0.5, landmarks: "greedy-shuffled", seed: 42 }));
    const b = buildCover(parsed, params({ radius: 0.5, landmarks: "greedy-shuffled", seed: 42 }));
    expect(Array.from(a.landmarks)).toEqual(Array.from(b.landmarks));
    expect(allLists(a.members)).toEqual(allLists(b.members));
  });

  it("times each phase by the clock passed in: ticks 0, 1, 3, 6, 10, 15 give 1, 2, 3, 4, 5 ms for the first five phases", () => {
    let call = 0;
    const now = (): number => (call * (call++ + 1)) / 2; // the k-th call (from 0) returns k(k + 1)/2: 0, 1, 3, 6, 10, 15, …
    const result = buildCover(parsed, params(), { now });
    expect(result.timings).toMatchObject({ scale: 1, landmarks: 2, members: 3, edges: 4, components: 5 }); // worked by hand: successive differences
  });

  it("reports the phases scale, landmarks, members, edges in that order, each starting at 0", () => {
    const reports: [BuildPhase, number][] = [];
    let current: BuildPhase | null = null;
    buildCover(parsed, params(), { onPhase: (phase) => (current = phase), onProgress: (fraction) => reports.push([current!, fraction]) });
    expect(reports.filter(([phase]) => ["scale", "landmarks", "members", "edges"].includes(phase))).toEqual([["scale", 0], ["landmarks", 0], ["members", 0], ["edges", 0]]);
  });
});

describe("buildCover on degenerate input", () => {
  it("a constant feature is reported and puts every row in one node", () => {
    const table = parseCsvText("x,c\n0,7\n1,7\n2,7\n");
    const result = buildCover(table, params({ features: ["c"], radius: 0.1 }));
    expect(result.constantColumns).toEqual(["c"]);
    expect(allLists(result.members)).toEqual([[0, 1, 2]]); // worked by hand: every z-score is 0
  });

  it("duplicate rows fall into the same balls", () => {
    const table = parseCsvText("x\n1\n1\n5\n1\n");
    const result = buildCover(table, params({ radius: 0.1 }));
    expect(allLists(result.members)).toEqual([[0, 1, 3], [2]]); // worked by hand: three copies at one point, one far away
  });

  it("one complete row gives one node with that row", () => {
    const table = parseCsvText("x,y\n1,\n2,5\n");
    const result = buildCover(table, params({ features: ["x", "y"] }));
    expect(Array.from(result.droppedRows)).toEqual([0]);
    expect(Array.from(result.landmarks)).toEqual([1]);
    expect(allLists(result.members)).toEqual([[1]]);
    expect(result.constantColumns).toEqual(["x", "y"]);
  });

  it("when every row is dropped the graph is empty", () => {
    const table = parseCsvText("x,y\n1,NA\nNA,2\n");
    const result = buildCover(table, params({ features: ["x", "y"] }));
    expect(Array.from(result.usedRows)).toEqual([]);
    expect(Array.from(result.droppedRows)).toEqual([0, 1]);
    expect(result.landmarks.length).toBe(0);
    expect(Array.from(result.members.offsets)).toEqual([0]);
    expect(result.edges.source.length).toBe(0);
    expect(result.componentCount).toBe(0);
  });

  it("throws errors naming a bad radius, seed, metric, scaling, landmark rule or feature", () => {
    for (const radius of [0, -1, NaN, Infinity]) expect(() => buildCover(parsed, params({ radius }))).toThrow(`invalid radius: ${radius}`);
    expect(() => buildCover(parsed, params({ seed: 1.5 }))).toThrow("invalid seed: 1.5");
    expect(() => buildCover(parsed, { ...params(), metric: "hamming" as never })).toThrow("invalid metric: hamming");
    expect(() => buildCover(parsed, { ...params(), scale: "logistic" as never })).toThrow("invalid scaling: logistic");
    expect(() => buildCover(parsed, { ...params(), landmarks: "farthest" as never })).toThrow("invalid landmark rule: farthest");
    expect(() => buildCover(parsed, params({ features: ["nope"] }))).toThrow("unknown column: nope");
    expect(() => buildCover(parsed, params({ features: ["note"] }))).toThrow("not a numeric column: note");
    expect(() => buildCover(parsed, params({ features: [] }))).toThrow("choose at least one feature column");
  });
});
