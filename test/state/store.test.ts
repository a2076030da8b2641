import { describe, expect, it } from "vitest";
import { createWorkbenchStore, initialState } from "../../src/state/store.ts";

describe("createWorkbenchStore", () => {
  it("starts idle, with no table, no result, z-scores, the euclidean metric, greedy landmarks, seed 1 and no radius", () => {
    const s = createWorkbenchStore().getState();
    expect(s).toMatchObject({ source: null, table: null, loadStatus: "idle", loadError: null, result: null, selectedNode: null, colorBy: null });
    expect(s).toMatchObject({ scale: "zscore", metric: "euclidean", landmarks: "greedy-file-order", seed: 1, roles: {} });
    expect(s.radius).toBeNaN();
    expect(s.build).toEqual({ state: "idle", phase: null, fraction: 0, error: null, elapsedMs: null });
    expect(s).toEqual(initialState);
  });

  it("gives independent stores: a change to one leaves another as it was", () => {
    const a = createWorkbenchStore();
    const b = createWorkbenchStore();
    a.setState({ seed: 9, selectedNode: 2 });
    expect(a.getState()).toMatchObject({ seed: 9, selectedNode: 2 });
    expect(b.getState()).toMatchObject({ seed: 1, selectedNode: null });
  });

  it("updates immutably: setState gives a new state object and keeps untouched slices by identity", () => {
    const store = createWorkbenchStore();
    const before = store.getState();
    store.setState({ seed: 3 });
    const after = store.getState();
    expect(after).not.toBe(before);
    expect(before.seed).toBe(1);
    expect(after.build).toBe(before.build);
  });

  it("notifies subscribers with the new and the previous state", () => {
    const store = createWorkbenchStore();
    const seen: [number, number][] = [];
    store.subscribe((state, previous) => seen.push([state.seed, previous.seed]));
    store.setState({ seed: 4 });
    expect(seen).toEqual([[4, 1]]);
  });
});
