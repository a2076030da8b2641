import { describe, expect, it } from "vitest";
import type { CoverParams } from "../../src/core/index.ts";
import { loadText, now } from "./answers.ts";
import { createHandler, flagsStopper } from "../../src/worker/handle.ts";
import { lane, type Progress, type Request } from "../../src/worker/protocol.ts";

const rows = Array.from({ length: 200 }, (_, i) => `${i % 17},${(i * 7) % 23}`);
const csv = `x,y\n${rows.join("\n")}\n`;
const params: CoverParams = Object.freeze({ features: ["x", "y"], scale: "zscore", metric: "euclidean", radius: 0.3, landmarks: "greedy-file-order", seed: 1 });
const ignore = (): void => {};

describe("worker cancellation", () => {
  it("a request already stopped when it starts answers 'cancelled' and does not replace the table", () => {
    const handle = createHandler({ isStopped: (request) => request.type === "load" && request.id === 2 });
    expect(now(handle(loadText(1, csv), ignore)).type).toBe("loaded");
    expect(now(handle(loadText(2, "a,b\n1,2\n"), ignore))).toEqual({ id: 2, type: "cancelled" });
    const built = now(handle({ id: 3, type: "build", params }, ignore));
    expect(built.type).toBe("built"); // the first table (x, y) is still there
  });

  it("a build stopped while it runs answers 'cancelled' at its next progress check", () => {
    let stopped = false;
    const handle = createHandler({ isStopped: () => stopped, progressInterval: 0 });
    now(handle(loadText(1, csv), ignore));
    const phases: string[] = [];
    const answer = now(handle({ id: 2, type: "build", params }, (p: Progress) => {
      phases.push(p.phase);
      if (p.phase === "landmarks") stopped = true; // the main thread cancels during the net
    }));
    expect(answer).toEqual({ id: 2, type: "cancelled" });
    expect(phases).not.toContain("edges"); // it stopped before the later phases
  });

  it("a default-radius request stopped after its first progress report answers 'cancelled', not a radius", () => {
    let stopped = false;
    const handle = createHandler({ isStopped: () => stopped, progressInterval: 0 });
    now(handle(loadText(1, csv), ignore));
    const phases: string[] = [];
    const answer = now(handle({ id: 2, type: "suggestRadius", params: { features: ["x", "y"], scale: "zscore", metric: "euclidean" } }, (p: Progress) => {
      phases.push(p.phase);
      stopped = true; // the main thread cancels while the rule bisects
    }));
    expect(phases[0]).toBe("suggest");
    expect(answer).toEqual({ id: 2, type: "cancelled" });
  });

  it("shared flags stop every request of a lane with an id up to the stored value, and no other lane", () => {
    const flags = new Int32Array(new SharedArrayBuffer(8));
    const stopped = flagsStopper(flags);
    const build = (id: number): Request => ({ id, type: "build", params });
    const load = (id: number): Request => loadText(id, "");
    Atomics.store(flags, lane.compute, 5);
    expect([4, 5, 6].map((id) => stopped(build(id)))).toEqual([true, true, false]);
    expect(stopped(load(3))).toBe(false);
    Atomics.store(flags, lane.load, 3);
    expect(stopped(load(3))).toBe(true);
  });

  it("progress reports of one request are at least progressInterval apart by the clock, except the final fraction 1", () => {
    let clock = 0;
    const handle = createHandler({ now: () => (clock += 10), progressInterval: 45 });
    now(handle(loadText(1, csv), ignore));
    const times: number[] = [];
    now(handle({ id: 2, type: "build", params }, (p) => {
      if (p.fraction < 1) times.push(clock);
    }));
    for (let k = 1; k < times.length; ++k) expect(times[k]! - times[k - 1]!).toBeGreaterThanOrEqual(45);
  });
});
