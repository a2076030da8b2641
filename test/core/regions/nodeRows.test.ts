import { describe, expect, it } from "vitest";
import { nodeRows } from "../../../src/core/regions/nodeRows.ts";

const members = Object.freeze({ offsets: Uint32Array.of(0, 2, 4, 4), items: Uint32Array.of(0, 3, 3, 5) }); // node 0: rows 0, 3; node 1: rows 3, 5; node 2: empty

describe("nodeRows", () => {
  it("the rows of nodes 1 and 0 are 0, 3, 5: the union, each row once, ascending (the JSDoc example)", () => {
    expect(Array.from(nodeRows(members, [1, 0]))).toEqual([0, 3, 5]); // worked by hand: {0, 3} ∪ {3, 5}
  });

  it("an empty node and an empty choice give no rows", () => {
    expect(Array.from(nodeRows(members, [2]))).toEqual([]);
    expect(Array.from(nodeRows(members, []))).toEqual([]);
  });

  it("a node out of range throws naming it and the node count", () => {
    expect(() => nodeRows(members, [3])).toThrow("node out of range: 3 (0-based; there are 3 nodes)");
    expect(() => nodeRows(members, [-1])).toThrow("node out of range: -1");
    expect(() => nodeRows(members, [0.5])).toThrow("node out of range: 0.5");
  });
});
