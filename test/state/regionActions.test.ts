import { describe, expect, it } from "vitest";
import { nodeMembers } from "../../src/core/index.ts";
import { createActions } from "../../src/state/actions.ts";
import { selectActiveShare, selectRegionOutlines, selectRegionOverlaps, selectRowPlace, selectTrackedRows } from "../../src/state/regionSelectors.ts";
import { createWorkbenchStore } from "../../src/state/store.ts";
import { inThreadClient, noDemo, steppingClock } from "./support.ts";

// two clusters three units apart: at radius 1.5 (Euclidean, no scaling) each cluster is one component
const csv = "id,x,y\na,0,0\nb,1,0\nc,0,1\nd,5,5\ne,6,5\nf,5,6\n";

async function built(radius = 1, text = csv) {
  const store = createWorkbenchStore();
  const client = inThreadClient();
  const actions = createActions(store, { client, fetchDemo: noDemo, now: steppingClock() });
  await actions.loadText(text, { fileName: "t.csv", fileSize: text.length, isDemo: false });
  await actions.setScale("none");
  await actions.setRadius(radius);
  return { store, actions, client };
}

const rowsOf = (store: ReturnType<typeof createWorkbenchStore>, nodes: readonly number[]): number[] =>
  [...new Set(nodes.flatMap((k) => Array.from(nodeMembers(store.getState().result!.members, k))))].sort((a, b) => a - b);

describe("region actions", () => {
  it("'select the component' from node 0 selects its whole cluster: rows {0, 1, 2} or {3, 4, 5} (worked by hand)", async () => {
    const { store, actions } = await built(1.5);
    const first = store.getState().result!.component[0]!;
    actions.selectNodes([0]);
    actions.selectComponent();
    const { selection, result } = store.getState();
    expect(selection.every((k) => result!.component[k] === first)).toBe(true);
    expect([[0, 1, 2], [3, 4, 5]]).toContainEqual(rowsOf(store, selection)); // worked by hand
  });

  it("'grow by one step' adds the neighbours; 'select' with mode add keeps the old nodes", async () => {
    const { store, actions } = await built(1, "x\n0\n1\n2\n3\n4\n5\n6\n"); // a chain: unit balls on a line overlap
    expect(store.getState().result!.edges.source.length).toBeGreaterThan(0);
    const { edges } = store.getState().result!;
    actions.selectNodes([edges.source[0]!]);
    actions.growSelection();
    expect(store.getState().selection).toContain(edges.target[0]!);
    actions.selectNodes([], "add");
    expect(store.getState().selection).toContain(edges.source[0]!);
  });

  it("toggleNode adds node 1, then takes it out again", async () => {
    const { store, actions } = await built();
    actions.toggleNode(1);
    expect(store.getState().selection).toEqual([1]);
    actions.toggleNode(1);
    expect(store.getState().selection).toEqual([]);
  });

  it("a region kept at radius 1 keeps its rows at radius 1.5; its nodes there are the ones most of whose rows are in it, and their share is 1", async () => {
    const { store, actions } = await built(1);
    actions.selectComponent(); // nothing open, nothing selected: no-op
    expect(store.getState().selection).toEqual([]);
    const second = store.getState().result!.component[store.getState().result!.landmarks.length - 1]!;
    actions.selectNodes(Array.from(store.getState().result!.component, (c, k) => (c === second ? k : -1)).filter((k) => k >= 0));
    const region = actions.keepSelectionAsRegion()!;
    expect(Array.from(region.rows)).toEqual([3, 4, 5]); // the second cluster, worked by hand
    await actions.setRadius(1.5);
    expect(Array.from(store.getState().regions[0]!.rows)).toEqual([3, 4, 5]);
    actions.selectRegionNodes(region.id);
    const nodes = store.getState().selection;
    expect(rowsOf(store, nodes)).toEqual([3, 4, 5]); // at 1.5 the clusters never share a ball (3√2 apart)
    const share = selectActiveShare(store.getState())!;
    expect(nodes.map((k) => share[k])).toEqual(nodes.map(() => 1)); // every row of those nodes is in the region
    expect(selectRegionOutlines(store.getState())).toEqual([{ id: region.id, style: 0, nodes }]);
  });

  it("the sweep tracks the active region's rows; with no active region, the selection's rows", async () => {
    const { store, actions, client } = await built(1);
    actions.selectNodes([0]);
    const region = actions.keepSelectionAsRegion()!;
    actions.selectNodes([store.getState().result!.landmarks.length - 1]);
    expect(Array.from(selectTrackedRows(store.getState())!)).toEqual(Array.from(region.rows));
    await actions.runSweep();
    const sweep = client.sent.find((body) => body.type === "sweep");
    expect(sweep?.type === "sweep" && Array.from(sweep.selection!)).toEqual(Array.from(region.rows));
    actions.setActiveRegion(null);
    expect(Array.from(selectTrackedRows(store.getState())!)).toEqual(rowsOf(store, store.getState().selection));
  });

  it("two regions {0, 1, 2} and {3, 4, 5} share 0 rows; a region and a copy of it share all 3", async () => {
    const { store, actions } = await built(1.5);
    const { component, landmarks } = store.getState().result!;
    const byComponent = (c: number) => Array.from(component, (x, k) => (x === c ? k : -1)).filter((k) => k >= 0);
    actions.selectNodes(byComponent(component[0]!));
    actions.keepSelectionAsRegion();
    actions.selectNodes(byComponent(component[landmarks.length - 1]!));
    actions.keepSelectionAsRegion();
    actions.keepSelectionAsRegion();
    expect(selectRegionOverlaps(store.getState())).toEqual([
      { first: "Region A", second: "Region B", shared: 0 }, // disjoint clusters, worked by hand
      { first: "Region A", second: "Region C", shared: 0 }, // worked by hand
      { first: "Region B", second: "Region C", shared: 3 }, // the same rows, worked by hand
    ]);
  });

  it("find a row: label e is in a node of the build; the query outlives a rebuild; an empty query ends it", async () => {
    const { store, actions } = await built(1);
    await actions.setRole("id", "id");
    actions.findRow("e", "label");
    const place = selectRowPlace(store.getState());
    expect(place).toMatchObject({ kind: "found", row: 4 });
    await actions.setRadius(1.5);
    expect(selectRowPlace(store.getState())).toMatchObject({ kind: "found", row: 4 });
    actions.findRow("  ", "label");
    expect(selectRowPlace(store.getState())).toBeNull();
  });

  it("loading another table forgets the regions, the active one and the row looked for", async () => {
    const { store, actions } = await built(1);
    actions.selectNodes([0]);
    actions.keepSelectionAsRegion();
    actions.findRow("1", "record");
    await actions.loadText(csv, { fileName: "u.csv", fileSize: csv.length, isDemo: false });
    expect(store.getState()).toMatchObject({ regions: [], activeRegionId: null, rowQuery: null });
  });
});
