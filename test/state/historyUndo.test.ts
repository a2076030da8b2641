import { describe, expect, it } from "vitest";
import { createUndoHistory, defaultHistoryCap } from "../../src/state/history/undoHistory.ts";

const byValue = (n: number): string => String(n);

describe("createUndoHistory", () => {
  it("undo walks back through recorded steps and redo walks forward again (1, 2, 3: worked by hand)", () => {
    const history = createUndoHistory(byValue);
    [1, 2, 3].forEach((n) => history.record(n));
    expect(history.depth()).toEqual({ undo: 2, redo: 0 }); // three entries, cursor on the last (worked by hand)
    expect(history.undo()).toBe(2);
    expect(history.undo()).toBe(1);
    expect(history.undo()).toBeNull();
    expect(history.depth()).toEqual({ undo: 0, redo: 2 });
    expect(history.redo()).toBe(2);
    expect(history.redo()).toBe(3);
    expect(history.redo()).toBeNull();
  });

  it("a new step after an undo drops the redo tail: 1, 2, 3, undo, 4 leaves 1, 2, 4", () => {
    const history = createUndoHistory(byValue);
    [1, 2, 3].forEach((n) => history.record(n));
    history.undo();
    expect(history.record(4)).toBe(true);
    expect(history.depth()).toEqual({ undo: 2, redo: 0 }); // 1, 2, 4 (worked by hand)
    expect(history.redo()).toBeNull();
    expect([history.undo(), history.undo(), history.undo()]).toEqual([2, 1, null]);
  });

  it("a snapshot equal to the current one is not stored again, but an earlier equal one is", () => {
    const history = createUndoHistory(byValue);
    expect([history.record(1), history.record(1), history.record(2), history.record(1)]).toEqual([true, false, true, true]);
    expect(history.depth()).toEqual({ undo: 2, redo: 0 }); // 1, 2, 1 (worked by hand)
  });

  it("recording the snapshot an undo returned changes nothing: the redo tail stays", () => {
    const history = createUndoHistory(byValue);
    [1, 2].forEach((n) => history.record(n));
    const back = history.undo()!;
    expect(history.record(back)).toBe(false);
    expect(history.depth()).toEqual({ undo: 0, redo: 1 });
  });

  it("keeps at most the cap: 150 steps with the default cap of 100 leave 99 undos, back to step 51", () => {
    const history = createUndoHistory(byValue);
    for (let n = 1; n <= 150; ++n) history.record(n);
    expect(defaultHistoryCap).toBe(100); // our choice (at least 50 steps are required)
    expect(history.depth()).toEqual({ undo: 99, redo: 0 }); // entries 51..150 (worked by hand)
    let last: number | null = null;
    for (let step = 0; step < 99; ++step) last = history.undo();
    expect(last).toBe(51);
    expect(history.undo()).toBeNull();
  });

  it("at least 50 undo steps are there with the default cap", () => {
    const history = createUndoHistory(byValue);
    for (let n = 0; n <= 50; ++n) history.record(n);
    for (let step = 0; step < 50; ++step) expect(history.undo()).toBe(49 - step);
  });

  it("reset forgets every step; current is null", () => {
    const history = createUndoHistory(byValue);
    [1, 2].forEach((n) => history.record(n));
    history.reset();
    expect(history.current()).toBeNull();
    expect(history.depth()).toEqual({ undo: 0, redo: 0 });
    expect(history.undo()).toBeNull();
  });

  it("refuses a cap below 2 with the bad value in the message", () => {
    expect(() => createUndoHistory(byValue, 1)).toThrow("invalid history cap: 1");
  });
});
