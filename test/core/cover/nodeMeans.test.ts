import { describe, expect, it } from "vitest";
import { nodeMeans, nodeMembers } from "../../../src/core/index.ts";
import { assertClose } from "../../assertClose.ts";

describe("nodeMeans", () => {
  it("the JSDoc example: column 1, 3, NaN over nodes {0, 1} and {2} gives 2 and NaN", () => {
    const means = nodeMeans(Float64Array.of(1, 3, NaN), { offsets: Uint32Array.of(0, 2, 3), items: Uint32Array.of(0, 1, 2) });
    assertClose(means, [2, NaN]); // worked by hand
  });

  it("skips missing values and counts a row in every node it belongs to", () => {
    // Node 0 = rows {0, 1, 2}: (10 + 20) / 2 = 15 (row 2 missing); node 1 = rows {1, 3}: (20 + 50) / 2 = 35.
    const means = nodeMeans(Float64Array.of(10, 20, NaN, 50), { offsets: Uint32Array.of(0, 3, 5), items: Uint32Array.of(0, 1, 2, 1, 3) });
    assertClose(means, [15, 35]); // worked by hand
  });

  it("an empty node gives NaN and no nodes give an empty array", () => {
    assertClose(nodeMeans(Float64Array.of(1), { offsets: Uint32Array.of(0, 0), items: new Uint32Array(0) }), [NaN]);
    expect(nodeMeans(Float64Array.of(1), { offsets: Uint32Array.of(0), items: new Uint32Array(0) }).length).toBe(0);
  });
});

describe("nodeMembers", () => {
  it("returns node k's rows as a view into the lists", () => {
    const members = { offsets: Uint32Array.of(0, 2, 5), items: Uint32Array.of(0, 1, 1, 2, 3) };
    expect(Array.from(nodeMembers(members, 1))).toEqual([1, 2, 3]);
    expect(nodeMembers(members, 1).buffer).toBe(members.items.buffer);
  });
});
