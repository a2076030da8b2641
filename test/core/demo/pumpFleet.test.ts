import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { buildCover } from "../../../src/core/cover/buildCover.ts";
import { defaultRadius } from "../../../src/core/radius/defaultRadius.ts";
import {
  generatePumpFleet, pumpDistricts, pumpFamilies, pumpFleetColumns, pumpFleetFeatures,
} from "../../../src/core/demo/pumpFleet.ts";
import { quantileSorted } from "../../../src/core/stats/quantileSorted.ts";
import { parseCsvText } from "../../../src/core/table/parseCsvText.ts";
import type { TableColumn } from "../../../src/core/table/types.ts";

// Provenance: every table in this file comes from our own generator (src/core/demo/pumpFleet.ts,
// seed 1 unless stated); the expected shapes are the ones it was designed to have. No real fleet data.
const text = generatePumpFleet();
const parsed = parseCsvText(text);
const column = (name: string): TableColumn => parsed.columns.find((c) => c.name === name)!;

describe("generatePumpFleet", () => {
  it("the committed public/demo/pump-fleet.csv equals generatePumpFleet() byte for byte", () => {
    const committed = readFileSync(new URL("../../../public/demo/pump-fleet.csv", import.meta.url));
    const generated = Buffer.from(text, "utf8");
    expect(committed.length).toBe(generated.length);
    expect(committed.equals(generated)).toBe(true);
  });

  it("the first record for seed 1 is the one in the JSDoc example", () => {
    expect(text.split("\n")[1]).toBe("P-00001,Heronmarsh,booster,6.1,254.6,69.3,60.32,79.7,2.19,46.7,8.4,22.1,289.3,0,2.5");
  });

  it("one seed gives the same text twice and another seed a different text", () => {
    expect(generatePumpFleet({ seed: 7, pumps: 50 })).toBe(generatePumpFleet({ seed: 7, pumps: 50 }));
    expect(generatePumpFleet({ seed: 8, pumps: 50 })).not.toBe(generatePumpFleet({ seed: 7, pumps: 50 }));
  });

  it("3 pumps give the header, 3 records and a trailing newline", () => {
    const lines = generatePumpFleet({ pumps: 3 }).split("\n");
    expect(lines).toHaveLength(5);
    expect(lines[0]).toBe(pumpFleetColumns.join(","));
    expect(lines[3]!.startsWith("P-00003,")).toBe(true);
    expect(lines[4]).toBe("");
  });

  it("a pump count that is not a positive integer throws `invalid pump count: <value>`", () => {
    expect(() => generatePumpFleet({ pumps: 0 })).toThrow("invalid pump count: 0");
    expect(() => generatePumpFleet({ pumps: 2.5 })).toThrow("invalid pump count: 2.5");
  });
});

describe("the demo table", () => {
  it("has the 15 stated columns in order and 2,400 rows, with id, district and family as text", () => {
    expect(parsed.columns.map((c) => c.name)).toEqual([...pumpFleetColumns]);
    expect(parsed.rows).toBe(2400);
    expect(parsed.columns.filter((c) => c.kind === "text").map((c) => c.name)).toEqual(["pump_id", "district", "family"]);
  });

  it("misses bearing_temp_c in between 1% and 3% of rows and no other cell", () => {
    const share = column("bearing_temp_c").missing / parsed.rows;
    expect(share).toBeGreaterThan(0.01);
    expect(share).toBeLessThan(0.03);
    expect(parsed.columns.filter((c) => c.missing > 0).map((c) => c.name)).toEqual(["bearing_temp_c"]);
  });

  it("uses the three families and six districts, and efficiency_pct stays within 40–85", () => {
    expect(new Set(column("family").texts)).toEqual(new Set(pumpFamilies));
    expect(new Set(column("district").texts)).toEqual(new Set(pumpDistricts));
    const efficiency = column("efficiency_pct").numbers;
    expect(Math.min(...efficiency)).toBeGreaterThanOrEqual(40);
    expect(Math.max(...efficiency)).toBeLessThanOrEqual(85);
  });

  it("power_kw is within 1% of flow_m3h · head_m / (3.67 · efficiency_pct), the water shaft-power formula", () => {
    const [flow, head, power, efficiency] = ["flow_m3h", "head_m", "power_kw", "efficiency_pct"].map((n) => column(n).numbers);
    let worst = 0;
    for (let i = 0; i < parsed.rows; ++i) {
      const expected = (flow![i]! * head![i]!) / (3.67 * efficiency![i]!);
      worst = Math.max(worst, Math.abs(power![i]! - expected) / expected);
    }
    expect(worst).toBeLessThan(0.01); // inputs are rounded to 0.1, which moves the formula by < 0.7% here
  });
});

