import {
  columnSummary,
  nodeMeans,
  nodeMembers,
  standardisedDifference,
  type ColumnSummary,
  type CoverParams,
  type ParsedTable,
} from "../core/index.ts";
import { memoizeLast } from "./memoizeLast.ts";
import type { ColumnRole } from "./slices/paramsSlice.ts";
import type { WorkbenchState } from "./store.ts";

const columnsWithRole = (table: ParsedTable | null, roles: Readonly<Record<string, ColumnRole>>, role: ColumnRole): string[] =>
  table ? table.columns.filter((c) => roles[c.name] === role).map((c) => c.name) : [];

const memoFeatures = memoizeLast((table: ParsedTable | null, roles: Readonly<Record<string, ColumnRole>>) => columnsWithRole(table, roles, "feature"));
const memoOutcomes = memoizeLast((table: ParsedTable | null, roles: Readonly<Record<string, ColumnRole>>) => columnsWithRole(table, roles, "outcome"));

/** Feature columns in table order. */
export const selectFeatureNames = (s: WorkbenchState): string[] => memoFeatures(s.table, s.roles);
export const selectOutcomeNames = (s: WorkbenchState): string[] => memoOutcomes(s.table, s.roles);
export const selectIdColumn = (s: WorkbenchState): string | null => columnsWithRole(s.table, s.roles, "id")[0] ?? null;

/** The parameters of the next build, or null while they are incomplete. */
export function selectCoverParams(s: WorkbenchState): CoverParams | null {
  const features = selectFeatureNames(s);
  if (!s.table || features.length === 0 || !(s.radius > 0)) return null;
  const weights = Object.fromEntries(Object.entries(s.weights).filter(([name, w]) => features.includes(name) && w !== 1));
  return { features, scale: s.scale, metric: s.metric, radius: s.radius, landmarks: s.landmarks, seed: s.seed, missing: s.missing, weights };
}

const memoColors = memoizeLast((table: ParsedTable | null, result: WorkbenchState["result"], column: string | null) => {
  const source = table?.columns.find((c) => c.name === column);
  if (!source || !result || source.kind !== "numeric") return null;
  return nodeMeans(source.numbers, result.members);
});

/** Mean of the colour column per node (NaN where a node has no value), or null for a plain fill. */
export const selectNodeColorValues = (s: WorkbenchState): Float64Array | null => memoColors(s.table, s.result, s.colorBy);

export interface NodeDetail {
  readonly node: number;
  readonly size: number;
  readonly landmarkRow: number;
  readonly component: number;
  readonly columns: readonly {
    readonly name: string;
    readonly role: ColumnRole;
    readonly summary: ColumnSummary;
    /** (node mean − mean of all rows) / sd of all rows. */
    readonly standardisedDifference: number;
  }[];
}

const memoOverall = memoizeLast((table: ParsedTable | null) => {
  const all = table ? Uint32Array.from({ length: table.rows }, (_, i) => i) : new Uint32Array(0);
  return new Map(table?.columns.filter((c) => c.kind === "numeric").map((c) => [c.name, columnSummary(c.numbers, all)]));
});

/** Statistics of every numeric column over all rows read (the reference for standardised differences). */
export const selectOverallSummaries = (s: WorkbenchState): Map<string, ColumnSummary> => memoOverall(s.table);

const memoDetail = memoizeLast(
  (table: ParsedTable | null, result: WorkbenchState["result"], node: number | null, roles: Readonly<Record<string, ColumnRole>>): NodeDetail | null => {
    if (!table || !result || node === null || node >= result.landmarks.length) return null;
    const rows = nodeMembers(result.members, node);
    const overall = memoOverall(table);
    const columns = table.columns
      .filter((c) => c.kind === "numeric" && roles[c.name] !== "ignore")
      .map((c) => {
        const summary = columnSummary(c.numbers, rows);
        const whole = overall.get(c.name)!;
        return { name: c.name, role: roles[c.name] ?? "ignore", summary, standardisedDifference: standardisedDifference(summary.mean, whole.mean, whole.sd) };
      });
    return { node, size: rows.length, landmarkRow: result.landmarks[node]!, component: result.component[node]!, columns };
  },
);

/** Member statistics of the selected node, per numeric column (features and outcomes first as in the table). */
export const selectNodeDetail = (s: WorkbenchState): NodeDetail | null => memoDetail(s.table, s.result, s.selectedNode, s.roles);
