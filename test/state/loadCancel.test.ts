// A file load is never dropped without a word: a cancelled load says so, and the table shown stays.
import { describe, expect, it } from "vitest";
import { createActions } from "../../src/state/actions.ts";
import { createWorkbenchStore } from "../../src/state/store.ts";
import { noDemo, parkingClient, steppingClock } from "./support.ts";

const csv = "x,y\n0,0\n1,0\n0,1\n5,5\n";

async function withTable() {
  const worker = parkingClient(["load"]);
  const store = createWorkbenchStore();
  const actions = createActions(store, { client: worker.client, fetchDemo: noDemo, now: steppingClock() });
  const first = actions.loadText(csv, { fileName: "first.csv", fileSize: csv.length, isDemo: false });
  await worker.release("load");
  await first;
  return { worker, store, actions };
}

describe("actions: a cancelled load", () => {
  it("Cancel while second.csv is read leaves first.csv's table and says 'reading second.csv was cancelled; the table shown is unchanged'", async () => {
    const { worker, store, actions } = await withTable();
    const table = store.getState().table;
    const second = actions.loadText("k\n1\n2\n", { fileName: "second.csv", fileSize: 6, isDemo: false });
    actions.cancelLoad();
    await worker.release("load", (request) => ({ id: request.id, type: "cancelled" }));
    await second;
    const s = store.getState();
    expect(s.table).toBe(table);
    expect(s.loadStatus).toBe("ready");
    expect(s.loadNotice).toBe("reading second.csv was cancelled; the table shown is unchanged");
  });

  it("a load answered 'cancelled' that the user did not cancel says so too", async () => {
    const { worker, store, actions } = await withTable();
    const second = actions.loadText("k\n1\n2\n", { fileName: "second.csv", fileSize: 6, isDemo: false });
    await worker.release("load", (request) => ({ id: request.id, type: "cancelled" }));
    await second;
    expect(store.getState()).toMatchObject({ loadStatus: "ready", loadNotice: "reading second.csv was cancelled; the table shown is unchanged" });
  });

  it("the next load clears the notice", async () => {
    const { worker, store, actions } = await withTable();
    const second = actions.loadText("k\n1\n2\n", { fileName: "second.csv", fileSize: 6, isDemo: false });
    actions.cancelLoad();
    await worker.release("load", (request) => ({ id: request.id, type: "cancelled" }));
    await second;
    void actions.loadText(csv, { fileName: "third.csv", fileSize: csv.length, isDemo: false });
    expect(store.getState().loadNotice).toBeNull();
  });
});