describe("the demo graph at the default radius (z-scores, Euclidean, greedy landmarks, seed 1)", () => {
  const params = { features: pumpFleetFeatures, scale: "zscore", metric: "euclidean" } as const;
  const radius = defaultRadius(parsed, params);
  const cover = buildCover(parsed, { ...params, radius, landmarks: "greedy-file-order", seed: 1 });
  const nodes = cover.landmarks.length;
  const edges = cover.edges.source.length;
  const members = (k: number): Uint32Array => cover.members.items.subarray(cover.members.offsets[k], cover.members.offsets[k + 1]);
  const nodeMean = (k: number, values: Float64Array): number => members(k).reduce((sum, i) => sum + values[i]!, 0) / members(k).length;
  const nodeMedian = (k: number, values: Float64Array): number => quantileSorted(Float64Array.from(members(k), (i) => values[i]!).sort(), 0.5);
  const fleetQuantile = (values: Float64Array, p: number): number => quantileSorted(values.slice().sort(), p);

  it("is readable: between 30 and 150 nodes in at most 3 components", () => {
    expect(nodes).toBeGreaterThanOrEqual(30);
    expect(nodes).toBeLessThanOrEqual(150);
    expect(cover.componentCount).toBeLessThanOrEqual(3);
  });

  const failed = column("failed_within_90d").numbers;
  const failureRate = Array.from({ length: nodes }, (_, k) => nodeMean(k, failed));
  const top3 = failureRate.map((_, k) => k).sort((a, b) => failureRate[b]! - failureRate[a]! || a - b).slice(0, 3);

  it("the 3 nodes with the highest mean failed_within_90d all have median suction_pressure_kpa below the fleet's 10th percentile and median vibration_mm_s above its 90th", () => {
    const suction = column("suction_pressure_kpa").numbers;
    const vibration = column("vibration_mm_s").numbers;
    const lowSuction = fleetQuantile(suction, 0.1);
    const highVibration = fleetQuantile(vibration, 0.9);
    for (const k of top3) {
      expect(nodeMedian(k, suction)).toBeLessThan(lowSuction);
      expect(nodeMedian(k, vibration)).toBeGreaterThan(highVibration);
    }
  });

  it("the 3 nodes with the highest mean failed_within_90d each fail at least 4 times as often as the whole fleet", () => {
    const fleetRate = failed.reduce((sum, x) => sum + x, 0) / parsed.rows;
    for (const k of top3) expect(failureRate[k]!).toBeGreaterThanOrEqual(4 * fleetRate);
  });

  it("each family makes up more than 80% of the members of at least 5 nodes", () => {
    const family = column("family").texts!;
    for (const name of pumpFamilies) {
      let dominated = 0;
      for (let k = 0; k < nodes; ++k) {
        const share = members(k).filter((i) => family[i] === name).length / members(k).length;
        if (share > 0.8) dominated++;
      }
      expect(dominated, name).toBeGreaterThanOrEqual(5);
    }
  });

  it("has cycle rank E − V + C of at least 1", () => {
    expect(edges - nodes + cover.componentCount).toBeGreaterThanOrEqual(1);
  });

  // A node sits at its members' mean (starts_per_day, runtime_h_per_day). The fundamental cycles of a
  // breadth-first spanning forest span the cycle space over GF(2), and the parity of a closed polygon's
  // winding number is additive there (ray-crossing parity), so if any cycle goes round the point an odd
  // number of times, one fundamental cycle does. Winding number by summed signed angles:
  // K. Hormann and A. Agathos, Comput. Geom. 20(3):131–144, 2001.
  it("has a cycle that winds an odd number of times round the duty-rotation centre (8 starts/day, 17 h/day)", () => {
    const centre = { starts: 8, runtime: 17 }; // the generator's rotation ellipse: starts 8 ± 4.5, runtime 17 ± 5
    const starts = column("starts_per_day").numbers;
    const runtime = column("runtime_h_per_day").numbers;
    const angle = Array.from({ length: nodes }, (_, k) => Math.atan2(nodeMean(k, runtime) - centre.runtime, nodeMean(k, starts) - centre.starts));
    const neighbours: number[][] = Array.from({ length: nodes }, () => []);
    for (let e = 0; e < edges; ++e) {
      neighbours[cover.edges.source[e]!]!.push(cover.edges.target[e]!);
      neighbours[cover.edges.target[e]!]!.push(cover.edges.source[e]!);
    }
    const parent = new Int32Array(nodes).fill(-2);
    const depth = new Int32Array(nodes);
    for (let root = 0; root < nodes; ++root) {
      if (parent[root] !== -2) continue;
      parent[root] = -1;
      const queue = [root];
      for (let h = 0; h < queue.length; ++h) {
        for (const b of neighbours[queue[h]!]!) {
          if (parent[b] !== -2) continue;
          parent[b] = queue[h]!;
          depth[b] = depth[queue[h]!]! + 1;
          queue.push(b);
        }
      }
    }
    const oddWindings: number[][] = [];
    for (let e = 0; e < edges; ++e) {
      let a = cover.edges.source[e]!;
      let b = cover.edges.target[e]!;
      if (parent[a] === b || parent[b] === a) continue;
      const up: number[] = [a];
      const down: number[] = [b];
      while (a !== b) {
        if (depth[a]! >= depth[b]!) up.push((a = parent[a]!));
        else down.push((b = parent[b]!));
      }
      const cycle = [...up, ...down.slice(0, -1).reverse()];
      let turned = 0;
      for (let t = 0; t < cycle.length; ++t) {
        let step = angle[cycle[(t + 1) % cycle.length]!]! - angle[cycle[t]!]!;
        if (step > Math.PI) step -= 2 * Math.PI;
        if (step <= -Math.PI) step += 2 * Math.PI;
        turned += step;
      }
      if (Math.round(turned / (2 * Math.PI)) % 2 !== 0) oddWindings.push(cycle);
    }
    expect(oddWindings.length).toBeGreaterThanOrEqual(1);
  });
});
