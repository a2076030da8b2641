// A newer compute request cancels the running one (worker/client.ts): the state of the cancelled
// task must not stay "running", or the graph's layout stays paused and progress bars stay up.
import { describe, expect, it } from "vitest";
import { createActions } from "../../src/state/actions.ts";
import { createWorkbenchStore } from "../../src/state/store.ts";
import { createHandler } from "../../src/worker/handle.ts";
import type { Answer, Request } from "../../src/worker/protocol.ts";
import type { WorkerClient } from "../../src/worker/client.ts";
import { noDemo, steppingClock } from "./support.ts";

/** Like the worker client: compute requests wait until `finish()`, and a new one answers the waiting ones "cancelled". */
function cancellingClient() {
  const handle = createHandler({ now: () => 0 });
  const waiting: { request: Request; resolve: (answer: Answer) => void }[] = [];
  let id = 0;
  const state = { hold: false };
  const client: WorkerClient = {
    cancel() {},
    send(body) {
      const request = { ...body, id: ++id } as Request;
      if (request.type === "load" || request.type === "adopt" || !state.hold) return Promise.resolve().then(() => handle(request, () => {}));
      for (const entry of waiting.splice(0)) entry.resolve({ id: entry.request.id, type: "cancelled" });
      return new Promise<Answer>((resolve) => waiting.push({ request, resolve }));
    },
  };
  const finish = async (): Promise<void> => {
    for (const entry of waiting.splice(0)) entry.resolve(await handle(entry.request, () => {}));
  };
  return { client, state, finish };
}

// a 6 × 6 grid: enough distinct points for a sweep's default range
const text = `x,y\n${Array.from({ length: 36 }, (_, i) => `${i % 6},${Math.floor(i / 6)}`).join("\n")}\n`;

async function setup() {
  const worker = cancellingClient();
  const store = createWorkbenchStore();
  const actions = createActions(store, { client: worker.client, fetchDemo: noDemo, now: steppingClock() });
  await actions.loadText(text, { fileName: "t.csv", fileSize: text.length, isDemo: false });
  worker.state.hold = true;
  return { worker, store, actions };
}

describe("actions: a newer compute request ends the running task's state", () => {
  it("a rebuild during a sweep leaves the sweep idle and the build done", async () => {
    const { worker, store, actions } = await setup();
    const sweep = actions.runSweep();
    expect(store.getState().stability.state).toBe("running");
    const build = actions.setRadius(2);
    await sweep;
    expect(store.getState().stability.state).toBe("idle");
    await worker.finish();
    await build;
    expect(store.getState().build.state).toBe("done");
  });

  it("a sweep or a seed run during a build leaves the build idle, and the run ends idle with its answer", async () => {
    const { worker, store, actions } = await setup();
    for (const run of [() => actions.runSweep(), () => actions.runSeedStability()]) {
      const build = actions.setRadius(1.5);
      expect(store.getState().build.state).toBe("running");
      const task = run();
      await build;
      expect(store.getState().build.state).toBe("idle");
      await worker.finish();
      await task;
      expect(store.getState().stability).toMatchObject({ state: "idle", error: null });
    }
    expect(store.getState().sweep).not.toBeNull();
    expect(store.getState().seedRuns).not.toBeNull();
  });
});
