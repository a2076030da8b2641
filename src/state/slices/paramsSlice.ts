import type { LandmarkRule, MetricName, MissingPolicy, ScaleName } from "../../core/index.ts";

export type ColumnRole = "feature" | "outcome" | "id" | "ignore";

export interface ParamsSlice {
  /** Role of every column by name; features are taken in table order. */
  readonly roles: Readonly<Record<string, ColumnRole>>;
  readonly scale: ScaleName;
  readonly metric: MetricName;
  /** NaN until a table is loaded and a default radius is derived. */
  readonly radius: number;
  readonly landmarks: LandmarkRule;
  readonly seed: number;
  readonly missing: MissingPolicy;
  /** Factor per feature applied after scaling; absent features weigh 1. */
  readonly weights: Readonly<Record<string, number>>;
  /** Column whose node mean colours the graph; null for a plain fill. */
  readonly colorBy: string | null;
  /** For a categorical colour column: the level whose share colours the nodes, or null for each node's majority level. */
  readonly colorLevel: string | null;
}

export const initialParams: ParamsSlice = {
  roles: {},
  scale: "zscore",
  metric: "euclidean",
  radius: NaN,
  landmarks: "greedy-file-order",
  seed: 1,
  missing: "drop",
  weights: {},
  colorBy: null,
  colorLevel: null,
};
