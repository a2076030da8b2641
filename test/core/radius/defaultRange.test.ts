// The default range rule (src/core/sweep/defaultRange.ts): the largest radius is where the greedy
// net in file order has at most 3 nodes, the smallest where it has at most
// T = min(2000, max(6, floor(m/5))) nodes; both found by halving and bisection, then rounded up.
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { buildCover, parseCsvText } from "../../../src/core/index.ts";
import { defaultRange } from "../../../src/core/radius/defaultRange.ts";
import { prepareRows } from "../../../src/core/search/prepareRows.ts";
import { radiusSweep } from "../../../src/core/sweep/radiusSweep.ts";
import { pointsTable } from "../sweep/support.ts";

const demo = parseCsvText(readFileSync(new URL("../../../public/demo/pump-fleet.csv", import.meta.url), "utf8"));
const demoFeatures = ["age_years", "flow_m3h", "head_m", "power_kw", "efficiency_pct", "vibration_mm_s", "bearing_temp_c", "starts_per_day", "runtime_h_per_day", "suction_pressure_kpa"];
const demoParams = { features: demoFeatures, scale: "zscore", metric: "euclidean", landmarks: "greedy-file-order", seed: 1 } as const;

const cloud = fc.array(fc.tuple(fc.integer({ min: -20, max: 20 }), fc.integer({ min: -20, max: 20 })), { minLength: 40, maxLength: 120 });

describe("default radius range", () => {
  it("on random point clouds the greedy file-order net has at most 3 nodes at the top and at most T at the bottom", () => {
    fc.assert(
      fc.property(cloud, fc.constantFrom("euclidean" as const, "manhattan" as const, "chebyshev" as const, "cosine" as const), (points, metric) => {
        const parsed = pointsTable(["x", "y"], points.map(([x, y]) => [x + 0.5, y])); // + 0.5: no zero row for cosine
        const params = { features: ["x", "y"], scale: "none", metric, landmarks: "greedy-file-order", seed: 1 } as const;
        let range;
        try {
          range = defaultRange(prepareRows(parsed, params));
        } catch (error) {
          expect((error as Error).message).toMatch(/distinct/); // too few distinct points for a range
          return;
        }
        expect(range.min).toBeLessThan(range.max);
        expect(buildCover(parsed, { ...params, radius: range.max }).landmarks.length).toBeLessThanOrEqual(3); // the rule
        expect(buildCover(parsed, { ...params, radius: range.min }).landmarks.length).toBeLessThanOrEqual(range.mostNodes); // the rule
        expect(range.mostNodes).toBeLessThanOrEqual(Math.max(6, Math.floor(points.length / 5))); // T, or fewer distinct points
      }),
      { numRuns: 60 },
    );
  });

  it("on the demo table (m < 10,000 complete rows) T is floor(m/5), and the ends hold at most T and at most 3 nodes", () => {
    const range = defaultRange(prepareRows(demo, demoParams));
    const bottom = buildCover(demo, { ...demoParams, radius: range.min });
    expect(range.mostNodes).toBe(Math.floor(bottom.usedRows.length / 5)); // the rule: min(2000, max(6, floor(m/5)))
    expect(bottom.landmarks.length).toBeLessThanOrEqual(range.mostNodes);
    expect(buildCover(demo, { ...demoParams, radius: range.max }).landmarks.length).toBeLessThanOrEqual(3);
  });

  it("rounds both ends of the demo's range up to 3 significant digits", () => {
    const { min, max } = defaultRange(prepareRows(demo, demoParams));
    for (const r of [min, max]) expect(Number(r.toPrecision(3))).toBe(r);
  });

  it("refuses rows that are all the same, and one row, with the default radius's message (fewer than two distinct rows)", () => {
    const params = { features: ["x"], scale: "none", metric: "euclidean", landmarks: "greedy-file-order", seed: 1 } as const;
    expect(() => radiusSweep(pointsTable(["x"], [[2], [2], [2]]), params)).toThrow("no radius separates these rows: fewer than two distinct rows (3 rows used)");
    expect(() => radiusSweep(pointsTable(["x"], [[2]]), params)).toThrow("no radius separates these rows: fewer than two distinct rows (1 row used)");
  });

  it("a current radius of 0.1 below the demo's range 0.206 … 5.48 moves the lower end to 0.1 (1950 landmarks there, within the cap of 2000)", () => {
    const prepared = prepareRows(demo, demoParams);
    expect(defaultRange(prepared, { current: 0.1 })).toEqual({ min: 0.1, max: 5.48, mostNodes: 469 }); // computed by this code at commit time: greedy net at 0.1 has 1950 landmarks
    expect(radiusSweep(demo, demoParams, { current: 0.1 }).range.min).toBe(0.1); // the sweep passes it on
  });

  it("a current radius of 0.08 whose graph has more than 2000 nodes leaves the demo's range as it is", () => {
    expect(defaultRange(prepareRows(demo, demoParams), { current: 0.08 })).toEqual({ min: 0.206, max: 5.48, mostNodes: 469 }); // computed by this code at commit time: 2220 landmarks at 0.08
  });

  it("a current radius above the range moves the upper end to it, and one inside changes nothing", () => {
    const prepared = prepareRows(demo, demoParams);
    expect(defaultRange(prepared, { current: 8 })).toEqual({ min: 0.206, max: 8, mostNodes: 469 }); // worked by hand: a larger radius has at most the top's nodes here
    expect(defaultRange(prepared, { current: 1 })).toEqual({ min: 0.206, max: 5.48, mostNodes: 469 }); // worked by hand: 1 lies inside
  });

  it("a sweep over the default range states the rule and spans it in 24 log-spaced radii", () => {
    const sweep = radiusSweep(demo, demoParams);
    const range = defaultRange(prepareRows(demo, demoParams));
    expect(sweep.range).toMatchObject({ min: range.min, max: range.max });
    expect(sweep.range.rule).toMatch(/at most 3 nodes/);
    expect(sweep.figures.radius.length).toBe(24); // issue 6 default
  });
});
