import { describe, expect, it } from "vitest";
import { regionSides } from "../../../src/core/regions/regionSides.ts";

const used = Uint32Array.of(0, 1, 2, 4, 5); // rows 3 and 6 of 7 left out of the build

describe("regionSides", () => {
  it("against the rest: inside is the region's used rows, outside every other used row; rows left out are in neither", () => {
    const sides = regionSides(7, used, [1, 3, 5]);
    expect(Array.from(sides.inside)).toEqual([1, 5]); // worked by hand: {1, 3, 5} ∩ used
    expect(Array.from(sides.outside)).toEqual([0, 2, 4]); // used \ region
    expect(sides.rowsUnused).toBe(2); // rows 3 and 6
    expect(sides.regionRowsUnused).toBe(1); // row 3
    expect(sides.inBoth).toBe(0);
  });

  it("the JSDoc example: 5 rows, used 0, 1, 2, 4, region 1, 3 leaves 0, 2, 4 outside", () => {
    expect(Array.from(regionSides(5, Uint32Array.of(0, 1, 2, 4), Uint32Array.of(1, 3)).outside)).toEqual([0, 2, 4]); // worked by hand
  });

  it("A vs B: rows in both are left out of both sides and counted; rows in neither are in neither side", () => {
    const sides = regionSides(7, used, [0, 1, 2], [2, 4, 6]);
    expect(Array.from(sides.inside)).toEqual([0, 1]); // worked by hand: A \ B
    expect(Array.from(sides.outside)).toEqual([4]); // B \ A, used only (6 is left out)
    expect(sides.inBoth).toBe(1); // row 2
    expect(sides.regionRowsUnused).toBe(1); // row 6
  });

  it("a region row out of range throws naming it", () => {
    expect(() => regionSides(7, used, [7])).toThrow("row out of range: 7 (0-based; 7 rows were read)");
    expect(() => regionSides(7, used, [0], [-1])).toThrow("row out of range: -1");
  });
});
