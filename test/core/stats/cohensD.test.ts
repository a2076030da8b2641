import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { cohensD } from "../../../src/core/stats/cohensD.ts";
import { assertClose } from "../../assertClose.ts";

const sample = fc.array(fc.integer({ min: -1000, max: 1000 }).map((k) => k / 8), { minLength: 2, maxLength: 30 });

describe("cohensD", () => {
  it("2, 4, 6 against 1, 3 gives √1.2 = 1.0954451150103321 (the JSDoc example)", () => {
    // worked by hand: means 4 and 2; squared deviations 8 and 2; pooled variance 10/3; d = 2 / √(10/3) = √1.2
    assertClose(cohensD(Object.freeze([2, 4, 6]), Object.freeze([1, 3])), 1.0954451150103321);
    assertClose(cohensD([2, 4, 6], [1, 3]), Math.sqrt(1.2));
  });

  it("the hand-worked cases come out bit for bit as √1.2, 2/√5.6 and 1/√2 with the means and variances of mean.ts and sampleVariance.ts", () => {
    assertClose([cohensD([2, 4, 6], [1, 3]), cohensD([5, 7, 9, 11], [4, 6, 8]), cohensD([3], [1, 3])], [Math.sqrt(1.2), 2 / Math.sqrt(5.6), 1 / Math.sqrt(2)], { absolute: 0 }); // worked by hand, as above
  });

  it("5, 7, 9, 11 against 4, 6, 8 gives 2 / √5.6", () => {
    assertClose(cohensD([5, 7, 9, 11], [4, 6, 8]), 2 / Math.sqrt(5.6)); // worked by hand: means 8, 6; squares 20 + 8 over 5 degrees of freedom
  });

  it("a sample of one value adds no spread: 3 against 1, 3 gives 1/√2", () => {
    assertClose(cohensD([3], [1, 3]), 1 / Math.sqrt(2)); // worked by hand: means 3, 2; squares 0 + 2 over 1 degree of freedom
  });

  it("NaN values are skipped", () => {
    assertClose(cohensD([2, NaN, 4, 6], Float64Array.of(1, 3, NaN)), Math.sqrt(1.2)); // worked by hand, as the first case
  });

  it("gives NaN for an empty sample, for two single values, and for a pooled standard deviation of 0", () => {
    expect(cohensD([], [1, 2, 3])).toBeNaN();
    expect(cohensD([1, 2], [NaN])).toBeNaN();
    expect(cohensD([1], [2])).toBeNaN();
    expect(cohensD([4, 4], [5, 5, 5])).toBeNaN();
  });

  it("is antisymmetric: d(x, y) = −d(y, x)", () => {
    fc.assert(
      fc.property(sample, sample, (x, y) => {
        const d = cohensD(x, y);
        if (Number.isNaN(d)) expect(cohensD(y, x)).toBeNaN();
        else expect(cohensD(y, x)).toBe(-d);
      }),
    );
  });

  it("is invariant under a common positive affine change of units, v ↦ 4v − 3", () => {
    fc.assert(
      fc.property(sample, sample, (x, y) => {
        const d = cohensD(x, y);
        const scaled = cohensD(x.map((v) => 4 * v - 3), y.map((v) => 4 * v - 3));
        if (Number.isNaN(d)) expect(scaled).toBeNaN();
        else assertClose(scaled, d, { absolute: 1e-12, relative: 1e-12 }); // a change of units cancels in the ratio
      }),
    );
  });
});
