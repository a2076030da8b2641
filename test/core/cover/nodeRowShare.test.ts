import { describe, expect, it } from "vitest";
import { nodeRowShare } from "../../../src/core/cover/nodeRowShare.ts";
import { assertClose } from "../../assertClose.ts";

const members = Object.freeze({ offsets: Uint32Array.of(0, 2, 5, 5), items: Uint32Array.of(0, 1, 1, 2, 3) });

describe("nodeRowShare", () => {
  it("shares of rows {1, 2}: node 1 has 1 of 2, node 2 has 2 of 3, an empty node NaN (worked by hand; the JSDoc example)", () => {
    const share = nodeRowShare(members, Uint32Array.of(1, 2), 4);
    assertClose(Array.from(share.subarray(0, 2)), [1 / 2, 2 / 3]); // worked by hand
    expect(share[2]).toBeNaN();
  });

  it("the share does not depend on the order or repetition of the region's rows", () => {
    expect(Array.from(nodeRowShare(members, [2, 1, 2], 4))).toEqual(Array.from(nodeRowShare(members, [1, 2], 4)));
  });

  it("an empty region gives share 0 to every node with members (worked by hand)", () => {
    expect(Array.from(nodeRowShare(members, [], 4).subarray(0, 2))).toEqual([0, 0]); // worked by hand
  });
});
