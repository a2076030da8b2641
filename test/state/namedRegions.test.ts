import { describe, expect, it } from "vitest";
import { nodeMembers } from "../../src/core/index.ts";
import { createActions } from "../../src/state/actions.ts";
import { regionLetters } from "../../src/state/regionNames.ts";
import { createWorkbenchStore } from "../../src/state/store.ts";
import { inThreadClient, noDemo, steppingClock } from "./support.ts";

const csv = "x,y\n0,0\n1,0\n0,1\n5,5\n6,5\n5,6\n";

async function built() {
  const store = createWorkbenchStore();
  const actions = createActions(store, { client: inThreadClient(), fetchDemo: noDemo, now: steppingClock() });
  await actions.loadText(csv, { fileName: "t.csv", fileSize: csv.length, isDemo: false });
  await actions.setRadius(0.5);
  return { store, actions };
}

describe("named regions", () => {
  it("region letters run A, Z, AA, AZ, BA (bijective base 26, worked by hand)", () => {
    expect([0, 25, 26, 51, 52].map(regionLetters)).toEqual(["A", "Z", "AA", "AZ", "BA"]);
  });

  it("keeping the selection makes 'Region A' of its nodes' rows, active, and it survives a rebuild at another radius", async () => {
    const { store, actions } = await built();
    actions.selectNode(0, true);
    const rows = Array.from(nodeMembers(store.getState().result!.members, 0)).sort((a, b) => a - b);
    const region = actions.keepSelectionAsRegion()!;
    expect(region.name).toBe("Region A");
    expect(store.getState().activeRegionId).toBe(region.id);
    expect(Array.from(region.rows)).toEqual(rows);
    await actions.setRadius(2);
    expect(store.getState().regions.map((r) => [r.name, Array.from(r.rows)])).toEqual([["Region A", Array.from(region.rows)]]);
  });

  it("renaming keeps the rows; deleting the active region leaves none active", async () => {
    const { store, actions } = await built();
    actions.selectNode(0, true);
    const region = actions.keepSelectionAsRegion()!;
    actions.renameRegion(region.id, "  north pumps ");
    expect(store.getState().regions[0]!.name).toBe("north pumps");
    actions.deleteRegion(region.id);
    expect(store.getState()).toMatchObject({ regions: [], activeRegionId: null });
  });

  it("keep A, keep B, delete A, keep again names the new region 'Region A', the first unused name (worked by hand)", async () => {
    const { actions } = await built();
    actions.selectNode(0, true);
    const a = actions.keepSelectionAsRegion()!;
    const b = actions.keepSelectionAsRegion()!;
    expect(b.name).toBe("Region B");
    actions.deleteRegion(a.id);
    expect(actions.keepSelectionAsRegion()!.name).toBe("Region A");
    expect(actions.keepSelectionAsRegion()!.name).toBe("Region C");
  });

  it("a rename to a name another region has is refused with a reason; renaming a region to its own name is allowed", async () => {
    const { store, actions } = await built();
    actions.selectNode(0, true);
    const a = actions.keepSelectionAsRegion()!;
    const b = actions.keepSelectionAsRegion()!;
    expect(actions.renameRegion(b.id, " Region A ")).toBe("another region is named Region A");
    expect(store.getState().regions.map((r) => r.name)).toEqual(["Region A", "Region B"]);
    expect(actions.renameRegion(a.id, "Region A")).toBeNull();
  });

  it("an empty selection keeps no region", async () => {
    const { store, actions } = await built();
    expect(actions.keepSelectionAsRegion()).toBeNull();
    expect(store.getState().regions).toEqual([]);
  });
});
