import { prepareFeatures, type PreparedFeatures } from "../scale/prepareFeatures.ts";
import { maybeLandmarkRule, maybeMissingPolicy, maybeScale, type CoverParams } from "../params.ts";
import { maybeMetric } from "../metric/metrics.ts";
import type { Metric } from "../metric/types.ts";
import { createRowIndex, type RowIndex } from "./rowIndex.ts";
import type { ParsedTable } from "../table/types.ts";
import { checkStop, type RunControl } from "../control.ts";

/** Every cover parameter but the radius: what a sweep holds fixed. */
export type SweepParams = Omit<CoverParams, "radius">;

/** The rows of a build, selected, scaled and weighted once, ready for any radius. */
export interface PreparedRows extends PreparedFeatures {
  readonly metric: Metric;
  /** Candidate index over `table` under `metric`, built once and shared by every radius. */
  readonly index: RowIndex;
}

/**
 * The radius-free first half of buildCover, in the same order and by the same functions: select
 * the features under the missing-value policy, scale and weight, leave out rows where the metric
 * is undefined (scale/prepareFeatures.ts), and build a candidate index (search/rowIndex.ts) in
 * file order. buildCover builds its own index per call, in tree order for greedy rules
 * (treeOrderIndex.ts); both only prune, so every decision is the same predicate call. Checks
 * every parameter but the radius, and `control.shouldStop` while the index is built. O(n log n · d).
 */
export function prepareRows(parsed: ParsedTable, params: SweepParams, control: RunControl = {}, what = "the sweep"): PreparedRows {
  const metric = maybeMetric(params.metric);
  maybeScale(params.scale);
  maybeLandmarkRule(params.landmarks);
  maybeMissingPolicy(params.missing ?? "drop");
  if (!Number.isInteger(params.seed)) throw new Error(`invalid seed: ${params.seed}`);
  const prepared = prepareFeatures(parsed, params, () => checkStop(control, what));
  checkStop(control, what);
  return { metric, ...prepared, index: createRowIndex(prepared.table, metric, { onStep: () => checkStop(control, what) }) };
}
