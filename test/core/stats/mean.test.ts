import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { mean as d3Mean } from "d3-array";
import { mean } from "../../../src/core/index.ts";
import { assertClose } from "../../assertClose.ts";

describe("mean", () => {
  it("mean of 1, 2, NaN, 6 is 3 (NaN skipped; 9 / 3)", () => {
    assertClose(mean(Object.freeze([1, 2, NaN, 6])), 3); // worked by hand
  });

  it("mean of 2, 4, 4, 4, 5, 5, 7, 9 is 5 (40 / 8)", () => {
    assertClose(mean(Float64Array.of(2, 4, 4, 4, 5, 5, 7, 9)), 5); // worked by hand
  });

  it("mean of one value is that value", () => {
    assertClose(mean([-2.5]), -2.5); // simple formula
  });

  it("mean of a constant array is the constant", () => {
    assertClose(mean(new Float64Array(7).fill(0.1)), 0.1, { relative: 1e-15 }); // simple formula
  });

  it("mean of an empty array, or of missing values only, is NaN", () => {
    expect(mean([])).toBeNaN();
    expect(mean([NaN, NaN])).toBeNaN();
  });

  it("mean agrees with d3-array's mean on random arrays", () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -1e6, max: 1e6, noNaN: true }), { minLength: 1, maxLength: 50 }), (values) => {
        assertClose(mean(values), d3Mean(values)!, { absolute: 1e-9, relative: 1e-12 }); // d3-array mean
      }),
    );
  });
});
