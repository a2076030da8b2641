import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { regularizedGammaQ } from "../../../src/core/stats/regularizedGammaQ.ts";
import { assertClose } from "../../assertClose.ts";

describe("regularizedGammaQ", () => {
  it("Q(1, 2) is e^{−2} = 0.1353352832366127 (chi-squared, 2 df, at 4; the JSDoc example)", () => {
    assertClose(regularizedGammaQ(1, 2), 0.1353352832366127); // closed form Q(1, x) = e^{−x}
  });

  it("chi-squared with 1 df at its 95% point 3.841458820694124 has upper tail 0.05", () => {
    assertClose(regularizedGammaQ(0.5, 3.841458820694124 / 2), 0.05); // SciPy 1.17.1 scipy.stats.chi2.ppf(0.95, 1); the table value 3.841
  });

  it("chi-squared with 2 df: Q(1, x/2) = exp(−x/2) on both branches (series below x/2 = 2, continued fraction above)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 80, noNaN: true }), (x) => {
        assertClose(regularizedGammaQ(1, x / 2), Math.exp(-x / 2), { absolute: 1e-15, relative: 1e-13 }); // closed form
      }),
    );
  });

  it("chi-squared with 4 df: Q(2, y) = e^{−y}(1 + y)", () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 40, noNaN: true }), (y) => {
        assertClose(regularizedGammaQ(2, y), Math.exp(-y) * (1 + y), { absolute: 1e-15, relative: 1e-13 }); // closed form
      }),
    );
  });

  it("matches SciPy's gammaincc at shapes from 0.1 to 500", () => {
    assertClose(regularizedGammaQ(0.1, 0.01), 0.3373787400455204); // SciPy 1.17.1 scipy.special.gammaincc(0.1, 0.01)
    assertClose(regularizedGammaQ(0.5, 1), 0.15729920705028105); // SciPy 1.17.1 gammaincc(0.5, 1)
    assertClose(regularizedGammaQ(3, 2.5), 0.5438131158833297); // SciPy 1.17.1 gammaincc(3, 2.5)
    assertClose(regularizedGammaQ(10.5, 7), 0.8695992705258283); // SciPy 1.17.1 gammaincc(10.5, 7)
    assertClose(regularizedGammaQ(50, 60), 0.08440668109369177); // SciPy 1.17.1 gammaincc(50, 60)
    assertClose(regularizedGammaQ(500, 480), 0.8137180268096754); // SciPy 1.17.1 gammaincc(500, 480)
  });

  it("converges for a large shape: Q(5000, 5100) = 0.07932888107761896 to 1e-10", () => {
    // SciPy 1.17.1 gammaincc(5000, 5100); ln Γ(5000) ≈ 37,600 carries about 1e-11 absolute error into the exponent
    assertClose(regularizedGammaQ(5000, 5100), 0.07932888107761896, { relative: 1e-10 });
  });

  it("x = 0 gives 1, x = +∞ gives 0, NaN gives NaN", () => {
    expect(regularizedGammaQ(2, 0)).toBe(1);
    expect(regularizedGammaQ(2, Infinity)).toBe(0);
    expect(regularizedGammaQ(NaN, 1)).toBeNaN();
    expect(regularizedGammaQ(1, NaN)).toBeNaN();
  });

  it("a non-positive shape or a negative argument throws an error naming it", () => {
    expect(() => regularizedGammaQ(0, 1)).toThrow("invalid gamma shape: 0");
    expect(() => regularizedGammaQ(-1, 1)).toThrow("invalid gamma shape: -1");
    expect(() => regularizedGammaQ(1, -0.5)).toThrow("invalid gamma argument: -0.5");
  });

  it("lies in [0, 1] and does not increase with x", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.05, max: 200, noNaN: true }), fc.double({ min: 0, max: 400, noNaN: true }), fc.double({ min: 0, max: 400, noNaN: true }), (a, x, y) => {
        const [lo, hi] = x <= y ? [x, y] : [y, x];
        const q = regularizedGammaQ(a, lo);
        expect(q).toBeGreaterThanOrEqual(0);
        expect(q).toBeLessThanOrEqual(1);
        expect(regularizedGammaQ(a, hi)).toBeLessThanOrEqual(q + 1e-13); // the two branches meet at x = a + 1 to within rounding
      }),
    );
  });
});
