import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { quantile } from "d3-array";
import { quantileSorted } from "../../../src/core/index.ts";
import { assertClose } from "../../assertClose.ts";

const ascending = (a: number, b: number): number => a - b;

describe("quantileSorted (type 7)", () => {
  it("the 0.25 quantile of 1, 2, 3, 4 is 1.75 (h = 3 · 0.25 = 0.75; 1 + 0.75 · (2 − 1))", () => {
    assertClose(quantileSorted(Object.freeze([1, 2, 3, 4]), 0.25), 1.75); // worked by hand
  });

  it("the median of 1, 2, 3, 4 is 2.5 and of 1, 3, 4, 10 is 3.5", () => {
    assertClose(quantileSorted([1, 2, 3, 4], 0.5), 2.5); // worked by hand: h = 1.5
    assertClose(quantileSorted([1, 3, 4, 10], 0.5), 3.5); // worked by hand: 3 + 0.5 · 1
  });

  it("p = 0 gives the minimum and p = 1 the maximum", () => {
    assertClose(quantileSorted([-3, 0, 8], 0), -3); // simple formula: h = 0
    assertClose(quantileSorted([-3, 0, 8], 1), 8); // simple formula: h = n − 1
  });

  it("one value is every quantile of itself", () => {
    for (const p of [0, 0.3, 0.5, 1]) assertClose(quantileSorted([7], p), 7); // simple formula
  });

  it("a constant array has that constant as every quantile", () => {
    for (const p of [0, 0.1, 0.75, 1]) assertClose(quantileSorted(new Float64Array(6).fill(2.5), p), 2.5); // simple formula
  });

  it("an empty array gives NaN", () => {
    expect(quantileSorted([], 0.5)).toBeNaN();
  });

  it("a probability outside [0, 1] or NaN throws an error naming it", () => {
    expect(() => quantileSorted([1, 2], 1.5)).toThrow("invalid quantile probability: 1.5");
    expect(() => quantileSorted([1, 2], -0.1)).toThrow("invalid quantile probability: -0.1");
    expect(() => quantileSorted([1, 2], NaN)).toThrow("invalid quantile probability: NaN");
  });

  it("agrees with d3-array's quantile on random arrays and probabilities", () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -1e6, max: 1e6, noNaN: true }), { minLength: 1, maxLength: 40 }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (values, p) => {
          const sorted = Float64Array.from(values).sort();
          assertClose(quantileSorted(sorted, p), quantile(values, p)!, { absolute: 1e-9, relative: 1e-12 }); // d3-array quantile
        },
      ),
    );
  });

  it("is monotone in p", () => {
    fc.assert(
      fc.property(
        fc.array(fc.integer({ min: -100, max: 100 }), { minLength: 1, maxLength: 30 }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (values, p, q) => {
          const sorted = [...values].sort(ascending);
          const [lo, hi] = p <= q ? [p, q] : [q, p];
          expect(quantileSorted(sorted, lo)).toBeLessThanOrEqual(quantileSorted(sorted, hi));
        },
      ),
    );
  });
});
