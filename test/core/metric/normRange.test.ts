// Defect: cosine and correlation divide by √(‖x‖² · ‖y‖²), computed as one product of squared
// norms. For rows that are not zero (cosine) or not constant (correlation), so not excluded by
// isUndefinedRow, that product underflows to 0 when ‖x‖·‖y‖ is below about 1.6e-162, loses digits
// as a subnormal below about 1.5e-154, and overflows to ∞ above about 1.3e154 (from memory: the
// smallest subnormal is 4.9e-324, the smallest normal double 2.2e-308 and the largest 1.8e308; the
// product is (‖x‖·‖y‖)²). The distance then comes out NaN (0/0 or ∞/∞), −∞ (x·y / 0) or inexact,
// so `within` is false between a row and itself (NaN) and can be true for rows at any angle (−∞).
// Such rows are reachable in a build with scale "none", or with a tiny weight such as 1e-90
// (weights only need to be finite and ≥ 0). Expected values are those of exact arithmetic.
import { describe, expect, it } from "vitest";
import { buildCover, correlation, cosine } from "../../../src/core/index.ts";
import { assertClose } from "../../assertClose.ts";
import { allLists } from "../support/bruteForce.ts";
import { parsedTable } from "../support/parsedTable.ts";
import { rowsOf } from "../support/metricVectors.ts";

describe("cosine and correlation on tiny or huge rows (known defect)", () => {
  it("in range, the same directions give the textbook values: d((1, 0), (1, 0)) = 0 and d((1, 0), (1, 1)) = 1 − 1/√2", () => {
    assertClose(cosine.distance(rowsOf([1, 0], [1, 1]), 2, 0, 0), 0, { absolute: 1e-15 }); // worked by hand
    assertClose(cosine.distance(rowsOf([1, 0], [1, 1]), 2, 0, 1), 1 - Math.SQRT1_2); // worked by hand
  });

  it("cosine d(x, x) = 0 for the nonzero row x = (1e-200, 0) (got NaN: ‖x‖⁴ underflows to 0)", () => {
    assertClose(cosine.distance(rowsOf([1e-200, 0]), 2, 0, 0), 0, { absolute: 1e-15 }); // worked by hand: same direction
  });

  it("cosine d(x, x) = 0 for x = (1e200, 1e200) (got NaN: ‖x‖⁴ overflows to ∞)", () => {
    assertClose(cosine.distance(rowsOf([1e200, 1e200]), 2, 0, 0), 0, { absolute: 1e-15 }); // worked by hand
  });

  it("cosine d((1e-200, 0), (1, 1)) = 1 − 1/√2 (got −∞: x·y = 1e-200 divided by 0)", () => {
    assertClose(cosine.distance(rowsOf([1e-200, 0], [1, 1]), 2, 0, 1), 1 - Math.SQRT1_2); // worked by hand: directions (1, 0) and (1, 1)
  });

  it("cosine d(x, x) for x = (1e-80, 1e-80) is 0 to 1e-15 (got −5.6e-6: ‖x‖⁴ = 4e-320 is subnormal and loses digits)", () => {
    assertClose(cosine.distance(rowsOf([1e-80, 1e-80]), 2, 0, 0), 0, { absolute: 1e-15 }); // worked by hand
  });

  it("correlation d(x, y) = 0 for x = y = (0, 1e-170) (got NaN)", () => {
    assertClose(correlation.distance(rowsOf([0, 1e-170], [0, 1e-170]), 2, 0, 1), 0, { absolute: 1e-15 }); // worked by hand: identical rows
  });

  it("buildCover, cosine, scale none, r = 0.2, rows (1e-200, 0), (1, 1), (1, 2): landmarks 0, 1 with balls {0} and {1, 2} (got one landmark whose ball {1, 2} leaves out the landmark itself)", () => {
    // Directions (1, 0), (1, 1), (1, 2): d(0, 1) = 1 − 1/√2 ≈ 0.293 > 0.2, d(0, 2) = 1 − 1/√5 ≈ 0.553 > 0.2,
    // d(1, 2) = 1 − 3/√10 ≈ 0.051 ≤ 0.2 (worked by hand). Greedy in file order: 0 is a landmark, 1 is
    // not within 0.2 of 0 → landmark, 2 is within 0.2 of 1 → covered.
    const parsed = parsedTable(["a", "b"], [[1e-200, 0], [1, 1], [1, 2]]);
    const result = buildCover(parsed, { features: ["a", "b"], scale: "none", metric: "cosine", radius: 0.2, landmarks: "greedy-file-order", seed: 1 });
    expect(Array.from(result.landmarks)).toEqual([0, 1]); // worked by hand
    expect(allLists(result.members)).toEqual([[0], [1, 2]]); // worked by hand
  });

  it("buildCover, cosine, z-scored then weighted 1e-90: the same 5 singleton balls as with weight 1 (got 2 balls {0, 1}, {2, 3, 4}: ‖x‖²‖y‖² underflows to 0, so distances come out ±∞)", () => {
    // Cosine distance ignores a common positive factor, so a weight of 1e-90 on every feature
    // should not change the graph (worked by hand: x·y / (‖x‖‖y‖) is invariant under x, y ← c·x, c·y).
    // Unweighted: both columns have mean 1.4 and the same sd, so the cosines are those of the
    // deviations ×5: (−7, −2), (−2, −7), (3, 3), (8, −2), (−2, 8). The largest cosines are
    // 28/53 ≈ 0.528 (rows 0, 1) and 18/√1224 ≈ 0.514 (rows 2, 3 and 2, 4); all others are ≤ 0,
    // so every pair is more than 0.3 apart and each row is its own ball (worked by hand).
    const parsed = parsedTable(["a", "b"], [[0, 1], [1, 0], [2, 2], [3, 1], [1, 3]]);
    const base = { features: ["a", "b"], scale: "zscore", metric: "cosine", radius: 0.3, landmarks: "greedy-file-order", seed: 1 } as const;
    const plain = buildCover(parsed, base);
    const tiny = buildCover(parsed, { ...base, weights: { a: 1e-90, b: 1e-90 } });
    expect(allLists(plain.members)).toEqual([[0], [1], [2], [3], [4]]); // worked by hand, see above
    expect(allLists(tiny.members)).toEqual(allLists(plain.members));
  });
});
