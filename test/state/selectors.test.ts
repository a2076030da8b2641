import { describe, expect, it } from "vitest";
import { buildCover, nodeMembers, parseCsvText } from "../../src/core/index.ts";
import {
  selectCoverParams,
  selectFeatureNames,
  selectIdColumn,
  selectNodeColorValues,
  selectNodeDetail,
  selectOutcomeNames,
  selectStatsColumns,
} from "../../src/state/selectors.ts";
import { createNodeStatistics } from "../../src/worker/createNodeStatistics.ts";
import { createWorkbenchStore, type WorkbenchState } from "../../src/state/store.ts";
import { assertClose } from "../assertClose.ts";

// x = 0, 1, 2, 3, 5, 6 is the hand-worked line (test/core/graph/lineByHand.test.ts); z-scoring
// divides distances by √(161/30), so a raw radius 1.5 gives balls {0, 1}, {1, 2, 3}, {4, 5}.
const table = parseCsvText("id,x,y,tag\na,0,10,p\nb,1,20,q\nc,2,40,r\nd,3,,s\ne,5,60,t\nf,6,70,u\n");
const radius = 1.5 / Math.sqrt(161 / 30); // worked by hand
const roles = { id: "id", x: "feature", y: "outcome", tag: "ignore" } as const;

function state(patch: Partial<WorkbenchState> = {}): WorkbenchState {
  const store = createWorkbenchStore();
  store.setState({ table, roles, radius, ...patch });
  return store.getState();
}

describe("selectors", () => {
  it("pick features, outcomes and the id column by role, in table order", () => {
    const s = state({ roles: { id: "id", x: "feature", y: "feature", tag: "outcome" } });
    expect(selectFeatureNames(s)).toEqual(["x", "y"]);
    expect(selectOutcomeNames(s)).toEqual(["tag"]);
    expect(selectIdColumn(s)).toBe("id");
  });

  it("return empty lists and no id before a table is loaded", () => {
    const s = createWorkbenchStore().getState();
    expect(selectFeatureNames(s)).toEqual([]);
    expect(selectIdColumn(s)).toBeNull();
    expect(selectCoverParams(s)).toBeNull();
  });

  it("memoise feature names: the same table and roles give the same array", () => {
    const s = state();
    expect(selectFeatureNames(s)).toBe(selectFeatureNames({ ...s, seed: 5 }));
  });

  it("give the build parameters once a table, a feature and a positive radius exist", () => {
    expect(selectCoverParams(state())).toMatchObject({ features: ["x"], scale: "zscore", metric: "euclidean", radius, landmarks: "greedy-file-order", seed: 1 });
    expect(selectCoverParams(state({ radius: NaN }))).toBeNull();
    expect(selectCoverParams(state({ roles: { ...roles, x: "ignore" } }))).toBeNull();
  });

  it("colour nodes by the mean of the colour column: y over {0, 1}, {1, 2, 3}, {4, 5} is 15, 30, 65", () => {
    const result = buildCover(table, selectCoverParams(state())!);
    const values = selectNodeColorValues(state({ result, colorBy: "y" }));
    assertClose(values, [15, 30, 65]); // worked by hand: (10 + 20)/2, (20 + 40)/2 with row d's y missing, (60 + 70)/2
  });

  it("give no colour values for a text column, no column or no result", () => {
    const result = buildCover(table, selectCoverParams(state())!);
    expect(selectNodeColorValues(state({ result, colorBy: "tag" }))).toBeNull();
    expect(selectNodeColorValues(state({ result, colorBy: null }))).toBeNull();
    expect(selectNodeColorValues(state({ colorBy: "y" }))).toBeNull();
  });

  it("detail the selected node: size 3, landmark row 2, component 0, and the worker's statistics of that result and node with their roles", () => {
    const result = buildCover(table, selectCoverParams(state())!);
    expect(selectStatsColumns(state())).toEqual(["x", "y"]); // the numeric columns not ignored, in table order
    const columns = createNodeStatistics(table)(nodeMembers(result.members, 1), ["x", "y"]);
    const detail = selectNodeDetail(state({ result, selectedNode: 1, nodeStats: { result, node: 1, state: "done", columns, error: null } }));
    expect(detail).toMatchObject({ node: 1, size: 3, landmarkRow: 2, component: 0, statsState: "done", statsError: null }); // worked by hand: ball {1, 2, 3}
    expect(detail!.columns.map((c) => [c.name, c.role])).toEqual([["x", "feature"], ["y", "outcome"]]);
    assertClose(detail!.columns[0]!.summary.mean, 2); // worked by hand: (1 + 2 + 3)/3
    expect(detail!.columns[1]!.summary).toMatchObject({ count: 2, missing: 1 }); // worked by hand: row d has no y
  });

  it("show no statistics of another node or an older result: the detail is 'running' with no columns until the node's own arrive", () => {
    const result = buildCover(table, selectCoverParams(state())!);
    const columns = createNodeStatistics(table)(nodeMembers(result.members, 0), ["x", "y"]);
    const otherNode = selectNodeDetail(state({ result, selectedNode: 1, nodeStats: { result, node: 0, state: "done", columns, error: null } }));
    expect(otherNode).toMatchObject({ node: 1, statsState: "running", columns: [] });
    const older = buildCover(table, selectCoverParams(state())!);
    const otherResult = selectNodeDetail(state({ result, selectedNode: 0, nodeStats: { result: older, node: 0, state: "done", columns, error: null } }));
    expect(otherResult).toMatchObject({ node: 0, statsState: "running", columns: [] });
  });

  it("give no detail without a selection or for a node number past the last node", () => {
    const result = buildCover(table, selectCoverParams(state())!);
    expect(selectNodeDetail(state({ result, selectedNode: null }))).toBeNull();
    expect(selectNodeDetail(state({ result, selectedNode: 3 }))).toBeNull();
  });
});
