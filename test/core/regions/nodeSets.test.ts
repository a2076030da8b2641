import { describe, expect, it } from "vitest";
import { nodeRowShare } from "../../../src/core/cover/nodeRowShare.ts";
import { componentNodes, growByOneStep, majorityNodes, nodesHoldingRow, rowsInRegion, sharedRowCount } from "../../../src/core/regions/nodeSets.ts";
import { assertClose } from "../../assertClose.ts";

// A small graph by hand: path 0 – 1 – 2 – 3, and a separate edge 4 – 5; node 6 alone.
const graph = Object.freeze({
  edges: { source: Uint32Array.of(0, 1, 2, 4), target: Uint32Array.of(1, 2, 3, 5), shared: Uint32Array.of(1, 1, 1, 1) },
  component: Uint32Array.of(0, 0, 0, 0, 1, 1, 2),
});

// Members: node 0 {0,1,2,3}, node 1 {3,4}, node 2 {5,6,7}, node 3 {} (rows ascending)
const members = Object.freeze({ offsets: Uint32Array.of(0, 4, 6, 9, 9), items: Uint32Array.of(0, 1, 2, 3, 3, 4, 5, 6, 7) });

describe("componentNodes", () => {
  it("node 2 lies in the component {0, 1, 2, 3} (worked by hand)", () => {
    expect(componentNodes(graph, [2])).toEqual([0, 1, 2, 3]);
  });
  it("nodes 5 and 6 give the union of their components {4, 5, 6} (worked by hand)", () => {
    expect(componentNodes(graph, [6, 5])).toEqual([4, 5, 6]);
  });
  it("no node gives no node", () => {
    expect(componentNodes(graph, [])).toEqual([]);
  });
});

describe("growByOneStep", () => {
  it("node 1 grows to {0, 1, 2}, one edge each way (worked by hand)", () => {
    expect(growByOneStep(graph, [1])).toEqual([0, 1, 2]);
  });
  it("{0, 4} grows to {0, 1, 4, 5}; twice from 0 reaches {0, 1, 2} (worked by hand)", () => {
    expect(growByOneStep(graph, [0, 4])).toEqual([0, 1, 4, 5]);
    expect(growByOneStep(graph, growByOneStep(graph, [0]))).toEqual([0, 1, 2]);
  });
  it("an isolated node 6 stays {6}", () => {
    expect(growByOneStep(graph, [6])).toEqual([6]);
  });
});

describe("majority rule for a region's nodes", () => {
  it("region rows {0, 1, 2, 4}: node 0 has 3 of 4 (most), node 1 has 1 of 2 (exactly half: not most), node 2 none (worked by hand)", () => {
    const rows = Uint32Array.of(0, 1, 2, 4);
    expect(Array.from(rowsInRegion(members, rows))).toEqual([3, 1, 0, 0]); // worked by hand
    expect(majorityNodes(members, rows)).toEqual([0]);
  });
  it("region rows {3, 4, 6, 7}: node 1 has 2 of 2 and node 2 has 2 of 3, both most; node 0 has 1 of 4 (worked by hand)", () => {
    expect(majorityNodes(members, Uint32Array.of(3, 4, 6, 7))).toEqual([1, 2]);
  });
  it("the shares of rows {0, 1, 2, 4} are 3/4, 1/2, 0 and NaN for the empty node (worked by hand)", () => {
    assertClose(nodeRowShare(members, Uint32Array.of(0, 1, 2, 4), 8), [0.75, 0.5, 0, NaN], { absolute: 0 }); // worked by hand
  });
  it("an empty region selects no node", () => {
    expect(majorityNodes(members, new Uint32Array(0))).toEqual([]);
  });
});

describe("sharedRowCount", () => {
  it("{1, 3, 5, 7} and {3, 4, 5, 8} share 2 rows (3 and 5, worked by hand)", () => {
    expect(sharedRowCount(Uint32Array.of(1, 3, 5, 7), Uint32Array.of(3, 4, 5, 8))).toBe(2);
  });
  it("a region shares all its 4 rows with itself and none with an empty one", () => {
    const a = Uint32Array.of(0, 2, 4, 6);
    expect([sharedRowCount(a, a), sharedRowCount(a, new Uint32Array(0))]).toEqual([4, 0]);
  });
});

describe("nodesHoldingRow", () => {
  it("row 3 lies in nodes 0 and 1; row 9 in none (worked by hand)", () => {
    expect(nodesHoldingRow(members, 3)).toEqual([0, 1]);
    expect(nodesHoldingRow(members, 9)).toEqual([]);
  });
});
