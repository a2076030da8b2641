import { describe, expect, it } from "vitest";
import { nodesHoldingRow } from "../../../src/core/regions/nodesHoldingRow.ts";

// Members: node 0 {0,1,2,3}, node 1 {3,4}, node 2 {5,6,7}, node 3 {}.
const members = Object.freeze({ offsets: Uint32Array.of(0, 4, 6, 9, 9), items: Uint32Array.of(0, 1, 2, 3, 3, 4, 5, 6, 7) });

describe("nodesHoldingRow", () => {
  it("the JSDoc example: row 3 of nodes {0, 3} and {3, 5} lies in both (worked by hand)", () => {
    expect(nodesHoldingRow({ offsets: Uint32Array.of(0, 2, 4), items: Uint32Array.of(0, 3, 3, 5) }, 3)).toEqual([0, 1]);
  });
  it("row 3 lies in nodes 0 and 1; row 9 in none (worked by hand)", () => {
    expect(nodesHoldingRow(members, 3)).toEqual([0, 1]);
    expect(nodesHoldingRow(members, 9)).toEqual([]);
  });
});
