import { describe, expect, it } from "vitest";
import { runCoverPart, type CoverParams, type PartRunner } from "../../src/core/index.ts";
import { loadText, now } from "./answers.ts";
import { createHandler } from "../../src/worker/handle.ts";
import type { Answer } from "../../src/worker/protocol.ts";

const ignore = (): void => {};
// 400 rows on a 20 × 20 grid: many landmarks at radius 0.3 (z-scored), so both split steps split
const csv = `x,y\n${Array.from({ length: 400 }, (_, i) => `${i % 20},${Math.floor(i / 20)}`).join("\n")}\n`;
const params: CoverParams = Object.freeze({ features: ["x", "y"], scale: "zscore", metric: "euclidean", radius: 0.3, landmarks: "greedy-file-order", seed: 1 });

/** A runner whose "helper" runs each part in this thread, and counts the parts. */
function inThreadRunner(counted: { parts: number }): PartRunner {
  return {
    threads: 2,
    minPartWork: 0,
    share: null,
    run: async (task, ranges) => ranges.map((range) => (++counted.parts, runCoverPart(task, range))),
    abort: () => undefined,
    close: () => undefined,
  };
}

describe("worker handler: builds with a part runner", () => {
  it("answers 'built' later with the one-thread answer's result, the balls' or the edges' step split into parts", async () => {
    const counted = { parts: 0 };
    const threaded = createHandler({ now: () => 0, partRunner: inThreadRunner(counted) });
    const alone = createHandler({ now: () => 0 });
    expect(now(threaded(loadText(1, csv), ignore)).type).toBe("loaded");
    expect(now(alone(loadText(1, csv), ignore)).type).toBe("loaded");
    const pending = threaded({ id: 2, type: "build", params }, ignore);
    expect(pending).toBeInstanceOf(Promise);
    const two = (await pending) as Answer;
    const one = now(alone({ id: 2, type: "build", params }, ignore));
    if (two.type !== "built" || one.type !== "built") throw new Error(`expected built answers, got ${two.type} and ${one.type}`);
    expect({ ...two.result, timings: null }).toEqual({ ...one.result, timings: null });
    expect(counted.parts).toBeGreaterThan(0);
  });

  it("answers 'failed' for a bad radius with a part runner too", async () => {
    const handle = createHandler({ partRunner: inThreadRunner({ parts: 0 }) });
    now(handle(loadText(1, csv), ignore));
    expect(await handle({ id: 2, type: "build", params: { ...params, radius: -1 } }, ignore)).toEqual({ id: 2, type: "failed", message: "invalid radius: -1" });
  });
});
