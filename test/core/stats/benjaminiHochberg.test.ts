import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { benjaminiHochberg } from "../../../src/core/stats/benjaminiHochberg.ts";
import { assertClose } from "../../assertClose.ts";

// The 15 p-values of the worked example in Benjamini & Hochberg, J. R. Stat. Soc. B 57:289, 1995, §4 (already ascending).
const paperExample = Object.freeze([0.0001, 0.0004, 0.0019, 0.0095, 0.0201, 0.0278, 0.0298, 0.0344, 0.0459, 0.324, 0.4262, 0.5719, 0.6528, 0.759, 1]);

const pValues = fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 1, maxLength: 30 });

describe("benjaminiHochberg", () => {
  it("0.01, 0.04, 0.03 adjust to 0.03, 0.04, 0.04 (the JSDoc example)", () => {
    assertClose(benjaminiHochberg([0.01, 0.04, 0.03]), [0.03, 0.04, 0.04]); // worked by hand: ranks 1, 3, 2; 3·0.01/1, 3·0.04/3, min(3·0.03/2, 0.04)
  });

  it("the paper's example at q = 0.05 rejects exactly the first four hypotheses", () => {
    const rejected = Array.from(benjaminiHochberg(paperExample), (p) => p <= 0.05);
    expect(rejected).toEqual([true, true, true, true, false, false, false, false, false, false, false, false, false, false, false]); // Benjamini & Hochberg 1995, §4
  });

  it("the paper's example adjusts to min over k ≥ i of 15·p_(k)/k, as p.adjust(p, \"BH\") defines it", () => {
    // worked by hand from the formula: 15p/k per rank, then the running minimum from rank 15 down
    const expected = [
      (15 * 0.0001) / 1, // 0.0015
      (15 * 0.0004) / 2, // 0.003
      (15 * 0.0019) / 3, // 0.0095
      (15 * 0.0095) / 4, // 0.035625
      (15 * 0.0201) / 5, // 0.0603 (below 0.0638… from rank 7)
      (15 * 0.0298) / 7, // 0.0638571…: rank 6 gives 0.0695, the running minimum takes rank 7
      (15 * 0.0298) / 7, // 0.0638571…
      (15 * 0.0344) / 8, // 0.0645
      (15 * 0.0459) / 9, // 0.0765
      (15 * 0.324) / 10, // 0.486
      (15 * 0.4262) / 11, // 0.5811818…
      (15 * 0.5719) / 12, // 0.714875
      (15 * 0.6528) / 13, // 0.7532307…
      (15 * 0.759) / 14, // 0.8132142…
      1, // 15 · 1 / 15
    ];
    assertClose(benjaminiHochberg(paperExample), expected);
  });

  it("results come back in input order: the reversed example gives the reversed adjustment", () => {
    const reversed = [...paperExample].reverse();
    assertClose(benjaminiHochberg(reversed), Array.from(benjaminiHochberg(paperExample)).reverse()); // same formula, permuted
  });

  it("tied p-values get one adjusted value: 0.02, 0.5, 0.02 adjust to 0.03, 0.5, 0.03", () => {
    assertClose(benjaminiHochberg([0.02, 0.5, 0.02]), [0.03, 0.5, 0.03]); // worked by hand: 3·0.02/2 = 0.03 for both ranks 1 and 2
  });

  it("NaN stays NaN and is not counted: 0.01, NaN, 0.04 adjust to 0.02, NaN, 0.04 (m = 2)", () => {
    assertClose(benjaminiHochberg([0.01, NaN, 0.04]), [0.02, NaN, 0.04]); // worked by hand: 2·0.01/1, 2·0.04/2
  });

  it("one p-value is its own adjustment; an empty list gives an empty array", () => {
    assertClose(benjaminiHochberg([0.37]), [0.37]); // worked by hand: m = 1
    expect(benjaminiHochberg([])).toEqual(new Float64Array(0));
  });

  it("the largest p-value is its own adjustment exactly, with no rounding below it: 0.1, 0.2, 0.7 give 0.7 last", () => {
    // worked by hand: 3 · 0.7 / 3 rounds to 0.6999999999999998 in double precision, below the raw p; (3 / 3) · 0.7 does not
    expect(benjaminiHochberg([0.1, 0.2, 0.7])[2]).toBe(0.7);
  });

  it("a p-value outside [0, 1] throws an error naming it", () => {
    expect(() => benjaminiHochberg([0.2, 1.5])).toThrow("invalid p-value: 1.5");
    expect(() => benjaminiHochberg([-0.1])).toThrow("invalid p-value: -0.1");
  });

  it("the input is not modified", () => {
    const p = Float64Array.of(0.3, 0.1, 0.2);
    benjaminiHochberg(p);
    expect(Array.from(p)).toEqual([0.3, 0.1, 0.2]);
  });

  it("adjusted p ≥ raw p, adjusted p ≤ 1, and the adjustment is monotone in the raw p", () => {
    fc.assert(
      fc.property(pValues, (p) => {
        const adjusted = benjaminiHochberg(p);
        for (let a = 0; a < p.length; ++a) {
          expect(adjusted[a]).toBeGreaterThanOrEqual(p[a]!);
          expect(adjusted[a]).toBeLessThanOrEqual(1);
          for (let b = 0; b < p.length; ++b) if (p[a]! <= p[b]!) expect(adjusted[a]).toBeLessThanOrEqual(adjusted[b]!);
        }
      }),
    );
  });

  it("equals the direct formula min over k ≥ rank of min(1, m·p_(k)/k) on random lists with ties", () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 0, max: 20 }).map((k) => k / 20), { minLength: 1, maxLength: 25 }), (p) => {
        const m = p.length;
        const sorted = [...p].sort((a, b) => a - b);
        const direct = p.map((value) => {
          const rank = sorted.lastIndexOf(value) + 1; // ties: the largest rank of the run gives the smallest m·p/k
          let best = 1;
          for (let k = rank; k <= m; ++k) best = Math.min(best, (m * sorted[k - 1]!) / k);
          return best;
        });
        assertClose(benjaminiHochberg(p), direct); // the formula of Benjamini & Hochberg 1995, written out
      }),
    );
  });
});
