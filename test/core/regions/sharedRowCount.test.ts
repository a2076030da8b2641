import { describe, expect, it } from "vitest";
import { sharedRowCount } from "../../../src/core/regions/sharedRowCount.ts";

describe("sharedRowCount", () => {
  it("the JSDoc example: {1, 3, 5} and {3, 5, 8} share 2 rows (worked by hand)", () => {
    expect(sharedRowCount(Uint32Array.of(1, 3, 5), Uint32Array.of(3, 5, 8))).toBe(2);
  });
  it("{1, 3, 5, 7} and {3, 4, 5, 8} share 2 rows (3 and 5, worked by hand)", () => {
    expect(sharedRowCount(Uint32Array.of(1, 3, 5, 7), Uint32Array.of(3, 4, 5, 8))).toBe(2);
  });
  it("a region shares all its 4 rows with itself and none with an empty one", () => {
    const a = Uint32Array.of(0, 2, 4, 6);
    expect([sharedRowCount(a, a), sharedRowCount(a, new Uint32Array(0))]).toEqual([4, 0]);
  });
});
