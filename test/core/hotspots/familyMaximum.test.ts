import { describe, expect, it } from "vitest";
import { buildCover, randomSource, shuffledOrder } from "../../../src/core/index.ts";
import { coverGeometry } from "../../../src/core/hotspots/coverGeometry.ts";
import { countGroups, familyMaximum, familyMaximumByCount, nodeSums } from "../../../src/core/hotspots/familyMaximum.ts";
import { flexibleFamily } from "../../../src/core/hotspots/flexibleFamily.ts";
import { landmarkNeighbours } from "../../../src/core/hotspots/landmarkNeighbours.ts";
import { nearestLandmarkNodes } from "../../../src/core/hotspots/nearestLandmarkNodes.ts";
import { regionScorer } from "../../../src/core/hotspots/regionScorer.ts";
import { syntheticTable } from "./synthetic.ts";

// Invented: 300 rows × 2 standard normal features, a skewed numeric outcome (an exponential draw, 0/1 by a threshold for bernoulli).
const table = syntheticTable(300, 2, 9, (_columns, random) => Float64Array.from({ length: 300 }, () => -Math.log(1 - random())));
const result = buildCover(table, { features: ["f1", "f2"], scale: "zscore", metric: "euclidean", radius: 0.5, landmarks: "greedy-file-order", seed: 1 });
const geometry = coverGeometry(table, result);
const nodeOf = nearestLandmarkNodes(geometry);
const outcome = table.columns[2]!.numbers;

describe("familyMaximumByCount, the fast path, equals the maximum over every region", () => {
  for (const maxNodes of [4, 9]) {
    const neighbours = landmarkNeighbours(geometry, maxNodes);
    const family = flexibleFamily({ neighbours, source: result.edges.source, target: result.edges.target }).family!;
    const nodeCounts = new Uint32Array(result.landmarks.length);
    for (const node of nodeOf) nodeCounts[node]!++;
    const counts = Uint32Array.from({ length: family.offsets.length - 1 }, (_, k) => family.nodes.subarray(family.offsets[k]!, family.offsets[k + 1]!).reduce((n, node) => n + nodeCounts[node]!, 0));
    for (const kind of ["bernoulli", "normal", "rank"] as const) {
      for (const direction of ["high", "low", "both"] as const) {
        it(`K = ${maxNodes}, ${kind}, ${direction}: the same maximum on 20 permutations of the outcome`, () => {
          const values = kind === "bernoulli" ? outcome.map((x) => (x > 1.5 ? 1 : 0)) : outcome;
          const scorer = regionScorer(kind, values, direction);
          const groups = countGroups(counts, neighbours);
          const random = randomSource(maxNodes);
          const sums = new Float64Array(result.landmarks.length);
          for (let r = 0; r < 20; ++r) {
            const order = shuffledOrder(values.length, random);
            const permuted = Float64Array.from(order, (i) => scorer.values[i]!);
            nodeSums(permuted, nodeOf, sums);
            const plain = familyMaximum(family, counts, sums, scorer.score);
            const fast = familyMaximumByCount(family, groups, sums, scorer.score);
            // the subset sums add the same numbers in another order: equal up to rounding for the normal score (common practice, no source)
            if (kind === "normal") expect(Math.abs(fast - plain)).toBeLessThanOrEqual(1e-9 * plain);
            else expect(fast).toBe(plain);
          }
        });
      }
    }
  }
});
