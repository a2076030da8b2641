// N evenly spaced points on the unit circle, point k at angle 2πk/N (N even, ≥ 6), unscaled,
// greedy net in file order. With c(m) = 2 sin(πm/N) the chord between points m steps apart:
// for c(1) ≤ r < c(2) the landmarks are the even points, node k's ball is {2k − 1, 2k, 2k + 1}
// (mod N), neighbouring balls share exactly the odd point between them and no row lies in three
// balls (worked by hand in test/core/graph/circle.test.ts). So the nerve is a cycle of N/2 nodes
// with no triangle: b0 = 1 and b1 = E − V + b0 − 0 = N/2 − N/2 + 1 = 1 on the whole interval.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { logSpacedRadii } from "../../../src/core/sweep/logSpacedRadii.ts";
import { radiusSweep } from "../../../src/core/sweep/radiusSweep.ts";
import { pointsTable } from "./support.ts";

const chord = (m: number, n: number): number => 2 * Math.sin((Math.PI * m) / n); // isosceles triangle with apex angle 2πm/N
const circle = (n: number) => pointsTable(["x", "y"], Array.from({ length: n }, (_, k) => [Math.cos((2 * Math.PI * k) / n), Math.sin((2 * Math.PI * k) / n)]));
const params = { features: ["x", "y"], scale: "none", metric: "euclidean", landmarks: "greedy-file-order", seed: 1 } as const;
const radii = logSpacedRadii(0.05, 3, 24); // step ratio 60^(1/23) ≈ 1.195 < c(2)/c(1) = 2 cos(π/N) ≥ √3, so the interval holds a radius

describe("evenly spaced points on a circle", () => {
  it("every sweep radius in [c(1), c(2)) has b0 = 1 and b1 = 1, and one plateau with b0 = 1, b1 = 1 covers them all", () => {
    fc.assert(
      fc.property(fc.integer({ min: 3, max: 30 }).map((half) => 2 * half), (n) => {
        const [low, high] = [chord(1, n), chord(2, n)];
        // far from both ends, so that no rounding of a computed chord can move a decision
        for (const r of radii) fc.pre(Math.abs(r - low) > 1e-9 * low && Math.abs(r - high) > 1e-9 * high);
        const inside = Array.from(radii.keys()).filter((k) => radii[k]! >= low && radii[k]! < high);
        expect(inside.length).toBeGreaterThan(0);
        const sweep = radiusSweep(circle(n), params, { radii });
        for (const k of inside) {
          expect(sweep.figures.b0[k]).toBe(1); // worked by hand, see above
          expect(sweep.figures.b1[k]).toBe(1); // worked by hand
          expect(sweep.figures.nodes[k]).toBe(n / 2); // worked by hand: the even points
        }
        const plateau = sweep.plateaus.find((p) => p.first <= inside[0]! && p.last >= inside[inside.length - 1]!);
        expect(plateau).toMatchObject({ b0: 1, b1: 1 });
      }),
      { numRuns: 28 },
    );
  });

  it("for N = 24 the interval [0.2611, 0.5176) holds the sweep radii 4 of the 24 from 0.05 to 3, all on one (b0, b1) = (1, 1) plateau", () => {
    const sweep = radiusSweep(circle(24), params, { radii });
    const inside = Array.from(radii.keys()).filter((k) => radii[k]! >= chord(1, 24) && radii[k]! < chord(2, 24));
    expect(inside).toEqual([10, 11, 12, 13]); // 0.05 · 60^(k/23): k = 9 gives 0.2482 < c(1) = 0.2611, k = 10..13 give 0.2965 … 0.5058, k = 14 gives 0.6044 > c(2) = 0.5176 (hand computation)
    const plateau = sweep.plateaus.find((p) => p.first <= 10 && p.last >= 13)!;
    expect([plateau.b0, plateau.b1]).toEqual([1, 1]); // worked by hand, see above
  });
});
