import { describe, expect, it } from "vitest";
import { bootstrapDifference } from "../../../src/core/hotspots/bootstrapDifference.ts";
import { disjointBest } from "../../../src/core/hotspots/disjointBest.ts";
import { countGroups, familyMaximum, familyMaximumByCount, nodeSums } from "../../../src/core/hotspots/familyMaximum.ts";
import { adjacencySets } from "../../../src/core/hotspots/adjacencySets.ts";
import { greedyGrowth } from "../../../src/core/hotspots/greedyGrowth.ts";
import { monteCarloP, permutationMaxima } from "../../../src/core/hotspots/permutationMaxima.ts";
import { jaccardRows, randomSource } from "../../../src/core/index.ts";
import { assertClose } from "../../assertClose.ts";

describe("Monte Carlo p-value", () => {
  it("observed 2 against maxima 1, 3, 2 gives (1 + 2)/(1 + 3) = 0.75", () => {
    expect(monteCarloP(2, Float64Array.of(1, 3, 2))).toBe(0.75); // worked by hand: 3 and 2 are ≥ 2
  });

  it("is never 0: above every replicate it is 1/(R + 1), its smallest value", () => {
    expect(monteCarloP(100, new Float64Array(999).fill(1))).toBe(1 / 1000); // worked by hand: (1 + 0)/(1 + 999)
    expect(monteCarloP(100, new Float64Array(0))).toBe(1); // worked by hand: no replicates, (1 + 0)/(1 + 0)
  });

  it("a zero observed score gets p = 1", () => {
    expect(monteCarloP(0, Float64Array.of(0, 0))).toBe(1); // worked by hand: nothing was found
  });

  it("counts a replicate equal to the observed score up to summation order as ≥", () => {
    expect(monteCarloP(0.1 + 0.2, Float64Array.of(0.3))).toBe(1); // worked by hand: 0.30000000000000004 vs 0.3, within 1e-10 relative
  });
});

describe("permutation maxima", () => {
  it("gives R maxima, each the maximum for a permutation of the values, reproducible from the seed", () => {
    const values = Float64Array.of(1, 0);
    const a = permutationMaxima(values, 3, randomSource(5), (v) => v[0]!);
    expect(a.length).toBe(3);
    expect(Array.from(a).every((x) => x === 0 || x === 1)).toBe(true); // worked by hand: the first of a permutation of 1, 0
    expect(permutationMaxima(values, 3, randomSource(5), (v) => v[0]!)).toEqual(a);
    expect(Array.from(values)).toEqual([1, 0]); // the values are not shuffled in place
  });
});

describe("region sums and selection", () => {
  it("familyMaximum of {0}, {0, 1} with node sums 1, 2 and counts 1, 3 under s/n is 1 (the JSDoc example)", () => {
    const family = { offsets: Uint32Array.of(0, 1, 3), nodes: Uint32Array.of(0, 0, 1) };
    const scores = new Float64Array(2);
    expect(familyMaximum(family, Uint32Array.of(1, 3), Float64Array.of(1, 2), (n, s) => s / n, scores)).toBe(1); // worked by hand: 1/1 and 3/3
    assertClose(scores, [1, 1]); // worked by hand
  });

  it("familyMaximumByCount of the same regions is 1 too (the JSDoc example)", () => {
    const family = { offsets: Uint32Array.of(0, 1, 3), nodes: Uint32Array.of(0, 0, 1) };
    expect(familyMaximumByCount(family, countGroups(Uint32Array.of(1, 3)), Float64Array.of(1, 2), (n, s) => s / n)).toBe(1); // worked by hand: 1/1 and 3/3
  });

  it("nodeSums adds each row's value to its node", () => {
    assertClose(nodeSums(Float64Array.of(1, 2, 4), Uint32Array.of(1, 0, 1), new Float64Array(2)), [2, 5]); // worked by hand
  });

  it("disjointBest keeps [0, 2] of regions [0, 1], [1], [2] scored 3, 2, 1 (the JSDoc example)", () => {
    const sets = [[0, 1], [1], [2]];
    expect(disjointBest((k) => sets[k]!, Float64Array.of(3, 2, 1), 3, 10)).toEqual([0, 2]); // worked by hand: [1] shares node 1 with the best
  });

  it("greedy growth on the path 0–1–2 with sums 0, 1, 1, one row each, cap 2 and score s reaches 2 (the JSDoc example)", () => {
    const graph = { neighbours: [Uint32Array.of(1, 2), Uint32Array.of(0, 2), Uint32Array.of(1, 0)], source: Uint32Array.of(0, 1), target: Uint32Array.of(1, 2) };
    const best = greedyGrowth({ graph, adjacent: adjacencySets(graph), nodeCounts: Uint32Array.of(1, 1, 1), nodeSums: Float64Array.of(0, 1, 1), cap: 2, score: (_n, s) => s });
    expect(best).toBe(2); // worked by hand: from node 1 (or 2), add the other: {1, 2} sums to 2; three nodes pass the cap
  });
});

describe("effect size and overlap", () => {
  it("bootstrap of 1, 1 against 0, 0 has difference 1 and interval [1, 1] (the JSDoc example)", () => {
    const effect = bootstrapDifference([1, 1], [0, 0], 2000, randomSource(1));
    expect(effect).toEqual({ inside: 1, outside: 0, difference: 1, low: 1, high: 1 }); // worked by hand: no spread on either side
  });

  it("the bootstrap interval holds the difference for 0/1 samples and is reproducible from its seed", () => {
    const inside = [1, 1, 0, 1, 0, 1, 1, 0, 1, 1];
    const outside = [0, 0, 1, 0, 0, 0, 0, 1, 0, 0];
    const a = bootstrapDifference(inside, outside, 2000, randomSource(2));
    assertClose(a.difference, 0.5); // worked by hand: 7/10 − 2/10
    expect(a.low < 0.5 && a.high > 0.5).toBe(true);
    expect(bootstrapDifference(inside, outside, 2000, randomSource(2))).toEqual(a);
  });

  it("an empty side gives NaN", () => {
    expect(bootstrapDifference([], [1], 10, randomSource(1)).difference).toBeNaN(); // worked by hand: no mean
  });

  it("Jaccard of 1, 2, 3 and 2, 3, 4 is 2/4 = 0.5; two empty lists give 0", () => {
    expect(jaccardRows(Uint32Array.of(1, 2, 3), Uint32Array.of(2, 3, 4))).toBe(0.5); // worked by hand
    expect(jaccardRows([], [])).toBe(0); // worked by hand: the rule for no rows
  });
});
