import { describe, expect, it } from "vitest";
import { Cancelled, isCancelled } from "../../../src/core/index.ts";
import { radiusSweep } from "../../../src/core/sweep/radiusSweep.ts";
import { seedStability } from "../../../src/core/stability/seedStability.ts";
import { pointsTable } from "./support.ts";

const grid = pointsTable(["x", "y"], Array.from({ length: 400 }, (_, i) => [i % 20, Math.floor(i / 20)]));
const params = { features: ["x", "y"], scale: "none", metric: "euclidean", landmarks: "greedy", seed: 1 } as const;

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
