// Radius for a target number of landmarks: bisection on log r for the greedy file-order net.
import type { Metric, NumericTable } from "../src/core/index.ts";
import { createRowIndex } from "../src/core/search/rowIndex.ts";
import { greedyBalls } from "../src/core/landmark/greedyBalls.ts";

export interface Calibration {
  readonly radius: number;
  readonly landmarks: number;
  readonly probes: number;
}

/**
 * Bisects log r between hi = 2 · (largest distance from row 0), which gives one landmark, and
 * hi / 10⁶ until the greedy file-order net has target ± tolerance landmarks (nets are cut off
 * past the upper end, so small radii cost little). At most 60 probes; returns the last radius.
 */
export function calibrateRadius(table: NumericTable, metric: Metric, target: number, tolerance: number): Calibration {
  const index = createRowIndex(table, metric);
  const order = Uint32Array.from({ length: table.rows }, (_, i) => i);
  let far = 0;
  for (let i = 1; i < table.rows; ++i) far = Math.max(far, metric.distance(table.values, table.columns, 0, i));
  let hi = 2 * far;
  let lo = hi / 1e6;
  const upper = Math.floor(target * (1 + tolerance));
  const lower = Math.ceil(target * (1 - tolerance));
  let radius = hi;
  let count = 1;
  let probes = 0;
  while (probes < 60) {
    radius = Math.sqrt(lo * hi);
    count = greedyBalls(index, radius, order, { balls: false, maxLandmarks: upper }).landmarks.length;
    probes++;
    if (count > upper) lo = radius;
    else if (count < lower) hi = radius;
    else break;
  }
  return { radius, landmarks: count, probes };
}
