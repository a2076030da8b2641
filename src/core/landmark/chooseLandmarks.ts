import type { LandmarkRule } from "../params.ts";
import type { Metric } from "../metric/types.ts";
import { randomSource, shuffledOrder } from "../random.ts";
import type { NumericTable } from "../table/types.ts";
import { greedyNet, type NetOptions } from "./greedyNet.ts";
import { maximinNet } from "./maximinNet.ts";

/**
 * Landmarks by rule: "greedy-file-order" visits rows in file order, "greedy-shuffled" in an order shuffled by the
 * seeded generator, "maximin" starts at the row floor(u · n) for the seed's first draw u.
 * Every rule returns an r-net under the metric's reference predicate. `options.index` reuses a
 * candidate index built for this table and metric.
 */
export function chooseLandmarks(
  table: NumericTable,
  metric: Metric,
  radius: number,
  rule: LandmarkRule,
  seed: number,
  onProgress?: (fraction: number) => void,
  options: NetOptions = {},
): Uint32Array {
  const progress = onProgress && ((done: number, total: number) => onProgress(done / total));
  if (rule === "maximin") {
    if (table.rows === 0) return new Uint32Array(0);
    return maximinNet(table, metric, radius, Math.floor(randomSource(seed)() * table.rows), progress, options);
  }
  const order = rule === "greedy-shuffled" ? shuffledOrder(table.rows, randomSource(seed)) : Uint32Array.from({ length: table.rows }, (_, i) => i);
  return greedyNet(table, metric, radius, order, progress, options);
}
