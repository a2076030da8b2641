// The store over the real worker client in a page without cross-origin isolation: cancelling a
// build ends the worker, and a file load queued behind that build must still arrive.
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { createActions } from "../../src/state/actions.ts";
import { createWorkbenchStore } from "../../src/state/store.ts";
import { createWorkerClient } from "../../src/worker/client.ts";
import { createHandler } from "../../src/worker/handle.ts";
import type { Request } from "../../src/worker/protocol.ts";
import { noDemo, steppingClock } from "./support.ts";

/** A Worker that runs the real handler one request at a time; builds wait while `holdBuilds` is set, as a long build would. */
class HandlerWorker {
  static holdBuilds = false;
  static made: HandlerWorker[] = [];
  onmessage: ((event: { data: unknown }) => void) | null = null;
  onerror: ((event: { message: string }) => void) | null = null;
  private readonly handle = createHandler({ now: () => 0 });
  private readonly queue: Request[] = [];
  private ended = false;
  private busy = false;
  constructor() {
    HandlerWorker.made.push(this);
  }
  postMessage(request: Request): void {
    this.queue.push(request);
    void this.work();
  }
  terminate(): void {
    this.ended = true;
  }
  private async work(): Promise<void> {
    if (this.busy) return;
    this.busy = true;
    while (this.queue.length > 0 && !this.ended) {
      if (this.queue[0]!.type === "build" && HandlerWorker.holdBuilds) {
        await new Promise((resolve) => setTimeout(resolve, 1));
        continue;
      }
      const request = this.queue.shift()!;
      const answer = await this.handle(request, () => {});
      await new Promise((resolve) => setTimeout(resolve, 0));
      if (!this.ended) this.onmessage?.({ data: answer });
    }
    this.busy = false;
  }
}

const first = "x,y\n0,0\n1,0\n0,1\n5,5\n";
const second = "u,v,w\n1,2,3\n4,5,6\n7,8,9\n";

beforeEach(() => {
  HandlerWorker.made = [];
  HandlerWorker.holdBuilds = false;
  vi.stubGlobal("Worker", HandlerWorker);
});
afterEach(() => {
  vi.unstubAllGlobals();
});

describe("actions over the worker client: a build cancelled while a file load waits behind it", () => {
  it("the load still arrives: the second table (columns u, v, w) is the one shown and built", async () => {
    const store = createWorkbenchStore();
    const actions = createActions(store, { client: createWorkerClient(), fetchDemo: noDemo, now: steppingClock() });
    await actions.loadText(first, { fileName: "first.csv", fileSize: first.length, isDemo: false });
    expect(store.getState().build.state).toBe("done");
    HandlerWorker.holdBuilds = true;
    const building = actions.setSeed(2); // a long build
    const loading = actions.loadText(second, { fileName: "second.csv", fileSize: second.length, isDemo: false }); // queued behind it
    actions.cancelBuild(); // ends the worker: only the build may be cancelled
    HandlerWorker.holdBuilds = false;
    await building;
    await loading;
    const s = store.getState();
    expect(HandlerWorker.made.length).toBe(2); // the worker was restarted
    expect(s.loadStatus).toBe("ready");
    expect(s.table?.columns.map((c) => c.name)).toEqual(["u", "v", "w"]);
    expect(s.result?.params.features).toEqual(["u", "v", "w"]);
  });
});
