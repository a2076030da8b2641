// The user's last action decides the radius: a default-radius answer requested before a typed
// radius never overwrites it, and the build that runs is the typed one.
import { describe, expect, it } from "vitest";
import { createActions } from "../../src/state/actions.ts";
import { createWorkbenchStore } from "../../src/state/store.ts";
import { noDemo, parkingClient, steppingClock } from "./support.ts";

const csv = "x,y\n0,0\n1,0\n0,1\n5,5\n6,5\n5,6\n";
const source = { fileName: "t.csv", fileSize: csv.length, isDemo: false };

async function loaded() {
  const worker = parkingClient(["suggestRadius"]);
  const store = createWorkbenchStore();
  const actions = createActions(store, { client: worker.client, fetchDemo: noDemo, now: steppingClock() });
  const load = actions.loadText(csv, source);
  await new Promise((resolve) => setTimeout(resolve, 0));
  await worker.release("suggestRadius");
  await load;
  return { worker, store, actions };
}

describe("actions: a radius typed while the default rule runs wins", () => {
  it("change the scaling, type radius 0.7 before the default answers: the graph is built at 0.7 with the new scaling, and stays", async () => {
    const { worker, store, actions } = await loaded();
    const rescale = actions.setScale("minmax");
    expect(worker.parked.map((p) => p.request.type)).toEqual(["suggestRadius"]);
    await actions.setRadius(0.7); // 0.7: any value the default rule would not give
    expect(store.getState().result?.params).toMatchObject({ radius: 0.7, scale: "minmax" });
    await worker.release("suggestRadius"); // the older default-radius answer arrives
    await rescale;
    const s = store.getState();
    expect(s.radius).toBe(0.7);
    expect(s.result?.params).toMatchObject({ radius: 0.7, scale: "minmax" });
    expect(worker.sent.filter((b) => b.type === "build").length).toBe(2); // the load's build and the typed one, no third
  });

  it("a default answer (123) from an isolated worker that ignored cancellation does not replace the typed radius 0.9 nor rebuild", async () => {
    const { worker, store, actions } = await loaded();
    const remetric = actions.setMetric("manhattan");
    await actions.setRadius(0.9); // 0.9: any value the default rule would not give
    await worker.release("suggestRadius", (request) => ({ id: request.id, type: "radius", radius: 123 })); // an isolated worker's step that ignored cancellation
    await remetric;
    expect(store.getState().radius).toBe(0.9);
    expect(store.getState().result?.params).toMatchObject({ radius: 0.9, metric: "manhattan" });
  });

  it("asking for the default again after typing a radius is the newer action: its answer is applied", async () => {
    const { worker, store, actions } = await loaded();
    await actions.setRadius(0.7); // 0.7: any value the default rule would not give
    const again = actions.suggestRadius();
    await worker.release("suggestRadius", (request) => ({ id: request.id, type: "radius", radius: 2.5 })); // 2.5: a stand-in answer
    await again;
    expect(store.getState().radius).toBe(2.5);
    expect(store.getState().result?.params.radius).toBe(2.5);
  });
});

describe("actions: the default rule finds no radius", () => {
  it("a failed default-radius answer shows its message as the build error and leaves no graph", async () => {
    const { worker, store, actions } = await loaded();
    expect(store.getState().result).not.toBeNull();
    const rescale = actions.setScale("robust");
    await worker.release("suggestRadius", (request) => ({ id: request.id, type: "failed", message: "no default radius: every feature is constant" })); // a stand-in message
    await rescale;
    const s = store.getState();
    expect(s.build).toEqual({ state: "failed", phase: null, fraction: 0, error: "no default radius: every feature is constant", elapsedMs: null });
    expect(s.result).toBeNull();
    expect(worker.sent.filter((b) => b.type === "build").length).toBe(1); // only the load's build
  });

  it("a default rule answering no positive radius (NaN) shows a build error naming the value and builds nothing", async () => {
    const { worker, store, actions } = await loaded();
    const rescale = actions.setScale("robust");
    await worker.release("suggestRadius", (request) => ({ id: request.id, type: "radius", radius: NaN })); // NaN: what the rule gave before it threw
    await rescale;
    expect(store.getState().build).toMatchObject({ state: "failed", error: "no default radius for this recipe: NaN" });
    expect(store.getState().result).toBeNull();
  });
});
