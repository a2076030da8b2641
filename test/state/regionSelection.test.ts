// A plain click opens a node; the region changes only on purpose (shift-click, "Add to region").
import { describe, expect, it } from "vitest";
import { createActions } from "../../src/state/actions.ts";
import { createWorkbenchStore } from "../../src/state/store.ts";
import { inThreadClient, noDemo, steppingClock } from "./support.ts";

const csv = "x,y\n0,0\n1,0\n0,1\n5,5\n6,5\n5,6\n";

async function built() {
  const store = createWorkbenchStore();
  const actions = createActions(store, { client: inThreadClient(), fetchDemo: noDemo, now: steppingClock() });
  await actions.loadText(csv, { fileName: "t.csv", fileSize: csv.length, isDemo: false });
  await actions.setRadius(0.5); // small enough for at least two nodes on this table
  return { store, actions };
}

describe("actions: selectNode and the region", () => {
  it("a plain selection opens node 0 and leaves the region empty", async () => {
    const { store, actions } = await built();
    actions.selectNode(0);
    expect(store.getState()).toMatchObject({ selectedNode: 0, selection: [] });
  });

  it("a plain selection of another node keeps the region made by shift-click as it was", async () => {
    const { store, actions } = await built();
    actions.selectNode(1, true);
    actions.selectNode(0);
    expect(store.getState()).toMatchObject({ selectedNode: 0, selection: [1] });
  });

  it("shift-selection toggles: node 1 then node 0 give region [0, 1]; node 1 again gives [0]", async () => {
    const { store, actions } = await built();
    actions.selectNode(1, true);
    actions.selectNode(0, true);
    expect(store.getState().selection).toEqual([0, 1]);
    actions.selectNode(1, true);
    expect(store.getState().selection).toEqual([0]);
  });

  it("closing the pane (null) keeps the region", async () => {
    const { store, actions } = await built();
    actions.selectNode(1, true);
    actions.selectNode(null);
    expect(store.getState()).toMatchObject({ selectedNode: null, selection: [1] });
  });
});
