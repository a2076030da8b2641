// Node statistics and the export zip come from the worker: nothing table-sized is computed on the
// page's thread, an older answer never replaces a newer one, and a failure leaves a message.
import { strFromU8, unzipSync } from "fflate";
import { describe, expect, it } from "vitest";
import { createActions } from "../../src/state/actions.ts";
import { selectNodeDetail } from "../../src/state/selectors.ts";
import { createWorkbenchStore } from "../../src/state/store.ts";
import { assertClose } from "../assertClose.ts";
import { noDemo, parkingClient, steppingClock } from "./support.ts";

// two groups on x: {0, 1, 2} and {10, 11, 12}. Worked by hand: sd of x is √(154/5) = 5.55, so radius 0.5 in
// z-units is 2.77 raw; distances within a group are at most 2 and between groups at least 8: two balls
const csv = "name,x\na,0\nb,1\nc,2\nd,10\ne,11\nf,12\n";
const source = { fileName: "two.csv", fileSize: csv.length, isDemo: false };

async function built(held: ("nodeStats" | "exportZip")[]) {
  const worker = parkingClient(held);
  const store = createWorkbenchStore();
  const actions = createActions(store, { client: worker.client, fetchDemo: noDemo, now: steppingClock() });
  await actions.loadText(csv, source);
  await actions.setRadius(0.5);
  expect(store.getState().result!.landmarks.length).toBe(2); // worked by hand: greedy net in file order picks a, then d
  return { worker, store, actions };
}

describe("actions: node statistics from the worker", () => {
  it("opening node 0 shows 'running' with no columns until the worker answers, then x's node mean 1", async () => {
    const { worker, store, actions } = await built(["nodeStats"]);
    const opened = actions.selectNode(0);
    expect(selectNodeDetail(store.getState())).toMatchObject({ node: 0, size: 3, statsState: "running", columns: [] });
    expect(worker.sent.at(-1)).toMatchObject({ type: "nodeStats", columns: ["x"] });
    await worker.release("nodeStats");
    await opened;
    const detail = selectNodeDetail(store.getState())!;
    expect(detail.statsState).toBe("done");
    assertClose(detail.columns[0]!.summary.mean, 1); // worked by hand: (0 + 1 + 2)/3
  });

  it("the answer for node 0 arriving after node 1 was opened is dropped: node 1's mean 11 stays", async () => {
    const { worker, store, actions } = await built(["nodeStats"]);
    const first = actions.selectNode(0);
    const second = actions.selectNode(1);
    worker.parked.reverse(); // the worker answers node 1 first
    await worker.release("nodeStats");
    await second;
    await worker.release("nodeStats");
    await first;
    const detail = selectNodeDetail(store.getState())!;
    expect(detail.node).toBe(1);
    assertClose(detail.columns[0]!.summary.mean, 11); // worked by hand: (10 + 11 + 12)/3
  });

  it("a failed statistics answer shows 'failed' with the worker's message in the node detail", async () => {
    const { worker, store, actions } = await built(["nodeStats"]);
    const opened = actions.selectNode(1);
    await worker.release("nodeStats", (request) => ({ id: request.id, type: "failed", message: "unknown numeric column: x" })); // a stand-in message
    await opened;
    expect(selectNodeDetail(store.getState())).toMatchObject({ node: 1, statsState: "failed", statsError: "unknown numeric column: x", columns: [] });
  });

  it("opening the same node again does not ask the worker twice", async () => {
    const { worker, actions } = await built([]);
    await actions.selectNode(0);
    await actions.selectNode(0);
    expect(worker.sent.filter((b) => b.type === "nodeStats").length).toBe(1);
  });
});

describe("actions: the export zip from the worker", () => {
  it("is asked of the worker and named two-cover-r0.5.zip; members.csv starts 'node,row,name'", async () => {
    const { worker, store, actions } = await built([]);
    const exported = (await actions.exportCover())!;
    expect(worker.sent.at(-1)).toMatchObject({ type: "exportZip", context: { fileName: "two.csv", idColumn: "name" } });
    expect(exported.fileName).toBe("two-cover-r0.5.zip");
    expect(strFromU8(unzipSync(exported.bytes)["members.csv"]!).split("\n")[0]).toBe("node,row,name");
    expect(store.getState().exportStatus).toEqual({ state: "idle", error: null });
  });

  it("a failed export returns null and sets exportStatus failed with the worker's message", async () => {
    const { worker, store, actions } = await built(["exportZip"]);
    const exporting = actions.exportCover();
    expect(store.getState().exportStatus.state).toBe("running");
    await worker.release("exportZip", (request) => ({ id: request.id, type: "failed", message: "no table is loaded" })); // a stand-in message
    expect(await exporting).toBeNull();
    expect(store.getState().exportStatus).toEqual({ state: "failed", error: "no table is loaded" });
  });

  it("of two exports, the older answer gives null and only the newer gives bytes", async () => {
    const { worker, actions } = await built(["exportZip"]);
    const older = actions.exportCover();
    const newer = actions.exportCover();
    await worker.release("exportZip");
    await worker.release("exportZip");
    expect(await older).toBeNull();
    expect((await newer)?.fileName).toBe("two-cover-r0.5.zip");
  });
});

describe("actions: saving the export", () => {
  it("hands the zip to save once; a save that throws sets exportStatus failed 'the zip could not be saved: no downloads here'", async () => {
    const { store, actions } = await built([]);
    const saved: string[] = [];
    await actions.exportCover((file) => void saved.push(file.fileName));
    expect(saved).toEqual(["two-cover-r0.5.zip"]);
    const result = await actions.exportCover(() => {
      throw new Error("no downloads here");
    });
    expect(result).toBeNull();
    expect(store.getState().exportStatus).toEqual({ state: "failed", error: "the zip could not be saved: no downloads here" });
  });
});
