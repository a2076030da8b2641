import { describe, expect, it } from "vitest";
import { buildCover, Cancelled, isCancelled } from "../../../src/core/index.ts";
import { kdTree } from "../../../src/core/search/kdTree.ts";
import { radiusSweep } from "../../../src/core/sweep/radiusSweep.ts";
import { seedStability } from "../../../src/core/stability/seedStability.ts";
import { pointsTable } from "./support.ts";

const grid = pointsTable(["x", "y"], Array.from({ length: 400 }, (_, i) => [i % 20, Math.floor(i / 20)]));
const params = { features: ["x", "y"], scale: "none", metric: "euclidean", landmarks: "greedy-file-order", seed: 1 } as const;

describe("progress and cancellation", () => {
  it("progress fractions never decrease, stay in [0, 1] and end at 1", () => {
    for (const metric of ["euclidean", "cosine"] as const) {
      const seen: number[] = [];
      radiusSweep(pointsTable(["x", "y"], Array.from({ length: 300 }, (_, i) => [1 + (i % 17), 1 + (i % 13)])), { ...params, metric }, { onProgress: (f) => seen.push(f) });
      expect(seen.every((f, i) => f >= 0 && f <= 1 && (i === 0 || f >= seen[i - 1]!))).toBe(true);
      expect(seen.at(-1)).toBe(1);
    }
  });

  it("shouldStop answering true stops the sweep with core's Cancelled error, recognised by isCancelled", () => {
    let calls = 0;
    const run = (): unknown => radiusSweep(grid, params, { shouldStop: () => ++calls > 3 });
    expect(run).toThrow(Cancelled);
    expect(run).toThrow("the sweep was cancelled");
    let caught: unknown = null;
    try {
      radiusSweep(grid, params, { shouldStop: () => true });
    } catch (error) {
      caught = error;
    }
    expect(isCancelled(caught)).toBe(true);
  });

  it("seed stability stops the same way", () => {
    expect(() => seedStability(grid, { ...params, radius: 2 }, { shouldStop: () => true })).toThrow("the seed stability run was cancelled");
  });
});

describe("cancellation while the index is built", () => {
  // 40,000 rows: the k-d tree has thousands of nodes, so its builder offers many chances to stop
  const big = pointsTable(["x", "y"], Array.from({ length: 40_000 }, (_, i) => [i % 200, Math.floor(i / 200)]));
  it("kdTree calls onStep once per 2^16 rows split, and a throw from it stops buildCover, the sweep and seed stability in the tree build", () => {
    let steps = 0;
    kdTree(Float64Array.from({ length: 40_000 }, (_, i) => i), 1, 40_000, 32, { onStep: () => steps++ });
    // worked by hand: 40,000 rows are split on each of the 11 levels above the leaves (40,000 / 2^10 ≈ 39 > 32), 440,000 rows in all
    expect(steps).toBe(Math.floor((40_000 * 11) / 65_536));
    // scale "none": the build asks once before the tree (after preparing the rows) and then inside it
    let asks = 0;
    let phase = "";
    const build = (): unknown => buildCover(big, { ...params, radius: 3 }, { onPhase: (p) => (phase = p), shouldStop: () => ++asks > 1 });
    expect(build).toThrow("the build was cancelled");
    expect([asks, phase]).toEqual([2, "landmarks"]);
    // z-scoring asks between its two columns, before the tree
    asks = 0;
    const scaled = (): unknown => buildCover(big, { ...params, scale: "zscore", radius: 3 }, { onPhase: (p) => (phase = p), shouldStop: () => ++asks > 1 });
    expect(scaled).toThrow("the build was cancelled");
    expect([asks, phase]).toEqual([2, "scale"]);
    let asked = 0;
    expect(() => radiusSweep(big, params, { shouldStop: () => ++asked > 1 })).toThrow("the sweep was cancelled");
    expect(asked).toBe(2); // once before the tree, once inside it
    asked = 0;
    expect(() => seedStability(big, { ...params, radius: 2 }, { shouldStop: () => ++asked > 1 })).toThrow("the seed stability run was cancelled");
    expect(asked).toBe(2);
  });
});
