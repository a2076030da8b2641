// Properties of every registered metric on random vectors (fast-check): symmetry, d(x, x) = 0,
// and the triangle inequality for the metrics that claim it (isTrueMetric). Cosine and
// correlation are checked on rows where they are defined (no zero row, no constant row).
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { chebyshev, correlation, cosine, euclidean, manhattan, metrics, type Metric } from "../../../src/core/index.ts";
import { assertClose } from "../../assertClose.ts";
import { definedPoints, rowsOf } from "../support/metricVectors.ts";

const all: readonly Metric[] = Object.values(metrics);

describe("properties of every metric", () => {
  it("the registry holds exactly euclidean, manhattan, chebyshev, cosine and correlation; the first three claim the triangle inequality", () => {
    expect(all.map((m) => [m.name, m.isTrueMetric])).toEqual([
      ["euclidean", true], ["manhattan", true], ["chebyshev", true], ["cosine", false], ["correlation", false], // from the modules' JSDoc
    ]);
  });

  for (const metric of all) {
    it(`${metric.name}: d(x, y) = d(y, x) exactly on random vectors`, () => {
      // Every metric combines per-column terms that are symmetric in x and y bit for bit
      // (|a − b| = |b − a|, (a − b)² = (b − a)², a·b = b·a), in the same column order.
      fc.assert(
        fc.property(definedPoints(metric, 2), ([a, b]) => {
          const values = rowsOf(a!, b!);
          expect(metric.distance(values, a!.length, 0, 1)).toBe(metric.distance(values, a!.length, 1, 0));
        }),
      );
    });
  }

  for (const metric of [euclidean, manhattan, chebyshev]) {
    it(`${metric.name}: d(x, x) = 0 exactly on random vectors`, () => {
      fc.assert(
        fc.property(definedPoints(metric, 1), ([a]) => {
          expect(metric.distance(rowsOf(a!), a!.length, 0, 0)).toBe(0); // every term is x − x = 0
        }),
      );
    });
  }

  for (const metric of [cosine, correlation]) {
    it(`${metric.name}: |d(x, x)| ≤ 1e-15 on random defined vectors (not exactly 0 in floating point)`, () => {
      // d(x, x) = 1 − s / √(fl(s · s)) with s = Σ x² (centred for correlation). The product s · s is
      // rounded before the square root, so √(fl(s²)) may differ from s by one ulp: the quotient is
      // then 1 ± 2⁻⁵², and d(x, x) is −2.2e-16 or 1.1e-16 instead of 0. A bound of 1e-15 is a few
      // ulps of 1 (common practice, no source).
      fc.assert(
        fc.property(definedPoints(metric, 1), ([a]) => {
          assertClose(metric.distance(rowsOf(a!), a!.length, 0, 0), 0, { absolute: 1e-15 }); // worked by hand: 0 in exact arithmetic; the bound as explained above
        }),
      );
    });
  }

  for (const metric of [euclidean, manhattan, chebyshev]) {
    it(`${metric.name}: d(x, z) ≤ d(x, y) + d(y, z) on random vectors, up to 1e-12 relative rounding`, () => {
      fc.assert(
        fc.property(definedPoints(metric, 3), ([a, b, c]) => {
          const values = rowsOf(a!, b!, c!);
          const d = a!.length;
          const direct = metric.distance(values, d, 0, 2);
          const detour = metric.distance(values, d, 0, 1) + metric.distance(values, d, 1, 2);
          expect(direct).toBeLessThanOrEqual(detour * (1 + 1e-12) + 1e-12); // rounding allowance: common practice, no source
        }),
      );
    });
  }
});

describe("cosine and correlation break the triangle inequality", () => {
  it("cosine: x = (1, 0), y = (1, 1), z = (0, 1) give d(x, z) = 1 > d(x, y) + d(y, z) = 2 − √2 ≈ 0.586", () => {
    const values = rowsOf([1, 0], [1, 1], [0, 1]);
    const xz = cosine.distance(values, 2, 0, 2);
    const xy = cosine.distance(values, 2, 0, 1);
    const yz = cosine.distance(values, 2, 1, 2);
    assertClose(xz, 1); // worked by hand: x·z = 0
    assertClose(xy, 1 - Math.SQRT1_2); // worked by hand: x·y = 1, ‖x‖‖y‖ = √2
    assertClose(yz, 1 - Math.SQRT1_2); // worked by hand: by symmetry
    assertClose(xy + yz, 2 - Math.SQRT2); // worked by hand
    expect(xz).toBeGreaterThan(xy + yz); // worked by hand: 1 > 0.586
  });

  it("correlation: x = (6, 4, 5, 5), y = (4, 2, 4, 2), z = (−2, −2, −1, −3) give d(x, z) = 1 > d(x, y) + d(y, z) = 2 − √2", () => {
    // Row means 5, 3 and −2 (exact), so the centred rows are u = (1, −1, 0, 0), v = (1, −1, 1, −1),
    // w = (0, 0, 1, −1): the cosine counterexample placed in the plane of centred 4-vectors.
    // u·w = 0 → d = 1; u·v = 2, ‖u‖‖v‖ = √2 · 2 → r = 1/√2; likewise for v, w.
    const values = rowsOf([6, 4, 5, 5], [4, 2, 4, 2], [-2, -2, -1, -3]);
    const xz = correlation.distance(values, 4, 0, 2);
    const xy = correlation.distance(values, 4, 0, 1);
    const yz = correlation.distance(values, 4, 1, 2);
    assertClose(xz, 1); // worked by hand
    assertClose(xy, 1 - Math.SQRT1_2); // worked by hand
    assertClose(yz, 1 - Math.SQRT1_2); // worked by hand
    expect(xz).toBeGreaterThan(xy + yz); // worked by hand: 1 > 0.586
  });
});
