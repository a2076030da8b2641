import { describe, expect, it } from "vitest";
import { strFromU8, unzipSync } from "fflate";
import { parseCsvText, defaultRadius } from "../../src/core/index.ts";
import { createActions } from "../../src/state/actions.ts";
import { createWorkbenchStore } from "../../src/state/store.ts";
import { createWorkerClient, type WorkerClient } from "../../src/worker/client.ts";
import { delayingClient, inThreadClient, noDemo, steppingClock } from "./support.ts";

// A text id column (unique), a repeated text column, and three numeric columns.
const csv = "name,site,x,y,risk\nann,A,0,0,1\nbob,A,1,0,0\ncyd,B,0,1,1\ndee,B,5,5,0\neve,B,6,5,1\nfay,A,5,6,0\n";
const source = { fileName: "plants.csv", fileSize: csv.length, isDemo: false };

function setup<C extends WorkerClient>(client: C) {
  const store = createWorkbenchStore();
  const actions = createActions(store, { client, fetchDemo: noDemo, now: steppingClock() });
  return { store, actions, client };
}

describe("actions: loadText", () => {
  it("sets default roles: the unique text column is the id, numeric columns are features, no outcome without hints", async () => {
    const { store, actions } = setup(inThreadClient());
    await actions.loadText(csv, source);
    expect(store.getState().roles).toEqual({ name: "id", site: "ignore", x: "feature", y: "feature", risk: "feature" });
    expect(store.getState().colorBy).toBeNull();
  });

  it("takes outcomes from hints and colours by the first numeric outcome", async () => {
    const { store, actions } = setup(inThreadClient());
    await actions.loadText(csv, source, { outcomes: ["risk"] });
    expect(store.getState().roles).toMatchObject({ x: "feature", y: "feature", risk: "outcome" });
    expect(store.getState().colorBy).toBe("risk");
  });

  it("suggests the radius that core's defaultRadius gives for the features, then builds with it", async () => {
    const { store, actions } = setup(inThreadClient());
    await actions.loadText(csv, source);
    const s = store.getState();
    const expected = defaultRadius(parseCsvText(csv), { features: ["x", "y", "risk"], metric: "euclidean", scale: "zscore" });
    expect(s.radius).toBe(expected);
    expect(s.loadStatus).toBe("ready");
    expect(s.source).toEqual(source);
    expect(s.result?.params).toMatchObject({ features: ["x", "y", "risk"], radius: expected });
    expect(s.build).toEqual({ state: "done", phase: null, fraction: 1, error: null, elapsedMs: 5 }); // the stepping clock advances 5 ms per call
  });

  it("works over the worker client's in-thread fallback, as in Node", async () => {
    const { store, actions } = setup(createWorkerClient());
    await actions.loadText(csv, source);
    expect(store.getState().build.state).toBe("done");
    expect(store.getState().result).not.toBeNull();
  });

  it("a file that cannot be read sets loadStatus failed with the parser's message", async () => {
    const { store, actions } = setup(inThreadClient());
    await actions.loadText("x,y\n", source);
    expect(store.getState()).toMatchObject({ loadStatus: "failed", loadError: "the file has a header but no data records", table: null });
  });

  it("a table whose features are all constant gets no radius and no build", async () => {
    const { store, actions, client } = setup(inThreadClient());
    await actions.loadText("x\n3\n3\n3\n", source);
    expect(store.getState().radius).toBeNaN();
    expect(store.getState().result).toBeNull();
    expect(client.sent.map((b) => b.type)).toEqual(["load", "suggestRadius"]);
  });

  it("a second load started before the first answers wins; the first answer is dropped", async () => {
    const { store, actions } = setup(inThreadClient());
    const first = actions.loadText(csv, source);
    const second = actions.loadText("k,v\np,1\nq,2\nr,4\n", { fileName: "small.csv", fileSize: 20, isDemo: false });
    await Promise.all([first, second]);
    expect(store.getState().source?.fileName).toBe("small.csv");
    expect(store.getState().table?.rows).toBe(3);
  });
});

