import "fake-indexeddb/auto";
import { describe, expect, it, vi } from "vitest";
import { nodeMembers, type CoverResult } from "../../src/core/index.ts";
import { createActions } from "../../src/state/actions.ts";
import { createRecipeActions } from "../../src/state/recipeActions.ts";
import { idbSessionStorage, type SessionStorage } from "../../src/state/session/sessionStore.ts";
import { createKeepingActions } from "../../src/state/session/sessionWiring.ts";
import { createWorkbenchStore, type WorkbenchStore } from "../../src/state/store.ts";
import { inThreadClient, steppingClock } from "./support.ts";

// made up for this test: 36 rows on a 6 × 6 grid with a cycling third column, and a table that differs in one cell
const csv = ["x,y,z", ...Array.from({ length: 36 }, (_, i) => `${i % 6},${Math.floor(i / 6)},${(i * 7) % 5}`)].join("\n") + "\n";
const otherCsv = csv.replace("\n0,0,0\n", "\n0,0,1\n");
const demoCsv = "pump_id,temp,vib,failed_within_90d,downtime_h\n1,0,0,0,1\n2,1,0,1,2\n3,0,1,0,3\n4,5,5,1,4\n5,6,5,0,5\n6,5,6,1,6\n"; // the demo's column names (state/demo.ts)

const settle = (ms = 0): Promise<void> => new Promise((resolve) => setTimeout(resolve, ms));
/** Lets the 5 ms save delay pass, then waits for every write asked for so far. */
const written = async (actions: { flushSession: () => Promise<void> }): Promise<void> => {
  await settle(10);
  await actions.flushSession();
};
let databases = 0;
const freshStorage = (): SessionStorage => idbSessionStorage({ name: `shoal-keep-test-${++databases}`, store: "kept" });

/** A page: its own store and actions over the given storage (a reload is a second page on the same storage). */
function page(storage: SessionStorage) {
  const store = createWorkbenchStore();
  const base = createActions(store, { client: inThreadClient(), fetchDemo: () => Promise.resolve(demoCsv), now: steppingClock() });
  let regionId = 1000;
  const recipes = createRecipeActions(store, { takeRegionId: () => regionId++, reload: base.reload, setRadius: base.setRadius });
  const keeping = createKeepingActions(store, { ...base, applyRecipe: recipes.applyRecipe, takeRegionId: () => regionId++, storage, saveDelayMs: 5 });
  return { store, actions: { ...base, ...recipes, ...keeping } };
}

const graphOf = (result: CoverResult | null): number[][] => (result ? Array.from(result.landmarks, (_, k) => Array.from(nodeMembers(result.members, k))) : []);

function view(store: WorkbenchStore) {
  const s = store.getState();
  return {
    file: s.source?.fileName, graph: graphOf(s.result), radius: s.radius, colorBy: s.colorBy, roles: s.roles,
    regions: s.regions.map((r) => [r.name, Array.from(r.rows)]), active: s.regions.find((r) => r.id === s.activeRegionId)?.name ?? null, selection: [...s.selection],
  };
}

/** Loads grid.csv as a file, sets radius 1.2, colours by y, makes node 0 "Region A" and selects nodes 1 and 2; waits for the save. */
async function work(storage: SessionStorage, content = csv) {
  const first = page(storage);
  await first.actions.startSession(); // nothing kept yet: the demo
  await first.actions.loadFile(new File([content], "grid.csv"));
  await first.actions.setRadius(1.2);
  first.actions.setColorBy("y");
  first.actions.selectNodes([0]);
  first.actions.keepSelectionAsRegion();
  first.actions.selectNodes([1, 2]);
  await settle(10);
  await first.actions.flushSession(); // the write under way (or the pending one) is done
  return first;
}

