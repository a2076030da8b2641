import { describe, expect, it } from "vitest";
import { isMaximinNet } from "../../../src/core/sweep/maximinSequence.ts";

const rowLists = (rows: number[][]) => ({ offsets: Uint32Array.from([0, ...rows.map((r) => r.length)].map((_, i, all) => all.slice(0, i + 1).reduce((a, b) => a + b, 0))), items: Uint32Array.from(rows.flat()) });

describe("checking a prefix of the farthest-point order", () => {
  it("accepts landmarks 0, 4, 2 of the line 0..4 at r = 1: each lies in no earlier ball and every row is covered", () => {
    // balls at r = 1: node 0 = {0, 1}, node 1 (row 4) = {3, 4}, node 2 (row 2) = {1, 2, 3} (worked by hand)
    expect(isMaximinNet([0, 4, 2], rowLists([[0], [0, 2], [2], [1, 2], [1]]))).toBe(true);
  });

  it("rejects a prefix that leaves a row uncovered, or whose landmark lies in an earlier ball", () => {
    expect(isMaximinNet([0, 4], rowLists([[0], [0], [], [1], [1]]))).toBe(false); // row 2 uncovered
    expect(isMaximinNet([0, 1], rowLists([[0, 1], [0, 1]]))).toBe(false); // row 1 lies in node 0's ball
  });
});
