import { greedyNet } from "../landmark/greedyNet.ts";
import { maybeMetric } from "../metric/metrics.ts";
import type { NumericTable, ParsedTable } from "../table/types.ts";
import type { CoverParams } from "../params.ts";
import { prepareFeatures } from "../scale/prepareFeatures.ts";

export type RadiusBasis = Pick<CoverParams, "features" | "metric" | "scale"> & Partial<Pick<CoverParams, "weights" | "missing" | "oneHot">>;

export const suggestionSampleSize = 4000; // rows probed; keeps the search well under a second
export const suggestionMinNodes = 30;
export const suggestionMaxNodes = 150;

/**
 * Default radius rule: with m complete rows, aim for T = clamp(round(1.5·√m), min(30, ⌈m/5⌉), 150)
 * landmarks (so a small table opens on about one node per five rows, not on one node per two).
 * Take at most 4,000 rows evenly strided through the scaled and weighted table, bisect log(r) (30 steps)
 * between hi = 2 · max distance from the first row (≥ the diameter, so one landmark) and
 * hi / 10⁴, and return the smallest probed radius whose greedy file-order net on those rows
 * has at most T landmarks, rounded up to 3 significant digits. Deterministic.
 * Returns NaN when fewer than two distinct rows exist (no radius separates anything).
 */
export function suggestRadius(parsed: ParsedTable, params: RadiusBasis): number {
  const metric = maybeMetric(params.metric);
  const scaled = prepareFeatures(parsed, params, metric, params.missing ?? "drop").table;
  const m = scaled.rows;
  if (m < 2) return NaN;
  const target = Math.min(suggestionMaxNodes, Math.max(Math.min(suggestionMinNodes, Math.ceil(m / 5)), Math.round(1.5 * Math.sqrt(m))));
  const sample = stridedRows(scaled, suggestionSampleSize);
  let far = 0;
  for (let i = 1; i < sample.rows; ++i) far = Math.max(far, metric.distance(sample.values, sample.columns, 0, i));
  if (!(far > 0)) return NaN;
  const order = new Uint32Array(sample.rows).map((_, i) => i);
  let hi = 2 * far;
  let lo = hi / 1e4;
  for (let step = 0; step < 30; ++step) {
    const mid = Math.sqrt(lo * hi);
    if (greedyNet(sample, metric, mid, order).length <= target) hi = mid;
    else lo = mid;
  }
  return roundUpSignificant(hi, 3);
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

function roundUpSignificant(x: number, digits: number): number {
  const scale = 10 ** (digits - 1 - Math.floor(Math.log10(x)));
  return Math.ceil(x * scale) / scale;
}