describe("the session kept in IndexedDB (fake-indexeddb)", () => {
  it("with nothing kept, start-up opens the demo and says nothing of a restore", async () => {
    const { store, actions } = page(freshStorage());
    await actions.startSession();
    expect(store.getState()).toMatchObject({ source: { fileName: "pump-fleet.csv", isDemo: true }, sessionRestore: { state: "none" } });
  });

  it("save then load round trip: a reload asks for the file by name, size and fingerprint, and the same file brings back the same graph, colour, regions and selection", async () => {
    const storage = freshStorage();
    const first = await work(storage);
    const before = view(first.store);
    expect(before.selection).toEqual([1, 2]);
    expect(await storage.keys()).toEqual(["session"]); // no table bytes unless the user asks (the default)
    const reload = page(storage);
    await reload.actions.startSession();
    const asked = reload.store.getState().sessionRestore;
    expect(asked).toMatchObject({ state: "needs-file", file: { name: "grid.csv", bytes: csv.length, isDemo: false } });
    expect(asked.state === "needs-file" && asked.file.sha256).toBe(first.store.getState().inputFingerprint!.sha256);
    expect(reload.store.getState().table).toBeNull(); // nothing is loaded while the page waits for the file
    await reload.actions.restoreFromFile(new File([csv], "grid.csv"));
    expect(view(reload.store)).toEqual(before);
    expect(reload.store.getState().sessionRestore).toEqual({ state: "none" });
  });

  it("a restored session starts its own history: no undo step at first, and undo after a change comes back to the restored state", async () => {
    const storage = freshStorage();
    const before = view((await work(storage)).store);
    const reload = page(storage);
    await reload.actions.startSession();
    await reload.actions.restoreFromFile(new File([csv], "grid.csv"));
    await settle();
    expect(reload.store.getState()).toMatchObject({ undoDepth: 0, redoDepth: 0 });
    await reload.actions.setRadius(2.5);
    await settle();
    await reload.actions.undo();
    expect(view(reload.store)).toEqual(before);
  });

  it("the layout positions kept go back to the store on restore", async () => {
    const storage = freshStorage();
    const first = await work(storage);
    const landmarks = Array.from(first.store.getState().result!.landmarks);
    first.store.setState({ layoutPositions: { landmarks, x: landmarks.map((_, k) => k), y: landmarks.map((_, k) => -k) } });
    await written(first.actions);
    const reload = page(storage);
    await reload.actions.startSession();
    await reload.actions.restoreFromFile(new File([csv], "grid.csv"));
    expect(reload.store.getState().layoutPositions).toEqual({ landmarks, x: landmarks.map((_, k) => k), y: landmarks.map((_, k) => -k) });
  });

  it("a file with another fingerprint is not applied until the user says so; then it is", async () => {
    const storage = freshStorage();
    const before = view((await work(storage)).store);
    const reload = page(storage);
    await reload.actions.startSession();
    await reload.actions.restoreFromFile(new File([otherCsv], "grid.csv"));
    const warned = reload.store.getState().sessionRestore;
    expect(warned.state).toBe("other-file");
    expect(warned.state === "other-file" && warned.foundSha256).toBe(reload.store.getState().inputFingerprint!.sha256);
    expect(reload.store.getState().regions).toEqual([]); // nothing applied yet
    await reload.actions.applyAnyway();
    expect(view(reload.store).regions).toEqual(before.regions);
    expect(reload.store.getState().radius).toBe(1.2);
  });

  it("start afresh instead of giving the file: the demo opens, and the next change replaces what was kept", async () => {
    const storage = freshStorage();
    await work(storage);
    const reload = page(storage);
    await reload.actions.startSession();
    await reload.actions.startAfresh();
    expect(reload.store.getState()).toMatchObject({ source: { isDemo: true }, sessionRestore: { state: "none" } });
    await written(reload.actions);
    const kept = await storage.get<{ file: { name: string } }>("session");
    expect(kept?.file.name).toBe("pump-fleet.csv");
  });

  it("kept bytes only when opted in: ticking the box keeps the table (its size shown), a reload then asks for nothing, unticking deletes them", async () => {
    const storage = freshStorage();
    const first = await work(storage);
    expect(await storage.get("table-bytes")).toBeUndefined();
    await first.actions.setKeepTable(true);
    await written(first.actions);
    expect(first.store.getState().kept).toEqual({ session: true, tableBytes: csv.length });
    expect((await storage.get<{ bytes: Uint8Array }>("table-bytes"))?.bytes.length).toBe(csv.length);
    const before = view(first.store);
    const reload = page(storage);
    await reload.actions.startSession();
    expect(view(reload.store)).toEqual(before);
    expect(reload.store.getState()).toMatchObject({ keepTable: true, sessionRestore: { state: "none" } });
    await reload.actions.setKeepTable(false);
    expect(await storage.keys()).toEqual(["session"]);
    expect(reload.store.getState().kept.tableBytes).toBeNull();
  });

  it("a new table turns keeping off and deletes the last table's bytes", async () => {
    const storage = freshStorage();
    const first = await work(storage);
    await first.actions.setKeepTable(true);
    await first.actions.loadFile(new File([otherCsv], "other.csv"));
    await vi.waitFor(() => expect(first.store.getState()).toMatchObject({ keepTable: false, kept: { tableBytes: null } }));
    expect(await storage.get("table-bytes")).toBeUndefined();
  });

  it("forget clears every kept key; a reload then opens the demo with its defaults", async () => {
    const storage = freshStorage();
    const first = await work(storage);
    await first.actions.setKeepTable(true);
    await written(first.actions);
    await first.actions.forgetSession();
    expect(await storage.keys()).toEqual([]);
    expect(first.store.getState()).toMatchObject({ keepTable: false, kept: { session: false, tableBytes: null } });
    first.store.setState({ layoutPositions: { landmarks: [0], x: [0], y: [0] } }); // a layout coming to rest is no change of the user's
    await written(first.actions);
    expect(await storage.keys()).toEqual([]);
    const reload = page(storage);
    await reload.actions.startSession();
    const fresh = page(freshStorage());
    await fresh.actions.startSession();
    expect(view(reload.store)).toEqual(view(fresh.store));
  });

  it("the demo's session restores without asking for a file (its bytes are part of the page)", async () => {
    const storage = freshStorage();
    const first = page(storage);
    await first.actions.startSession();
    await first.actions.setRadius(0.9);
    first.actions.selectNodes([0, 1]);
    await written(first.actions);
    const before = view(first.store);
    const reload = page(storage);
    await reload.actions.startSession();
    expect(view(reload.store)).toEqual(before);
  });

  it("a damaged record is not restored: the page says why and opens the demo", async () => {
    const storage = freshStorage();
    await storage.set("session", { keptSession: 1, file: "nonsense" });
    const { store, actions } = page(storage);
    await actions.startSession();
    expect(store.getState()).toMatchObject({ source: { isDemo: true }, sessionRestore: { state: "failed", error: "the kept session could not be read: kept session: bad file" } });
    await written(actions);
    expect(await storage.get<{ file: { name: string } }>("session")).toMatchObject({ file: { name: "pump-fleet.csv" } }); // work goes on, and is kept
  });
});
