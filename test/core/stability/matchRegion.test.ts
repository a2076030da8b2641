import { describe, expect, it } from "vitest";
import { assertClose } from "../../assertClose.ts";
import { overlapEdges, rowsToNodes, type CompressedLists } from "../../../src/core/index.ts";
import { matchRegion } from "../../../src/core/stability/matchRegion.ts";
import { selectionMask } from "../../../src/core/stability/selectionMask.ts";

const lists = (groups: number[][]): CompressedLists => ({ offsets: Uint32Array.from([0, ...groups.map((g) => g.length)].map((_, i, all) => all.slice(0, i + 1).reduce((a, b) => a + b, 0))), items: Uint32Array.from(groups.flat()) });

/** A cover from node → rows lists over `rows` rows: members, row → nodes, edges. */
function cover(balls: number[][], rows: number) {
  const members = lists(balls);
  const rowNodes = rowsToNodes(members, rows);
  return { members, rowNodes, edges: overlapEdges(rowNodes, balls.length) };
}
const mask = (rows: number, selected: number[]): Uint8Array => Uint8Array.from({ length: rows }, (_, i) => (selected.includes(i) ? 1 : 0));

describe("matching a selection to a connected node set", () => {
  // Rows 0..9; a path of five balls {0,1,2}, {2,3,4}, {4,5,6}, {6,7,8}, {8,9}, each sharing one
  // row with the next, and node 5 = {1} inside node 0's ball (an edge to node 0 only).
  const path = cover([[0, 1, 2], [2, 3, 4], [4, 5, 6], [6, 7, 8], [8, 9], [1]], 10);

  it("selecting rows 2..6 starts at node 1 (3 selected rows; node 2 also has 3, node 1 is lower) and adds node 2: J = 5/5 = 1", () => {
    const match = matchRegion(path.members, path.rowNodes, path.edges, mask(10, [2, 3, 4, 5, 6]));
    expect(Array.from(match.nodes)).toEqual([1, 2]); // worked by hand: {2..4} gives J = 3/5; adding node 2 gives {2..6}, J = 1; node 0 or 3 would lower it
    expect(match.jaccard).toBe(1); // worked by hand
    expect(Array.from(match.rows)).toEqual([2, 3, 4, 5, 6]);
  });

  it("selecting rows 0..4 and 9 starts at node 0, adds node 1 and stops: J = 5/6, since reaching row 9 would cost rows 5..8", () => {
    const match = matchRegion(path.members, path.rowNodes, path.edges, mask(10, [0, 1, 2, 3, 4, 9]));
    // node 0: {0,1,2}, J = 3/6; + node 1: {0..4}, J = 5/6; + node 2 would give 5/8, + node 5 changes nothing (worked by hand)
    expect(Array.from(match.nodes)).toEqual([0, 1]);
    assertClose(match.jaccard, 5 / 6); // worked by hand
  });

  it("adds a node only while the Jaccard index strictly rises: node 5 = {1} inside the region adds nothing", () => {
    const match = matchRegion(path.members, path.rowNodes, path.edges, mask(10, [0, 1, 2]));
    expect(Array.from(match.nodes)).toEqual([0]); // worked by hand: node 0 alone gives J = 1
  });

  it("the path 0–1–2 with balls {0, 1}, {1, 2}, {2, 3} and rows 0, 1, 2 selected gives nodes 0, 1 and J = 1", () => {
    const small = cover([[0, 1], [1, 2], [2, 3]], 4);
    const match = matchRegion(small.members, small.rowNodes, small.edges, mask(4, [0, 1, 2]));
    expect([Array.from(match.nodes), match.jaccard]).toEqual([[0, 1], 1]); // worked by hand: start at node 0 (2 rows, tie with node 1), J 2/3; node 1 adds row 2: J = 1; node 2 would add row 3
  });

  it("a selection no ball holds gives an empty region with J = 0", () => {
    const lonely = cover([[0, 1], [1, 2]], 4);
    const match = matchRegion(lonely.members, lonely.rowNodes, lonely.edges, mask(4, [3]));
    expect([Array.from(match.nodes), match.jaccard]).toEqual([[], 0]); // worked by hand
  });

  it("selection rows map onto the build's rows; rows left out do not count, and no row in the build is an error", () => {
    expect(Array.from(selectionMask([1, 4, 2], Uint32Array.of(0, 2, 4), 5))).toEqual([0, 1, 1]); // parsed row 1 was not used
    expect(() => selectionMask([1, 3], Uint32Array.of(0, 2, 4), 5)).toThrow("the selection holds no row used in the build (2 rows given)");
    expect(() => selectionMask([7], Uint32Array.of(0), 5)).toThrow("invalid selection row: 7");
  });
});
