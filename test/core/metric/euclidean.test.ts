import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { distance as mlDistance } from "ml-distance";
import { euclidean } from "../../../src/core/index.ts";
import { assertClose } from "../../assertClose.ts";

/** Puts rows a, b (, c) into one row-major Float64Array, as the metric reads them. */
const rows = (...points: number[][]): Float64Array => Float64Array.from(points.flat());

const vectors = (count: number) =>
  fc.integer({ min: 1, max: 8 }).chain((d) =>
    fc.array(fc.array(fc.double({ min: -1e3, max: 1e3, noNaN: true }), { minLength: d, maxLength: d }), { minLength: count, maxLength: count }),
  );

describe("euclidean", () => {
  it("the distance between (0, 0) and (3, 4) is 5", () => {
    assertClose(euclidean.distance(Float64Array.of(0, 0, 3, 4), 2, 0, 1), 5); // worked by hand: √(9 + 16)
  });

  it("agrees with ml-distance's euclidean on random vectors", () => {
    fc.assert(
      fc.property(vectors(2), ([a, b]) => {
        assertClose(euclidean.distance(rows(a!, b!), a!.length, 0, 1), mlDistance.euclidean(a!, b!), { absolute: 1e-12, relative: 1e-14 }); // ml-distance euclidean
      }),
    );
  });

  it("is symmetric: d(a, b) = d(b, a)", () => {
    fc.assert(
      fc.property(vectors(2), ([a, b]) => {
        const values = rows(a!, b!);
        expect(euclidean.distance(values, a!.length, 0, 1)).toBe(euclidean.distance(values, a!.length, 1, 0));
      }),
    );
  });

  it("d(a, a) = 0 and a point is within any positive radius of itself", () => {
    fc.assert(
      fc.property(vectors(1), fc.double({ min: 1e-300, max: 1e3, noNaN: true }), ([a], r) => {
        const values = rows(a!);
        expect(euclidean.distance(values, a!.length, 0, 0)).toBe(0);
        expect(euclidean.within(values, a!.length, 0, 0, r)).toBe(true);
      }),
    );
  });

  it("obeys the triangle inequality d(a, c) ≤ d(a, b) + d(b, c), up to rounding", () => {
    fc.assert(
      fc.property(vectors(3), ([a, b, c]) => {
        const values = rows(a!, b!, c!);
        const d = a!.length;
        const ac = euclidean.distance(values, d, 0, 2);
        const detour = euclidean.distance(values, d, 0, 1) + euclidean.distance(values, d, 1, 2);
        expect(ac).toBeLessThanOrEqual(detour * (1 + 1e-12) + 1e-12);
      }),
    );
  });

  it("a tie at exactly d = r is inside: 0 and 0.5 with r = 0.5 (exact in binary)", () => {
    expect(euclidean.within(Float64Array.of(0, 0.5), 1, 0, 1, 0.5)).toBe(true); // worked by hand: 0.25 ≤ 0.25
    expect(euclidean.within(Float64Array.of(0, 0.5), 1, 0, 1, 0.49999999999999994)).toBe(false); // the double just below 0.5 (from memory)
  });

  it("a tie at exactly d = r is inside in two dimensions: (0, 0) and (3, 4) with r = 5", () => {
    expect(euclidean.within(Float64Array.of(0, 0, 3, 4), 2, 0, 1, 5)).toBe(true); // worked by hand: 25 ≤ 25
    expect(euclidean.within(Float64Array.of(0, 0, 3, 4), 2, 0, 1, 4.999999)).toBe(false);
  });

  it("within(r) ⇔ distance ≤ r on an integer grid with an integer radius (no rounding can flip it there)", () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 5 }).chain((d) => fc.array(fc.integer({ min: -4, max: 4 }), { minLength: 2 * d, maxLength: 2 * d })),
        fc.integer({ min: 1, max: 8 }),
        (flat, r) => {
          const d = flat.length / 2;
          const values = Float64Array.from(flat);
          expect(euclidean.within(values, d, 0, 1, r)).toBe(euclidean.distance(values, d, 0, 1) <= r);
        },
      ),
    );
  });

  it("is described as a true metric named euclidean", () => {
    expect(euclidean.name).toBe("euclidean");
    expect(euclidean.isTrueMetric).toBe(true);
  });
});
