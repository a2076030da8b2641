// Answers arriving in worker order (first in, first out) while the user loads a second table.
import { describe, expect, it } from "vitest";
import { createActions } from "../../src/state/actions.ts";
import { createWorkbenchStore } from "../../src/state/store.ts";
import { noDemo, queuedClient, steppingClock } from "./support.ts";

const first = "name,x,y\nann,0,0\nbob,1,0\ncyd,0,1\ndee,5,5\n";
const second = (text: string) => ({ text, source: { fileName: "second.csv", fileSize: text.length, isDemo: false } });

function setup() {
  const worker = queuedClient();
  const store = createWorkbenchStore();
  const actions = createActions(store, { client: worker.client, fetchDemo: noDemo, now: steppingClock() });
  return { worker, store, actions };
}

describe("actions: a second load while the first table's radius is being suggested", () => {
  it("answers in worker order for a single load: load, suggestRadius, build", async () => {
    const { worker, store, actions } = setup();
    const done = actions.loadText(first, { fileName: "first.csv", fileSize: first.length, isDemo: false });
    expect(worker.pending()).toEqual(["load"]);
    await worker.step();
    expect(worker.pending()).toEqual(["suggestRadius"]);
    await worker.step();
    expect(worker.pending()).toEqual(["build"]);
    await worker.step();
    await done;
    expect(store.getState().build.state).toBe("done");
  });

  // Bug (src/state/actions.ts, suggestRadius, lines 45–56 as of this writing): the radius answer
  // carries no ticket. Here the first table's suggestion arrives after the second load was sent,
  // so it sets the first table's radius and starts a build with the first table's features
  // (["x", "y"]) and a fresh build ticket; the worker runs it on the second table (loaded just
  // before it) and answers "unknown column: x", which is shown as the second table's build
  // error. Expected: the second table (no numeric column, so nothing to build) with no build
  // error. Got: build { state: "failed", error: "unknown column: x" }.
  it("a radius suggested for the first table does not start a build once a second load has begun", async () => {
    const { worker, store, actions } = setup();
    const a = actions.loadText(first, { fileName: "first.csv", fileSize: first.length, isDemo: false });
    await worker.step(); // first table loaded; its suggestRadius is waiting
    const { text, source } = second("label,note\np,a\nq,b\n");
    const b = actions.loadText(text, source); // the second load is queued behind that suggestion
    await worker.drain();
    await Promise.all([a, b]);
    const s = store.getState();
    expect(s.table?.columns.map((c) => c.name)).toEqual(["label", "note"]);
    expect(s.build.state).not.toBe("failed");
    expect(s.build.error).toBeNull();
  });

  it("once everything is answered, a second table with features ends with its own radius and graph", async () => {
    const { worker, store, actions } = setup();
    const a = actions.loadText(first, { fileName: "first.csv", fileSize: first.length, isDemo: false });
    await worker.step();
    const { text, source } = second("id,u\nr1,0\nr2,10\nr3,20\n");
    const b = actions.loadText(text, source);
    await worker.drain();
    await Promise.all([a, b]);
    const s = store.getState();
    expect(s.source?.fileName).toBe("second.csv");
    expect(s.result?.params.features).toEqual(["u"]);
    expect(s.result?.params.radius).toBe(s.radius);
    expect(s.build.state).toBe("done");
  });
});
