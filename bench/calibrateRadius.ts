// Radius for a target number of landmarks: bisection on log r for the greedy file-order net.
import type { Metric, NumericTable } from "../src/core/index.ts";
import { createRowIndex } from "../src/core/search/rowIndex.ts";
import { greedyBalls } from "../src/core/landmark/greedyBalls.ts";
import { farthestFromFirst } from "../src/core/radius/farthestFromFirst.ts";
import { logBisect } from "../src/core/radius/logBisect.ts";

export interface Calibration {
  readonly radius: number;
  readonly landmarks: number;
  readonly probes: number;
}

/**
 * Bisects log r between hi = 2 · (largest distance from row 0), which gives one landmark, and
 * hi / 10⁶ (radius/logBisect.ts, the radius rules' one bisection) until the greedy file-order net has target ± tolerance landmarks (nets are cut off
 * past the upper end, so small radii cost little). At most 60 probes; returns the last radius.
 */
export function calibrateRadius(table: NumericTable, metric: Metric, target: number, tolerance: number): Calibration {
  const index = createRowIndex(table, metric);
  const order = Uint32Array.from({ length: table.rows }, (_, i) => i);
  const hi = 2 * farthestFromFirst(table, metric);
  const upper = Math.floor(target * (1 + tolerance));
  const lower = Math.ceil(target * (1 - tolerance));
  let count = 1;
  // fits: too few landmarks means the radius is too large (look lower); too many, look higher
  const { last, probes } = logBisect(hi / 1e6, hi, 60, (radius) => {
    count = greedyBalls(index, radius, order, { balls: false, maxLandmarks: upper }).landmarks.length;
    return count > upper ? false : count < lower ? true : "found";
  });
  return { radius: last, landmarks: count, probes };
}
