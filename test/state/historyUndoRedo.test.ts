import { describe, expect, it } from "vitest";
import { nodeMembers, type CoverResult } from "../../src/core/index.ts";
import { createActions } from "../../src/state/actions.ts";
import { createRecipeActions } from "../../src/state/recipeActions.ts";
import { createKeepingActions } from "../../src/state/session/sessionWiring.ts";
import { createWorkbenchStore, type WorkbenchStore } from "../../src/state/store.ts";
import { inThreadClient, noDemo, steppingClock } from "./support.ts";
import { memoryStorage } from "./sessionSupport.ts";

// 36 rows on a 6 × 6 grid with a third column that cycles 0..4; made up for this test
const csv = ["x,y,z", ...Array.from({ length: 36 }, (_, i) => `${i % 6},${Math.floor(i / 6)},${(i * 7) % 5}`)].join("\n") + "\n";

const settle = (): Promise<void> => new Promise((resolve) => setTimeout(resolve, 0));

async function workbench() {
  const store = createWorkbenchStore();
  const base = createActions(store, { client: inThreadClient(), fetchDemo: noDemo, now: steppingClock() });
  let regionId = 1000;
  const recipes = createRecipeActions(store, { takeRegionId: () => regionId++, reload: base.reload, setRadius: base.setRadius });
  const keeping = createKeepingActions(store, { ...base, applyRecipe: recipes.applyRecipe, takeRegionId: () => regionId++, storage: memoryStorage() });
  await base.loadText(csv, { fileName: "grid.csv", fileSize: csv.length, isDemo: false });
  await settle();
  return { store, actions: { ...base, ...recipes, ...keeping } };
}

/** The graph as numbers: each node's members in order (0-based rows). */
const graphOf = (result: CoverResult | null): number[][] => (result ? Array.from(result.landmarks, (_, k) => Array.from(nodeMembers(result.members, k))) : []);

function view(store: WorkbenchStore) {
  const s = store.getState();
  return { graph: graphOf(s.result), radius: s.radius, z: s.roles.z, regions: s.regions.map((r) => [r.name, Array.from(r.rows)]), active: s.regions.find((r) => r.id === s.activeRegionId)?.name ?? null, selection: [...s.selection] };
}

describe("undo and redo over the store", () => {
  it("undo across a region edit, a role change and a radius change returns each earlier graph exactly (node count and members), and redo comes back", async () => {
    const { store, actions } = await workbench();
    const initial = view(store); // the default radius's build
    await actions.setRadius(1.2); // z-scored grid: a radius that gives several nodes (checked by the inequality below)
    await settle();
    const first = view(store);
    await actions.setRadius(2.5);
    await settle();
    const second = view(store);
    expect(second.graph.length).not.toBe(first.graph.length); // the two radii give different graphs, so the test can tell them apart
    await actions.setRole("z", "ignore");
    await settle();
    const third = view(store);
    expect(third.graph).not.toEqual(second.graph);
    actions.selectNodes([0]);
    await settle();
    const selected = view(store);
    actions.keepSelectionAsRegion();
    await settle();
    const kept = view(store);
    expect(kept.regions.map(([name]) => name)).toEqual(["Region A"]);
    expect(kept.active).toBe("Region A");
    expect(store.getState()).toMatchObject({ undoDepth: 5, redoDepth: 0 }); // default build, then two radii, a role, a selection, a region (worked by hand)

    const seen = [];
    for (let step = 0; step < 5; ++step) {
      await actions.undo();
      seen.push(view(store));
    }
    expect(seen).toEqual([selected, third, second, first, initial]);
    expect(store.getState()).toMatchObject({ undoDepth: 0, redoDepth: 5 });
    await actions.undo(); // nothing before the first step
    expect(view(store)).toEqual(initial);

    const again = [];
    for (let step = 0; step < 5; ++step) {
      await actions.redo();
      again.push(view(store));
    }
    expect(again).toEqual([first, second, third, selected, kept]);
    expect(store.getState()).toMatchObject({ undoDepth: 5, redoDepth: 0 });
  });

  it("a new change after an undo drops the redo steps", async () => {
    const { store, actions } = await workbench();
    await actions.setRadius(1.2);
    await actions.setRadius(2.5);
    await settle();
    await actions.undo();
    expect(store.getState()).toMatchObject({ radius: 1.2, redoDepth: 1 });
    await actions.setRadius(3);
    await settle();
    expect(store.getState()).toMatchObject({ redoDepth: 0, undoDepth: 2 }); // default radius, 1.2, 3 (worked by hand)
  });

  it("showing an undo step records nothing new: the redo step stays until the user changes something", async () => {
    const { store, actions } = await workbench();
    await actions.setRadius(1.2);
    await settle();
    actions.selectNodes([0, 1]);
    await settle();
    await actions.undo();
    await settle();
    expect(store.getState()).toMatchObject({ selection: [], undoDepth: 1, redoDepth: 1 });
    await actions.redo();
    expect(store.getState().selection).toEqual([0, 1]);
  });

  it("a selection step is shown without a rebuild: the result object stays the same", async () => {
    const { store, actions } = await workbench();
    await actions.setRadius(1.2);
    await settle();
    const result = store.getState().result;
    actions.selectNodes([2]);
    await settle();
    await actions.undo();
    expect(store.getState().result).toBe(result);
    expect(store.getState().selection).toEqual([]);
  });

  it("a region rename and a colour change are undone without a rebuild: the result object stays, the open node too", async () => {
    const { store, actions } = await workbench();
    await actions.setRadius(1.2);
    actions.selectNodes([0]);
    const region = actions.keepSelectionAsRegion()!;
    await settle();
    const result = store.getState().result;
    await actions.selectNode(1);
    actions.renameRegion(region.id, "corner");
    await settle();
    actions.setColorBy("x");
    await settle();
    await actions.undo();
    expect(store.getState()).toMatchObject({ colorBy: null, selectedNode: 1 });
    await actions.undo();
    expect(store.getState().regions.map((r) => r.name)).toEqual(["Region A"]);
    expect(store.getState().regions.find((r) => r.id === store.getState().activeRegionId)?.name).toBe("Region A");
    expect(store.getState().result).toBe(result);
    await actions.redo();
    expect(store.getState().regions.map((r) => r.name)).toEqual(["corner"]);
    expect(store.getState().result).toBe(result);
  });

  it("a metric change is one step: its default radius's build is what undo comes back to, not the state between", async () => {
    const { store, actions } = await workbench();
    await settle();
    const before = view(store);
    await actions.setMetric("manhattan");
    await settle();
    expect(store.getState()).toMatchObject({ undoDepth: 1, redoDepth: 0 });
    await actions.undo();
    expect({ ...view(store), metric: store.getState().metric }).toEqual({ ...before, metric: "euclidean" });
  });

  it("a new table starts a new history", async () => {
    const { store, actions } = await workbench();
    await actions.setRadius(1.2);
    await settle();
    expect(store.getState().undoDepth).toBeGreaterThan(0);
    await actions.loadText("a,b\n1,2\n3,4\n", { fileName: "small.csv", fileSize: 12, isDemo: false });
    await settle();
    expect(store.getState().undoDepth).toBe(0);
  });
});
