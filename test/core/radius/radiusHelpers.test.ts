import { describe, expect, it } from "vitest";
import { defaultRangeRule, euclidean, farthestFromFirst, logBisect, plateauMiddleRule, roundUpSignificant, type NumericTable } from "../../../src/core/index.ts";

const line = (...xs: number[]): NumericTable => Object.freeze({ rows: xs.length, columns: 1, names: ["x"], values: Float64Array.from(xs) });

describe("logBisect", () => {
  it("on [1, 16] with fits(r) = r ≥ 3 and 2 steps probes 4 then 2 and leaves the bracket [2, 4]", () => {
    const probed: number[] = [];
    const found = logBisect(1, 16, 2, (r) => (probed.push(r), r >= 3));
    expect(probed).toEqual([4, 2]); // worked by hand: √(1·16) = 4 fits, √(1·4) = 2 does not
    expect(found).toEqual({ lo: 2, hi: 4, last: 2, probes: 2 }); // worked by hand
  });

  it('stops at the probe that answers "found"', () => {
    expect(logBisect(1, 16, 30, (r) => (r === 4 ? "found" : true))).toEqual({ lo: 1, hi: 16, last: 4, probes: 1 }); // worked by hand
  });

  it("refuses a bracket that is empty, reversed or not positive", () => {
    expect(() => logBisect(0, 1, 3, () => true)).toThrow("invalid radius bracket: 0 to 1");
    expect(() => logBisect(2, 1, 3, () => true)).toThrow("invalid radius bracket: 2 to 1");
  });
});

describe("roundUpSignificant", () => {
  it("rounds 0.00028284 up to 0.000283 and 2.4601 up to 2.47 (3 digits)", () => {
    expect(roundUpSignificant(0.00028284, 3)).toBe(0.000283); // worked by hand
    expect(roundUpSignificant(2.4601, 3)).toBe(2.47); // worked by hand
  });

  it("refuses zero and NaN", () => {
    expect(() => roundUpSignificant(0, 3)).toThrow("invalid value to round: 0");
    expect(() => roundUpSignificant(NaN, 3)).toThrow("invalid value to round: NaN");
  });
});

describe("farthestFromFirst", () => {
  it("on the line 0, 1, 3 is 3", () => {
    expect(farthestFromFirst(line(0, 1, 3), euclidean)).toBe(3); // worked by hand
  });

  it("throws one message for one row, equal rows and no rows: fewer than two distinct rows", () => {
    expect(() => farthestFromFirst(line(5), euclidean)).toThrow("no radius separates these rows: fewer than two distinct rows (1 row used)");
    expect(() => farthestFromFirst(line(5, 5), euclidean)).toThrow("no radius separates these rows: fewer than two distinct rows (2 rows used)");
    expect(() => farthestFromFirst(line(), euclidean)).toThrow("no radius separates these rows: fewer than two distinct rows (0 rows used)");
  });
});

describe("rule texts under the sweep chart", () => {
  it("name the plateau middle and the current radius, in words without jargon (no 'greedy', 'ε', 'bisection' or 'suggest'), and end without a period", () => {
    expect(plateauMiddleRule.startsWith("the plateau middle is the radius")).toBe(true);
    expect(defaultRangeRule).toContain("widened to include the current radius");
    for (const text of [plateauMiddleRule, defaultRangeRule]) {
      expect(text).not.toMatch(/greedy|ε|bisection|suggest/i);
      expect(text.endsWith(".")).toBe(false);
    }
  });
});