describe("actions: builds", () => {
  it("drops a stale build answer: of two rebuilds, the first answered last does not replace the second", async () => {
    const { client, state, parked, release } = delayingClient();
    const { store, actions } = setup(client);
    await actions.loadText(csv, source);
    state.hold = true;
    const early = actions.setRadius(0.5);
    const late = actions.setRadius(2);
    expect(parked.length).toBe(2);
    await release(1); // the second build answers first
    await late;
    const fresh = store.getState().result;
    expect(fresh?.params.radius).toBe(2);
    expect(store.getState().build.state).toBe("done");
    await release(0); // the first build answers last, with progress reports along the way
    await early;
    expect(store.getState().result).toBe(fresh);
    expect(store.getState().build).toMatchObject({ state: "done", fraction: 1, phase: null });
  });

  it("shows the latest build's progress while it runs", async () => {
    const { client, state, parked } = delayingClient();
    const { store, actions } = setup(client);
    await actions.loadText(csv, source);
    state.hold = true;
    const pending = actions.setSeed(2);
    expect(store.getState().build).toMatchObject({ state: "running", fraction: 0 });
    const entry = parked[0]!;
    entry.onProgress?.({ id: entry.request.id, type: "progress", phase: "members", fraction: 0.5 });
    expect(store.getState().build).toMatchObject({ state: "running", phase: "members", fraction: 0.5 });
    entry.resolve({ id: entry.request.id, type: "failed", message: "invalid radius: 0" });
    await pending;
    expect(store.getState().build).toEqual({ state: "failed", phase: null, fraction: 0, error: "invalid radius: 0", elapsedMs: null });
  });

  it("setRole rebuilds with the new features, and a new id demotes the old one to ignore", async () => {
    const { store, actions } = setup(inThreadClient());
    await actions.loadText(csv, source);
    const before = store.getState().result;
    await actions.setRole("risk", "outcome");
    expect(store.getState().result).not.toBe(before);
    expect(store.getState().result?.params.features).toEqual(["x", "y"]);
    await actions.setRole("site", "id");
    expect(store.getState().roles).toMatchObject({ name: "ignore", site: "id" });
  });

  it("setRadius and setSeed ignore invalid values without building", async () => {
    const { store, actions, client } = setup(inThreadClient());
    await actions.loadText(csv, source);
    const sent = client.sent.length;
    await actions.setRadius(-1);
    await actions.setRadius(NaN);
    await actions.setSeed(1.5);
    expect(client.sent.length).toBe(sent);
    expect(store.getState().seed).toBe(1);
  });

  it("selectNode sends only a nodeStats request (no build) and setColorBy only sets state", async () => {
    const { store, actions, client } = setup(inThreadClient());
    await actions.loadText(csv, source);
    const sent = client.sent.length;
    await actions.selectNode(0);
    actions.setColorBy("y");
    expect(store.getState()).toMatchObject({ selectedNode: 0, colorBy: "y" });
    expect(client.sent.slice(sent).map((b) => b.type)).toEqual(["nodeStats"]);
  });
});

describe("actions: exportCover", () => {
  it("returns null before anything is built", async () => {
    expect(await setup(inThreadClient()).actions.exportCover()).toBeNull();
  });

  it("returns a zip named after the file and radius whose members.csv carries the id column", async () => {
    const { store, actions } = setup(inThreadClient());
    await actions.loadText(csv, source);
    await actions.setRadius(0.5);
    const exported = (await actions.exportCover())!;
    expect(exported.fileName).toBe("plants-cover-r0.5.zip");
    const files = unzipSync(exported.bytes);
    const members = strFromU8(files["members.csv"]!).split("\n");
    expect(members[0]).toBe("node,row,name");
    const result = store.getState().result!;
    // node 1's first member, written as 1-based row and the name of that record
    const firstRow = result.members.items[0]!;
    expect(members[1]).toBe(`1,${firstRow + 1},${["ann", "bob", "cyd", "dee", "eve", "fay"][firstRow]}`);
    expect(Object.keys(files).sort()).toEqual(["edges.csv", "graph.graphml", "members.csv", "nodes.csv", "recipe.json", "summary.json"]); // recipe.json: how the tables were made
  });
});

describe("actions: loadDemo", () => {
  it("a failed demo read sets loadStatus failed with the reason", async () => {
    const { store, actions } = setup(inThreadClient());
    await actions.loadDemo();
    expect(store.getState()).toMatchObject({ loadStatus: "failed", loadError: "the demo table could not be read: Error: no demo in this test" });
  });

  it("a demo read loads the text with the demo's file name and marks it as the demo", async () => {
    const store = createWorkbenchStore();
    const actions = createActions(store, { client: inThreadClient(), fetchDemo: () => Promise.resolve(csv), now: steppingClock() });
    await actions.loadDemo();
    expect(store.getState().source).toMatchObject({ fileName: "pump-fleet.csv", isDemo: true, fileSize: csv.length });
  });
});
