import { describe, expect, it } from "vitest";
import { compareNumeric } from "../../../src/core/regions/compareNumeric.ts";
import { assertClose } from "../../assertClose.ts";

describe("compareNumeric", () => {
  it("inside 1, 2, 3 against outside 2, 4: means 2 and 3, medians 2 and 3, d −√3/2, D 1/2, p 0.9", () => {
    const values = Float64Array.of(1, 2, 3, 2, 4);
    const line = compareNumeric(values, Uint32Array.of(0, 1, 2), Uint32Array.of(3, 4));
    expect(Array.from(values)).toEqual([1, 2, 3, 2, 4]); // the input is not reordered
    expect(line.nInside).toBe(3);
    expect(line.nOutside).toBe(2);
    assertClose(line.meanInside, 2); // worked by hand
    assertClose(line.meanOutside, 3); // worked by hand
    assertClose(line.medianInside, 2); // worked by hand
    assertClose(line.medianOutside, 3); // worked by hand: type 7, halfway between 2 and 4
    assertClose(line.d, -Math.sqrt(3) / 2); // worked by hand: s² 1 and 2, pooled (2·1 + 1·2)/3 = 4/3, d = −1/√(4/3)
    assertClose(line.statistic, 0.5); // worked by hand: after 1 (and 2 of each), F = 2/3 and G = 1/2; after 3, 1 against 1/2
    assertClose(line.p, 0.9); // worked by hand: 9 of the 10 orderings of 3 + 2 values without ties have D ≥ 1/2
  });

  it("missing values are left out of each side, so the counts are those of the present values", () => {
    const values = Float64Array.of(1, NaN, 3, 5, 7, NaN);
    const line = compareNumeric(values, Uint32Array.of(0, 1, 2), Uint32Array.of(3, 4, 5));
    expect([line.nInside, line.nOutside]).toEqual([2, 2]);
    assertClose(line.statistic, 1); // worked by hand: the samples do not overlap
    assertClose(line.p, 1 / 3); // worked by hand: 2 of the 6 orderings of 2 + 2 values have D = 1
    assertClose(line.d, -2 * Math.SQRT2); // worked by hand: means 2 and 6, both s² = 2, d = −4/√2
  });

  it("an empty side gives NaN for every figure that needs it, and no p-value", () => {
    const line = compareNumeric(Float64Array.of(1, 2, NaN), Uint32Array.of(0, 1), Uint32Array.of(2));
    expect(line.nOutside).toBe(0);
    assertClose([line.meanOutside, line.medianOutside, line.d, line.statistic, line.p], [NaN, NaN, NaN, NaN, NaN]);
    assertClose(line.meanInside, 1.5); // worked by hand
  });
});
