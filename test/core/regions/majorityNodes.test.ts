import { describe, expect, it } from "vitest";
import { nodeRowShare } from "../../../src/core/cover/nodeRowShare.ts";
import { majorityNodes } from "../../../src/core/regions/majorityNodes.ts";
import { assertClose } from "../../assertClose.ts";

// Members: node 0 {0,1,2,3}, node 1 {3,4}, node 2 {5,6,7}, node 3 {} (rows ascending); 8 rows read.
const members = Object.freeze({ offsets: Uint32Array.of(0, 4, 6, 9, 9), items: Uint32Array.of(0, 1, 2, 3, 3, 4, 5, 6, 7) });

describe("majorityNodes", () => {
  it("the JSDoc example: rows {2, 1} of nodes {0, 1} and {1, 2, 3} select node 1 only (1 of 2 is half; 2 of 3 is most; worked by hand)", () => {
    expect(majorityNodes({ offsets: Uint32Array.of(0, 2, 5), items: Uint32Array.of(0, 1, 1, 2, 3) }, Uint32Array.of(2, 1), 4)).toEqual([1]);
  });
  it("region rows {0, 1, 2, 4}: node 0 has 3 of 4 (most), node 1 has 1 of 2 (exactly half: not most), node 2 none (worked by hand)", () => {
    const rows = Uint32Array.of(0, 1, 2, 4);
    assertClose(nodeRowShare(members, rows, 8), [0.75, 0.5, 0, NaN], { absolute: 0 }); // worked by hand; NaN for the empty node
    expect(majorityNodes(members, rows, 8)).toEqual([0]);
  });
  it("region rows {3, 4, 6, 7}: node 1 has 2 of 2 and node 2 has 2 of 3, both most; node 0 has 1 of 4 (worked by hand)", () => {
    expect(majorityNodes(members, Uint32Array.of(3, 4, 6, 7), 8)).toEqual([1, 2]);
  });
  it("rows given out of order, {4, 3}, still count row 4: node 1 has 2 of 2 (worked by hand)", () => {
    expect(majorityNodes(members, Uint32Array.of(4, 3), 8)).toEqual([1]);
  });
  it("an empty region selects no node, and the empty node 3 is never selected", () => {
    expect(majorityNodes(members, new Uint32Array(0), 8)).toEqual([]);
    expect(majorityNodes(members, Uint32Array.of(0, 1, 2, 3, 4, 5, 6, 7), 8)).toEqual([0, 1, 2]);
  });
});
