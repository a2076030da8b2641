import { strFromU8, unzipSync } from "fflate";
import { describe, expect, it } from "vitest";
import { parseCsvText, regionSides, regionTable } from "../../src/core/index.ts";
import { createActions } from "../../src/state/actions.ts";
import { createRegionPaneActions } from "../../src/state/regionPaneActions.ts";
import { selectExplainedRegion, selectRegionPane } from "../../src/state/regionPaneSelectors.ts";
import { createWorkbenchStore } from "../../src/state/store.ts";
import { inThreadClient, noDemo, steppingClock } from "./support.ts";

// two groups of three rows far apart; code keeps its leading zeros in the file
const csv = "x,y,code\n0,0,007\n1,0,008\n0,1,007\n5,5,009\n6,5,009\n5,6,010\n";

async function built() {
  const store = createWorkbenchStore();
  const env = { client: inThreadClient(), fetchDemo: noDemo, now: steppingClock() };
  const base = createActions(store, env);
  const actions = { ...base, ...createRegionPaneActions(store, env, base.loadedSource) };
  await actions.loadText(csv, { fileName: "t.csv", fileSize: csv.length, isDemo: false });
  await actions.setRadius(0.5);
  return { store, actions };
}

describe("region pane actions", () => {
  it("with nodes selected and no region kept, the pane explains the selection's rows, named 'selection'", async () => {
    const { store, actions } = await built();
    await actions.selectNode(0, true);
    const explained = selectExplainedRegion(store.getState())!;
    expect(explained.name).toBe("selection");
    expect(explained.id).toBeNull();
  });

  it("the pane's table for the active region equals core's regionTable of its rows against the rest", async () => {
    const { store, actions } = await built();
    await actions.selectNode(0, true);
    const region = actions.keepSelectionAsRegion()!;
    await actions.explainRegion();
    const pane = selectRegionPane(store.getState());
    expect(pane.state).toBe("done");
    const { result } = store.getState();
    expect(pane.table).toEqual(regionTable(parseCsvText(csv), regionSides(result!.rowsRead, result!.usedRows, region.rows), { labelColumn: null }));
  });

  it("A vs B: choosing another region asks again and the answer compares the two regions", async () => {
    const { store, actions } = await built();
    await actions.selectNode(0, true);
    const a = actions.keepSelectionAsRegion()!;
    actions.clearRegion();
    const last = store.getState().result!.landmarks.length - 1;
    await actions.selectNode(last, true);
    const b = actions.keepSelectionAsRegion()!;
    actions.setActiveRegion(a.id);
    await actions.setVersusRegion(b.id);
    const pane = selectRegionPane(store.getState());
    expect(pane.versus).toBe(b.rows);
    const { result } = store.getState();
    expect(pane.table).toEqual(regionTable(parseCsvText(csv), regionSides(result!.rowsRead, result!.usedRows, a.rows, b.rows), { labelColumn: null }));
  });

  it("a rebuild makes the pane's table stale (idle) until it is asked for again", async () => {
    const { store, actions } = await built();
    await actions.selectNode(0, true);
    actions.keepSelectionAsRegion();
    await actions.explainRegion();
    await actions.setRadius(2);
    expect(selectRegionPane(store.getState()).state).toBe("idle");
    await actions.explainRegion();
    expect(selectRegionPane(store.getState()).state).toBe("done");
  });

  it("region rows: every kept region's rows with the cells as written in the file (007 keeps its zeros)", async () => {
    const { store, actions } = await built();
    await actions.selectNode(0, true);
    const region = actions.keepSelectionAsRegion()!;
    const file = (await actions.exportRegionRows())!;
    expect(file.fileName).toBe("t-region-rows.csv");
    const lines = file.text.trimEnd().split("\n");
    expect(lines[0]).toBe("region,row,x,y,code");
    const records = csv.trimEnd().split("\n").slice(1);
    expect(lines.slice(1)).toEqual(Array.from(region.rows, (row) => `Region A,${row + 1},${records[row]}`)); // the file's own lines, copied
    expect(store.getState().regionRowsStatus.state).toBe("idle");
  });

  it("region rows: nothing to export without a kept region", async () => {
    const { actions } = await built();
    expect(await actions.exportRegionRows()).toBeNull();
  });

  it("the export zip's summary.json lists the kept regions with their record numbers", async () => {
    const { actions } = await built();
    await actions.selectNode(0, true);
    const region = actions.keepSelectionAsRegion()!;
    const zip = (await actions.exportCover())!;
    const summary = JSON.parse(strFromU8(unzipSync(zip.bytes)["summary.json"]!));
    expect(summary.regions).toEqual([{ name: "Region A", rowCount: region.rows.length, records: Array.from(region.rows, (r) => r + 1) }]);
  });
});
