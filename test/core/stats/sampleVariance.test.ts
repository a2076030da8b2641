import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { variance as d3Variance } from "d3-array";
import { sampleVariance } from "../../../src/core/index.ts";
import { assertClose } from "../../assertClose.ts";

const values = fc.array(fc.integer({ min: -1_000_000, max: 1_000_000 }).map((k) => k / 64), { minLength: 2, maxLength: 60 });

describe("sampleVariance", () => {
  it("sample variance of 2, 4, 4, 4, 5, 5, 7, 9 is 32/7 (mean 5; squared deviations sum to 32, over n − 1 = 7)", () => {
    assertClose(sampleVariance(Object.freeze([2, 4, 4, 4, 5, 5, 7, 9])), 32 / 7); // worked by hand
  });

  it("the JSDoc example value 4.571428571428571 is 32/7", () => {
    assertClose(sampleVariance([2, 4, 4, 4, 5, 5, 7, 9]), 4.571428571428571); // worked by hand: 32/7 printed
  });

  it("missing values (NaN) are skipped: 1, NaN, 3 has variance 2", () => {
    assertClose(sampleVariance([1, NaN, 3]), 2); // worked by hand: mean 2, (1 + 1) / 1
  });

  it("a constant array has variance 0", () => {
    expect(sampleVariance(new Float64Array(5).fill(0.3))).toBe(0); // worked by hand: Welford's deltas are 0 after the first value
  });

  it("fewer than two values give NaN (empty, one value, one value among NaN)", () => {
    expect(sampleVariance([])).toBeNaN();
    expect(sampleVariance([4])).toBeNaN();
    expect(sampleVariance([NaN, 4, NaN])).toBeNaN();
  });

  it("agrees with d3-array's variance (also n − 1) on random arrays", () => {
    fc.assert(
      fc.property(values, (xs) => {
        assertClose(sampleVariance(xs), d3Variance(xs)!, { absolute: 1e-9, relative: 1e-9 }); // d3-array variance
      }),
    );
  });

  it("is invariant under translation", () => {
    fc.assert(
      fc.property(values, fc.integer({ min: -10_000, max: 10_000 }), (xs, shift) => {
        assertClose(sampleVariance(xs.map((x) => x + shift)), sampleVariance(xs), { absolute: 1e-6, relative: 1e-9 });
      }),
    );
  });
});
