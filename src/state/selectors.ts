import {
  featureWeights,
  nodeMeans,
  nodeRows,
  type ColumnSummary,
  type CoverParams,
  type ParsedTable,
} from "../core/index.ts";
import { specialFill } from "./colorChoices.ts";
import { memoizeLast } from "./memoizeLast.ts";
import { levelFill, type NodeFill } from "./nodeFill.ts";

/** Colour column name that stands for the seed-stability share of each row (not a table column). */
export const stabilityColor = "@membership-stability";
import type { ColumnRole } from "./slices/paramsSlice.ts";
import type { WorkbenchState } from "./store.ts";

const columnsWithRole = (table: ParsedTable | null, roles: Readonly<Record<string, ColumnRole>>, role: ColumnRole): string[] =>
  table ? table.columns.filter((c) => roles[c.name] === role).map((c) => c.name) : [];

const memoFeatures = memoizeLast((table: ParsedTable | null, roles: Readonly<Record<string, ColumnRole>>) =>
  columnsWithRole(table, roles, "feature").filter((name) => table!.columns.find((c) => c.name === name)!.kind === "numeric"),
);
const memoOneHot = memoizeLast((table: ParsedTable | null, roles: Readonly<Record<string, ColumnRole>>) =>
  columnsWithRole(table, roles, "feature").filter((name) => table!.columns.find((c) => c.name === name)!.kind !== "numeric"),
);
const memoOutcomes = memoizeLast((table: ParsedTable | null, roles: Readonly<Record<string, ColumnRole>>) => columnsWithRole(table, roles, "outcome"));

/** Numeric feature columns in table order. */
export const selectFeatureNames = (s: WorkbenchState): string[] => memoFeatures(s.table, s.roles);
/** Categorical columns used as features through one-hot indicators, in table order. */
export const selectOneHotNames = (s: WorkbenchState): string[] => memoOneHot(s.table, s.roles);
/** True when the recipe has a feature of either kind (numeric, or categorical through one-hot indicators). */
export const selectHasFeatures = (s: WorkbenchState): boolean => selectFeatureNames(s).length + selectOneHotNames(s).length > 0;
export const selectOutcomeNames = (s: WorkbenchState): string[] => memoOutcomes(s.table, s.roles);
export const selectIdColumn = (s: WorkbenchState): string | null => columnsWithRole(s.table, s.roles, "id")[0] ?? null;

/** The parameters of the next build, or null while they are incomplete. */
export function selectCoverParams(s: WorkbenchState): CoverParams | null {
  const features = selectFeatureNames(s);
  const oneHot = selectOneHotNames(s);
  if (!s.table || features.length + oneHot.length === 0 || !(s.radius > 0)) return null;
  const weights = featureWeights([...features, ...oneHot], s.weights);
  return {
    features, scale: s.scale, metric: s.metric, radius: s.radius, landmarks: s.landmarks, seed: s.seed, missing: s.missing, weights,
    ...(oneHot.length > 0 ? { oneHot } : {}),
  };
}

const memoFill = memoizeLast(
  (
    table: ParsedTable | null, result: WorkbenchState["result"], column: string | null, level: string | null, seedRuns: WorkbenchState["seedRuns"],
    regions: WorkbenchState["regions"],
  ): NodeFill | null => {
    if (!result) return null;
    const special = specialFill(table, result, column, level, regions);
    if (special !== undefined) return special;
    if (column === stabilityColor) {
      return seedRuns?.regionShare
        ? { kind: "sequential", values: nodeMeans(seedRuns.regionShare, result.members), caption: "node mean share of seeds keeping the row in the region" }
        : null;
    }
    const source = table?.columns.find((c) => c.name === column);
    if (!source) return null;
    if (source.kind === "numeric") return { kind: "sequential", values: nodeMeans(source.numbers, result.members), caption: `node mean of ${source.name}` };
    return source.categories ? levelFill(source.categories, result.members, source.name, level) : null;
  },
);

/** The fill of every node for the chosen colour column (mean, share of a level, or majority level), or null for a plain fill. */
export const selectNodeFill = (s: WorkbenchState): NodeFill | null => memoFill(s.table, s.result, s.colorBy, s.colorLevel, s.seedRuns, s.regions);

/** Numeric fill values per node (NaN where a node has no value), or null when the fill is not numeric. */
export const selectNodeColorValues = (s: WorkbenchState): Float64Array | null => {
  const fill = selectNodeFill(s);
  return fill?.kind === "sequential" ? fill.values : null;
};

export interface NodeDetail {
  readonly node: number;
  readonly size: number;
  readonly landmarkRow: number;
  readonly component: number;
  /** Whether the worker's member statistics for this node are on their way, here, or failed (with `statsError`). */
  readonly statsState: "running" | "done" | "failed";
  readonly statsError: string | null;
  /** Empty until the statistics are done. */
  readonly columns: readonly {
    readonly name: string;
    readonly role: ColumnRole;
    readonly summary: ColumnSummary;
    /** (node mean − mean of all rows) / sd of all rows. */
    readonly standardisedDifference: number;
  }[];
}

const memoDetail = memoizeLast(
  (result: WorkbenchState["result"], node: number | null, roles: Readonly<Record<string, ColumnRole>>, stats: WorkbenchState["nodeStats"]): NodeDetail | null => {
    if (!result || node === null || node >= result.landmarks.length) return null;
    const size = result.members.offsets[node + 1]! - result.members.offsets[node]!;
    const own = stats.result === result && stats.node === node;
    const statsState = own && stats.state !== "idle" ? stats.state : "running";
    const columns = own && stats.state === "done"
      ? stats.columns.filter((c) => roles[c.name] !== "ignore").map((c) => ({ ...c, role: roles[c.name] ?? "ignore" }))
      : [];
    return { node, size, landmarkRow: result.landmarks[node]!, component: result.component[node]!, statsState, statsError: own ? stats.error : null, columns };
  },
);

/**
 * The selected node and its member statistics per numeric column (features and outcomes, in table
 * order) as the worker computed them; `statsState` says whether they have arrived.
 */
export const selectNodeDetail = (s: WorkbenchState): NodeDetail | null => memoDetail(s.result, s.selectedNode, s.roles, s.nodeStats);

/** Numeric columns whose member statistics a node pane shows: every numeric column not ignored, in table order. */
export const selectStatsColumns = (s: WorkbenchState): string[] =>
  s.table ? s.table.columns.filter((c) => c.kind === "numeric" && s.roles[c.name] !== "ignore").map((c) => c.name) : [];

const memoRegionRows = memoizeLast((result: WorkbenchState["result"], selection: readonly number[]): Uint32Array | null => {
  if (!result || selection.length === 0) return null;
  return nodeRows(result.members, selection.filter((node) => node < result.landmarks.length));
});

/** Parsed-table rows of the region (the union of its nodes' members), or null when no region is selected. */
export const selectRegionRows = (s: WorkbenchState): Uint32Array | null => memoRegionRows(s.result, s.selection);
