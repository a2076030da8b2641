import { describe, expect, it } from "vitest";
import { euclidean, manhattan, type NumericTable } from "../../../src/core/index.ts";
import { blockMembership } from "../../../src/core/search/blockMembership.ts";
import { firstHitNet } from "../../../src/core/landmark/firstHitNet.ts";
import { greedyBalls } from "../../../src/core/landmark/greedyBalls.ts";
import { scanLeaf } from "../../../src/core/search/leafScan.ts";
import { maximinBalls } from "../../../src/core/landmark/maximinBalls.ts";
import { createRowIndex } from "../../../src/core/search/rowIndex.ts";
import { searchSpace } from "../../../src/core/search/searchSpace.ts";

const line = (n: number): NumericTable => Object.freeze({ rows: n, columns: 1, names: ["x"], values: Float64Array.from({ length: n }, (_, i) => i) });

describe("search JSDoc examples", () => {
  it("scanLeaf: centre 1 against positions holding 0 and 3 with limit 1 keeps position 0 only (1² ≤ 1 < 2²)", () => {
    expect(scanLeaf({ norm: "squares", dims: 1, coords: Float64Array.of(0, 3), lo: new Float64Array(0), hi: new Float64Array(0), centre: Float64Array.of(1), centreBase: 0, limit: 1 }, 0, 2, new Uint32Array(2), 0)).toBe(1); // worked by hand
  });

  it("greedyBalls and firstHitNet: 0, 1, 2, 3 with r = 1 in file order give landmarks 0 and 2 (1 ties with 0, 3 with 2)", () => {
    expect(Array.from(greedyBalls(createRowIndex(line(4), euclidean), 1, Uint32Array.of(0, 1, 2, 3)).landmarks)).toEqual([0, 2]); // worked by hand
    expect(Array.from(firstHitNet(createRowIndex(line(4), euclidean), 1, Uint32Array.of(0, 1, 2, 3)))).toEqual([0, 2]); // worked by hand
  });

  it("blockMembership: balls of rows 0 and 2 of 0, 1, 2, 3 at r = 1 are {0, 1} and {1, 2, 3}", () => {
    const members = blockMembership(createRowIndex(line(4), euclidean), 1, Uint32Array.of(0, 2));
    expect([Array.from(members.offsets), Array.from(members.items)]).toEqual([[0, 2, 5], [0, 1, 1, 2, 3]]); // worked by hand
  });

  it("maximinBalls: 0..4 with r = 1 from row 0 takes 0, then the farthest 4, then 2", () => {
    expect(Array.from(maximinBalls(createRowIndex(line(5), euclidean), 1, 0).landmarks)).toEqual([0, 4, 2]); // worked by hand: 2 is 2 from both
  });

  it("createRowIndex builds a tree for Euclidean distance; searchSpace's Manhattan threshold at r = 0.5 is 0.5", () => {
    expect(createRowIndex(line(3), euclidean).tree).not.toBeNull();
    expect(searchSpace(line(3), manhattan)?.threshold(0.5)).toBe(0.5);
  });
});
