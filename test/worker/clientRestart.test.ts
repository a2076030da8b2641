// Without cross-origin isolation the client cancels by ending the worker and starting a new one.
// Only the cancelled lane's requests may end "cancelled"; the rest (a file load among them) are
// asked again of the new worker. The Worker here is a fake that records what it is sent.
import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { createWorkerClient } from "../../src/worker/client.ts";
import type { CoverParams, ParsedTable } from "../../src/core/index.ts";
import { lane, type Answer, type Request, type WorkerMessage } from "../../src/worker/protocol.ts";

class FakeWorker {
  static made: FakeWorker[] = [];
  readonly sent: (Request | { type: "setup" })[] = [];
  terminated = false;
  onmessage: ((event: { data: WorkerMessage }) => void) | null = null;
  onerror: ((event: { message: string }) => void) | null = null;
  constructor() {
    FakeWorker.made.push(this);
  }
  postMessage(message: Request): void {
    this.sent.push(message);
  }
  terminate(): void {
    this.terminated = true;
  }
  answer(message: WorkerMessage): void {
    this.onmessage?.({ data: message });
  }
}

const params: CoverParams = Object.freeze({ features: ["x"], scale: "zscore", metric: "euclidean", radius: 1, landmarks: "greedy-file-order", seed: 1 });
const file = new Blob(["x\n1\n2\n"]);
const table = { rows: 2, columns: [] } as unknown as ParsedTable;
const settle = (): Promise<void> => new Promise((resolve) => setTimeout(resolve, 0));

beforeEach(() => {
  FakeWorker.made = [];
  vi.stubGlobal("Worker", FakeWorker);
});
afterEach(() => {
  vi.unstubAllGlobals();
});

describe("worker client with a Worker and no shared memory: cancelling restarts the worker", () => {
  it("a newer build cancels the older build only; the pending file load is sent again to the new worker and its answer arrives", async () => {
    const client = createWorkerClient();
    const answers: Answer[] = [];
    const load = client.send({ type: "load", source: { kind: "file", file }, options: {} }).then((a) => void answers.push(a));
    const older = client.send({ type: "build", params }).then((a) => void answers.push(a));
    const newer = client.send({ type: "build", params: { ...params, radius: 2 } });
    await older;
    expect(answers).toEqual([{ id: 2, type: "cancelled" }]);
    const [first, second] = FakeWorker.made;
    expect(first!.terminated).toBe(true);
    expect(second!.sent.map((m) => `${m.type}${"id" in m ? m.id : ""}`)).toEqual(["load1", "build3"]);
    second!.answer({ id: 1, type: "loaded", table, report: {} as never, fingerprint: { bytes: 0, sha256: "" } });
    await load;
    expect(answers[1]).toMatchObject({ id: 1, type: "loaded" });
    second!.answer({ id: 3, type: "built", result: {} as never });
    expect(await newer).toMatchObject({ id: 3, type: "built" });
  });

  it("cancelling the load lane answers the load 'cancelled' and sends a waiting build again, after handing over the last table", async () => {
    const client = createWorkerClient();
    const firstLoad = client.send({ type: "load", source: { kind: "file", file }, options: {} });
    FakeWorker.made[0]!.answer({ id: 1, type: "loaded", table, report: {} as never, fingerprint: { bytes: 0, sha256: "" } });
    await firstLoad;
    const secondLoad = client.send({ type: "load", source: { kind: "file", file }, options: {} });
    const build = client.send({ type: "build", params });
    client.cancel("load");
    expect(await secondLoad).toEqual({ id: 2, type: "cancelled" });
    const restarted = FakeWorker.made[1]!;
    expect(restarted.sent.map((m) => m.type)).toEqual(["adopt", "build"]);
    expect(restarted.sent[0]).toMatchObject({ type: "adopt", table });
    restarted.answer({ id: 3, type: "built", result: {} as never });
    expect(await build).toMatchObject({ id: 3, type: "built" });
  });

  it("an answer still arriving from the ended worker is ignored; the request is answered by the new worker", async () => {
    const client = createWorkerClient();
    const load = client.send({ type: "load", source: { kind: "file", file }, options: {} });
    void client.send({ type: "build", params });
    void client.send({ type: "build", params });
    const [ended, restarted] = FakeWorker.made;
    ended!.answer({ id: 1, type: "failed", message: "from the ended worker" });
    await settle();
    restarted!.answer({ id: 1, type: "loaded", table, report: {} as never, fingerprint: { bytes: 0, sha256: "" } });
    expect(await load).toMatchObject({ id: 1, type: "loaded" });
  });
});

describe("worker client with a Worker: a request that cannot be posted", () => {
  it("answers 'failed' with the browser's message, and a later restart does not post it again", async () => {
    const client = createWorkerClient();
    const worker = FakeWorker.made[0]!;
    const post = worker.postMessage.bind(worker);
    worker.postMessage = (message: Request) => {
      if (message.type === "exportZip") throw new Error("could not clone the request");
      post(message);
    };
    const exported = await client.send({ type: "exportZip", result: {} as never, context: { fileName: "t.csv", fileSize: 1, idColumn: null, outcomes: [] } });
    expect(exported).toEqual({ id: 1, type: "failed", message: "could not clone the request" });
    void client.send({ type: "build", params });
    void client.send({ type: "build", params });
    expect(FakeWorker.made[1]!.sent.map((m) => m.type)).toEqual(["build"]);
  });
});

describe("region tables: a newer one cancels the older, and nothing else", () => {
  const regionTable = (first: number) =>
    ({ type: "regionTable", rowsRead: 2, usedRows: new Uint32Array([0, 1]), region: new Uint32Array([first]), versus: null, labelColumn: null }) as const;

  it("without shared memory: the older region table answers 'cancelled'; a node-statistics request and the newer table are sent again", async () => {
    const client = createWorkerClient();
    const older = client.send(regionTable(0));
    void client.send({ type: "nodeStats", rows: new Uint32Array([0]), columns: ["x"] });
    void client.send(regionTable(1));
    expect(await older).toEqual({ id: 1, type: "cancelled" });
    const second = FakeWorker.made[1]!;
    expect(second.sent.map((m) => `${m.type}${"id" in m ? m.id : ""}`)).toEqual(["nodeStats2", "regionTable3"]);
  });

  it("with shared memory: sending a region table sets the region lane's flag to the older id and leaves the view and compute flags at 0", () => {
    vi.stubGlobal("crossOriginIsolated", true);
    const client = createWorkerClient();
    const setup = FakeWorker.made[0]!.sent[0] as unknown as { cancelFlags: Int32Array };
    void client.send({ type: "build", params });
    void client.send({ type: "exportZip", result: {} as never, context: {} as never });
    void client.send(regionTable(0));
    void client.send(regionTable(1));
    expect(setup.cancelFlags[lane.region]).toBe(3); // request 3 is the older region table
    expect([setup.cancelFlags[lane.view], setup.cancelFlags[lane.compute]]).toEqual([0, 0]);
  });
});
