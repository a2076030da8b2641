import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { assertClose } from "../../assertClose.ts";
import { createRowIndex } from "../../../src/core/search/rowIndex.ts";
import { euclidean, parseCsvText } from "../../../src/core/index.ts";
import { greedyBalls } from "../../../src/core/landmark/greedyBalls.ts";
import { radiusSweep } from "../../../src/core/sweep/radiusSweep.ts";
import { pointsTable } from "./support.ts";

const line = (xs: number[]) => pointsTable(["x"], xs.map((x) => [x]));
const params = { features: ["x"], scale: "none", metric: "euclidean", landmarks: "greedy-file-order", seed: 1 } as const;

describe("per-radius figures", () => {
  it("the line 0, 1, 2 at r = 1: balls {0, 1}, {1, 2}, so 4/3 balls per row, largest node 2/3 of the rows, one component with all", () => {
    const { figures } = radiusSweep(line([0, 1, 2]), params, { radii: [1] });
    expect([figures.nodes[0], figures.edges[0], figures.b0[0], figures.b1[0], figures.cycleRank[0]]).toEqual([2, 1, 1, 0, 0]); // worked by hand
    assertClose([figures.ballsPerRow[0], figures.largestNodeShare[0], figures.largestComponentShare[0]], [4 / 3, 2 / 3, 1]); // worked by hand
  });

  it("the line 0, 1, 5 at r = 1: two components, the larger holding 2 of 3 rows", () => {
    const { figures } = radiusSweep(line([0, 1, 5]), params, { radii: [1] });
    expect(figures.b0[0]).toBe(2); // worked by hand: balls {0, 1} and {5}
    assertClose(figures.largestComponentShare[0], 2 / 3); // worked by hand
  });

  it("the demo table's default range is 0.206 to 5.48 (this implementation's output, pinned; the rule's properties are tested in defaultRange.test.ts)", () => {
    const demo = parseCsvText(readFileSync(new URL("../../../public/demo/pump-fleet.csv", import.meta.url), "utf8"));
    const features = ["age_years", "flow_m3h", "head_m", "power_kw", "efficiency_pct", "vibration_mm_s", "bearing_temp_c", "starts_per_day", "runtime_h_per_day", "suction_pressure_kpa"];
    const { range } = radiusSweep(demo, { ...params, features, scale: "zscore" }, { steps: 2 });
    expect([range.min, range.max]).toEqual([0.206, 5.48]);
  });
});

describe("small pieces", () => {
  it("a greedy net capped at maxLandmarks on the line 0, 1, 2, 3 at r = 1 has 2 landmarks (0, 2), and cap + 1 = 2 when the cap is 1", () => {
    const table = { rows: 4, columns: 1, names: ["x"], values: Float64Array.of(0, 1, 2, 3) };
    const order = Uint32Array.of(0, 1, 2, 3);
    expect(greedyBalls(createRowIndex(table, euclidean), 1, order, { balls: false, maxLandmarks: 5 }).landmarks.length).toBe(2); // worked by hand, greedyNet's example
    expect(greedyBalls(createRowIndex(table, euclidean), 1, order, { balls: false, maxLandmarks: 1 }).landmarks.length).toBe(2); // worked by hand: the second landmark exceeds the cap
  });
});
