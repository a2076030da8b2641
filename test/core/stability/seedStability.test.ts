import { describe, expect, it } from "vitest";
import { buildCover, randomSource, rowsToNodes, type CompressedLists } from "../../../src/core/index.ts";
import { coMemberPairs } from "../../../src/core/stability/coMemberPairs.ts";
import { seedStability } from "../../../src/core/stability/seedStability.ts";
import { pointsTable } from "../sweep/support.ts";

// Three tight clusters of 30 rows: offsets in a 0.2 × 0.2 square (diameter ≤ 0.2√2 < r = 0.3)
// around centres 0, 10 and 20 on the x axis, more than 2r apart. Any landmark's ball then holds
// exactly its whole cluster, so every seed gives the same three balls (worked by hand).
const cluster = (cx: number) => Array.from({ length: 30 }, (_, i) => [cx + 0.2 * ((i * 7) % 11) / 10, 0.2 * ((i * 5) % 13) / 12]);
const tight = pointsTable(["x", "y"], [...cluster(0), ...cluster(10), ...cluster(20)]);
const tightParams = { features: ["x", "y"], scale: "none", metric: "euclidean", landmarks: "greedy-file-order", seed: 4, radius: 0.3 } as const;

// A noisy ring of 200 rows with one row missing y (row 7): builds vary with the seed.
const ring = pointsTable(["x", "y"], Array.from({ length: 200 }, (_, i) => {
  const a = (2 * Math.PI * i) / 200;
  const wobble = 0.15 * Math.sin(17 * i);
  return [(1 + wobble) * Math.cos(a), i === 7 ? NaN : (1 + wobble) * Math.sin(a)];
}));
const ringParams = { features: ["x", "y"], scale: "none", metric: "euclidean", landmarks: "greedy-shuffled", seed: 11, radius: 0.25 } as const;

describe("seed stability", () => {
  it("co-membership agreement is 1 when each cluster's diameter is at most r and clusters lie more than 2r apart", () => {
    const s = seedStability(tight, tightParams);
    expect(s.agreement).toBe(1); // worked by hand, see above
    expect(s.spread.nodes).toEqual({ min: 3, median: 3, max: 3 }); // one node per cluster
    expect(s.pairs).toEqual({ sampled: false, perBuild: 3 * 435 }); // C(30, 2) = 435 pairs per cluster, all listed
  });

  it("is reproducible from its seeds: the same call gives the same result, and build s equals buildCover with seed + s", () => {
    const options = { seeds: 4, selection: [0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12], pairSample: 300 };
    const a = seedStability(ring, ringParams, options);
    expect(seedStability(ring, ringParams, options)).toEqual(a);
    expect(Array.from(a.seeds)).toEqual([11, 12, 13, 14]);
    a.seeds.forEach((seed, s) => {
      const b = buildCover(ring, { ...ringParams, seed });
      expect([a.nodes[s], a.edges[s], a.b0[s], a.b1[s]]).toEqual([b.landmarks.length, b.edges.source.length, b.componentCount, b.betti!.b1]);
    });
    expect(a.pairs).toEqual({ sampled: true, perBuild: 300 });
    expect(a.agreement).toBeGreaterThan(0);
    expect(a.agreement).toBeLessThanOrEqual(1);
  });

  it("spread is min, type-7 median and max over the builds", () => {
    const s = seedStability(ring, ringParams, { seeds: 4 });
    const sorted = [...s.nodes].sort((x, y) => x - y);
    expect(s.spread.nodes).toEqual({ min: sorted[0], median: (sorted[1]! + sorted[2]!) / 2, max: sorted[3] }); // type 7 with n = 4: halfway between the 2nd and 3rd
  });

  it("a row's region share is the share of builds whose matched region holds it; rows not used are NaN", () => {
    const s = seedStability(ring, ringParams, { seeds: 5, selection: Array.from({ length: 20 }, (_, i) => i) });
    const share = s.regionShare!;
    expect(share.length).toBe(200);
    expect(share[7]).toBeNaN(); // row 7 has a missing y and is left out
    for (const [i, v] of share.entries()) if (i !== 7) expect(Number.isInteger(v * 5)).toBe(true); // a count of 5 builds
    for (let i = 0; i < 20; ++i) if (i !== 7) expect(share[i]).toBeGreaterThan(0); // selected rows lie in some region
    expect(seedStability(ring, ringParams, { seeds: 2 }).regionShare).toBeNull();
  });

  it("rejects fewer than two seeds and a bad radius, naming the value", () => {
    expect(() => seedStability(ring, ringParams, { seeds: 1 })).toThrow("invalid seed count: 1");
    expect(() => seedStability(ring, { ...ringParams, radius: -1 })).toThrow("invalid radius: -1");
  });
});

describe("row pairs sharing a node", () => {
  const balls = (groups: number[][], rows: number): { members: CompressedLists; rowNodes: CompressedLists } => {
    const members = { offsets: Uint32Array.from([0, ...groups.map((g) => g.length)].map((_, i, all) => all.slice(0, i + 1).reduce((a, b) => a + b, 0))), items: Uint32Array.from(groups.flat()) };
    return { members, rowNodes: rowsToNodes(members, rows) };
  };

  it("balls {0, 1, 2} and {2, 3} hold the pairs 0–1, 0–2, 1–2, 2–3, each listed once", () => {
    const { members, rowNodes } = balls([[0, 1, 2], [2, 3]], 4);
    const pairs = coMemberPairs(members, rowNodes, 100, randomSource(1));
    expect([Array.from(pairs.first), Array.from(pairs.second), pairs.sampled]).toEqual([[0, 0, 1, 2], [1, 2, 2, 3], false]); // worked by hand
  });

  it("a pair in two balls is listed once, and sampled pairs share a node and are reproducible from the seed", () => {
    const groups = [[0, 1, 2, 3], [0, 1, 4], [4, 5, 6, 7, 8]];
    const { members, rowNodes } = balls(groups, 9);
    expect(coMemberPairs(members, rowNodes, 100, randomSource(1)).first.length).toBe(6 + 2 + 10); // C(4,2) + (3 pairs of {0,1,4} minus 0–1 counted) + C(5,2), worked by hand
    const a = coMemberPairs(members, rowNodes, 5, randomSource(9));
    expect(a.sampled).toBe(true);
    expect(a).toEqual(coMemberPairs(members, rowNodes, 5, randomSource(9)));
    a.first.forEach((x, p) => expect(groups.some((g) => g.includes(x) && g.includes(a.second[p]!))).toBe(true));
  });
});
