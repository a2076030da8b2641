import { describe, expect, it } from "vitest";
import { createRowIndex, landmarkBalls, chebyshev, euclidean, manhattan, randomSource, type NumericTable } from "../../../src/core/index.ts";
import { maximinNet } from "../support/nets.ts";

const line = (...xs: number[]): NumericTable => Object.freeze({ rows: xs.length, columns: 1, names: ["x"], values: Float64Array.from(xs) });

describe("maximinNet by hand", () => {
  it("0, 1, 2, 3, 4 with r = 1 from row 0 gives rows 0, 4, 2 (the JSDoc example)", () => {
    // Row 0 covers 0 and 1 (a tie at d = 1). Farthest uncovered: row 4 at 4 → landmark; it covers 3, 4.
    // Row 2 is left, nearest landmark 2 away → landmark. All covered.
    expect(Array.from(maximinNet(line(0, 1, 2, 3, 4), euclidean, 1, 0))).toEqual([0, 4, 2]); // worked by hand
  });

  it("a tie for farthest goes to the lowest row: 0..4 with r = 1 from row 2 gives 2, 0, 4", () => {
    // Row 2 covers 1, 2, 3; rows 0 and 4 are both 2 away → row 0 first, then row 4.
    expect(Array.from(maximinNet(line(0, 1, 2, 3, 4), euclidean, 1, 2))).toEqual([2, 0, 4]); // worked by hand
  });

  it("the next landmark is the farthest from its nearest landmark, not from the start: 0, 10, 4, 7 with r = 1 from row 0 gives 0, 1, 2, 3", () => {
    // After row 0 (x = 0): farthest is row 1 (x = 10). Nearest landmarks then: x = 4 → min(4, 6) = 4,
    // x = 7 → min(7, 3) = 3, so row 2 (x = 4) comes next, although x = 7 is farther from the start.
    // Then x = 7 is 3 from its nearest landmark (> r) → row 3.
    expect(Array.from(maximinNet(line(0, 10, 4, 7), euclidean, 1, 0))).toEqual([0, 1, 2, 3]); // worked by hand
  });

  it("ranks by the metric's distance: (0, 0), (3, 0), (2, 2) from row 0, r = 1, is 0, 2, 1 under manhattan and 0, 1, 2 under chebyshev", () => {
    // Manhattan from (0, 0): 3 and 4 → (2, 2) first. Chebyshev: 3 and 2 → (3, 0) first.
    const t: NumericTable = { rows: 3, columns: 2, names: ["x", "y"], values: Float64Array.of(0, 0, 3, 0, 2, 2) };
    expect(Array.from(maximinNet(t, manhattan, 1, 0))).toEqual([0, 2, 1]); // worked by hand
    expect(Array.from(maximinNet(t, chebyshev, 1, 0))).toEqual([0, 1, 2]); // worked by hand
  });

  it("an empty table gives no landmarks under the maximin rule", () => {
    expect(landmarkBalls(createRowIndex(line(), euclidean), 1, "maximin", 3).landmarks.length).toBe(0); // worked by hand
  });

  it("landmarkBalls with maximin and seed 1 on 10 rows starts at floor(10 · 0.09156953264027834) = 0", () => {
    expect(randomSource(1)()).toBe(0.09156953264027834); // pinned in test/core/random.test.ts
    expect(landmarkBalls(createRowIndex(line(0, 1, 2, 3, 4, 5, 6, 7, 8, 9), euclidean), 2, "maximin", 1).landmarks[0]).toBe(0); // worked by hand
  });
});
