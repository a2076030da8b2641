import { describe, expect, it } from "vitest";
import { compareCategorical } from "../../../src/core/regions/compareCategorical.ts";
import { chiSquaredIndependence } from "../../../src/core/stats/chiSquaredIndependence.ts";
import { assertClose } from "../../assertClose.ts";

describe("compareCategorical", () => {
  it("a, a inside against b, b outside gives X² = 4 (every expected count 1, each cell off by 1; the JSDoc example)", () => {
    const line = compareCategorical({ codes: Uint32Array.of(0, 0, 1, 1), levels: ["a", "b"] }, Uint32Array.of(0, 1), Uint32Array.of(2, 3));
    assertClose(line.statistic, 4); // worked by hand
    expect(line.degreesOfFreedom).toBe(1);
    expect(line.hasSmallExpected).toBe(true);
    expect(line.levels).toEqual([{ level: "a", shareInside: 1, shareOutside: 0 }, { level: "b", shareInside: 0, shareOutside: 1 }]); // worked by hand
  });

  it("shares are of the rows with a level on each side; missing cells are left out of counts and test", () => {
    const codes = Uint32Array.of(0, 0, 1, 0xffffffff, 1, 1, 0xffffffff);
    const line = compareCategorical({ codes, levels: ["a", "b"] }, Uint32Array.of(0, 1, 2, 3), Uint32Array.of(4, 5, 6));
    expect([line.nInside, line.nOutside]).toEqual([3, 2]);
    assertClose(line.levels.map((l) => [l.shareInside, l.shareOutside]), [[2 / 3, 0], [1 / 3, 1]]); // worked by hand
    assertClose(line.statistic, 20 / 9); // worked by hand: expected 1.2, 1.8 / 0.8, 1.2; (0.8²)(1/1.2 + 1/1.8 + 1/0.8 + 1/1.2) = 20/9
    expect(line.p).toBe(chiSquaredIndependence([[2, 1], [0, 2]]).pValue); // the independently tested stats function on the same counts
  });
});
