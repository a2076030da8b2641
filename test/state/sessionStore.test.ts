import "fake-indexeddb/auto";
import { describe, expect, it } from "vitest";
import { idbSessionStorage } from "../../src/state/session/sessionStore.ts";

let databases = 0;
const fresh = () => idbSessionStorage({ name: `shoal-session-test-${++databases}`, store: "kept" });

describe("idbSessionStorage over fake-indexeddb", () => {
  it("a value set is read back equal, typed arrays included, and another storage on the same database sees it", async () => {
    const database = { name: `shoal-session-test-${++databases}`, store: "kept" };
    const storage = idbSessionStorage(database);
    const record = { version: 1, selection: [2, 5], bytes: new Uint8Array([1, 2, 3]) };
    await storage.set("session", record);
    expect(await storage.get("session")).toEqual(record);
    expect(await idbSessionStorage(database).get("session")).toEqual(record); // what a reload finds
  });

  it("get of a key never set is undefined; keys lists only what is there", async () => {
    const storage = fresh();
    expect(await storage.get("table-bytes")).toBeUndefined();
    await storage.set("session", { version: 1 });
    expect(await storage.keys()).toEqual(["session"]);
  });

  it("clear removes every kept key: session and table bytes", async () => {
    const storage = fresh();
    await storage.set("session", { version: 1 });
    await storage.set("table-bytes", new Uint8Array(8));
    await storage.clear();
    expect(await storage.keys()).toEqual([]);
    expect(await storage.get("session")).toBeUndefined();
  });

  it("delete removes one key and leaves the other", async () => {
    const storage = fresh();
    await storage.set("session", { version: 1 });
    await storage.set("table-bytes", new Uint8Array(8));
    await storage.delete("table-bytes");
    expect(await storage.keys()).toEqual(["session"]);
  });
});
