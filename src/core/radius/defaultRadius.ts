import { checkStop, type RunControl } from "../control.ts";
import { greedyBalls } from "../landmark/greedyBalls.ts";
import { maybeMetric } from "../metric/metrics.ts";
import type { CoverParams } from "../params.ts";
import { prepareFeatures } from "../scale/prepareFeatures.ts";
import { createRowIndex } from "../search/rowIndex.ts";
import type { NumericTable, ParsedTable } from "../table/types.ts";
import { farthestFromFirst } from "./farthestFromFirst.ts";
import { logBisect } from "./logBisect.ts";
import { roundUpSignificant } from "./roundUpSignificant.ts";

export type RadiusBasis = Pick<CoverParams, "features" | "metric" | "scale"> & Partial<Pick<CoverParams, "weights" | "missing" | "oneHot">>;

export const defaultRadiusSampleSize = 4000; // rows probed; keeps the search well under a second
export const defaultRadiusFewestNodes = 30; // common practice, no source: a graph worth looking at
export const defaultRadiusMostNodes = 150; // common practice, no source: still readable on screen
const bisectionSteps = 30; // a bracket of a factor 10⁴ ends within a factor 1 + 1e-8

/**
 * Default radius (landmark-count rule): with m complete rows, aim for
 * T = clamp(round(1.5·√m), min(30, ⌈m/5⌉), 150) landmarks (so a small table opens on about one
 * node per five rows, not on one node per two). Take at most 4,000 rows evenly strided through
 * the scaled and weighted table, index them once, bisect log(r) (30 steps, logBisect.ts) between
 * hi = 2 · max distance from the first row (≥ the diameter, so one landmark) and hi / 10⁴, and
 * return the smallest probed radius whose greedy file-order net on those rows has at most T
 * landmarks, rounded up to 3 significant digits. Deterministic. Progress and cancellation by
 * `control` (one report per step).
 * Throws when fewer than two distinct rows exist (farthestFromFirst.ts), since no radius separates anything.
 * @example defaultRadius(two rows x = 1, 2, { features: ["x"], scale: "zscore", metric: "euclidean" }) // => 0.000283
 */
export function defaultRadius(parsed: ParsedTable, params: RadiusBasis, control: RunControl = {}): number {
  const metric = maybeMetric(params.metric);
  const what = "the default radius";
  const scaled = prepareFeatures(parsed, params, () => checkStop(control, what)).table;
  const m = scaled.rows;
  const target = Math.min(defaultRadiusMostNodes, Math.max(Math.min(defaultRadiusFewestNodes, Math.ceil(m / 5)), Math.round(1.5 * Math.sqrt(m))));
  const sample = stridedRows(scaled, defaultRadiusSampleSize);
  const hi = 2 * farthestFromFirst(sample, metric);
  const index = createRowIndex(sample, metric, { onStep: () => checkStop(control, what) });
  const order = Uint32Array.from({ length: sample.rows }, (_, i) => i);
  let step = 0;
  const found = logBisect(hi / 1e4, hi, bisectionSteps, (radius) => {
    checkStop(control, what);
    control.onProgress?.(step++ / bisectionSteps);
    // the net stops past T landmarks: only "at most T or not" matters
    return greedyBalls(index, radius, order, { balls: false, maxLandmarks: target }).landmarks.length <= target;
  });
  control.onProgress?.(1);
  return roundUpSignificant(found.hi, 3);
}

function stridedRows(table: NumericTable, limit: number): NumericTable {
  if (table.rows <= limit) return table;
  const d = table.columns;
  const values = new Float64Array(limit * d);
  for (let k = 0; k < limit; ++k) {
    const i = Math.floor((k * table.rows) / limit);
    values.set(table.values.subarray(i * d, i * d + d), k * d);
  }
  return { ...table, rows: limit, values };
}
