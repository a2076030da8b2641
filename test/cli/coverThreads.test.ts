// The threaded build on real worker_threads (src/cli/coverThread.ts, loaded through tsx as the
// command does from source) against the one-thread build, and its cancel.
import { afterAll, describe, expect, it } from "vitest";
import fc from "fast-check";
import { buildCover, buildCoverOnThreads, Cancelled, isCancelled, type BuildPhase, type CoverTask, type PartRunner } from "../../src/core/index.ts";
import { nodePartRunner } from "../../src/cli/nodePartRunner.ts";
import { buildArrays, splitCase } from "../core/support/splitCase.ts";
import { uniformCube } from "../../bench/syntheticTables.ts";

const runner = nodePartRunner({ threads: 2 })!;
afterAll(() => runner.close());

/** The runner, noting which kinds of task went to the helper. */
function noting(inner: PartRunner, kinds: Set<CoverTask["kind"]>): PartRunner {
  return { ...inner, run: (task, ranges, control) => (kinds.add(task.kind), inner.run(task, ranges, control)) };
}

describe("buildCoverOnThreads on worker_threads", () => {
  it("gives buildCover's landmarks, members, edges, components and b0/b1 bit for bit with two threads (every metric and rule), both steps split", async () => {
    const kinds = new Set<CoverTask["kind"]>();
    const threaded = noting(runner, kinds);
    await fc.assert(
      fc.asyncProperty(splitCase, async ({ parsed, params }) => {
        const two = await buildCoverOnThreads(parsed, params, threaded, { minPartWork: 0 });
        expect(buildArrays(two)).toEqual(buildArrays(buildCover(parsed, params)));
      }),
      { numRuns: 25 },
    );
    expect([...kinds].sort()).toEqual(["balls", "edges"]);
  }, 120_000);

  it("stops with Cancelled when shouldStop turns true while both threads find balls (the delay is printed, not asserted: npm run bench:browser times Cancel), and the runner then builds again", async () => {
    // 6,000 rows in 40 columns: the index prunes little, so the balls are found after the net, in parts
    const parsed = uniformCube(6000, 40, 3);
    const params = { features: parsed.columns.map((c) => c.name), scale: "zscore" as const, metric: "euclidean" as const, radius: 6, landmarks: "greedy-file-order" as const, seed: 1 };
    let stopAt = Infinity;
    const phases: BuildPhase[] = [];
    const started = buildCoverOnThreads(parsed, params, runner, {
      onPhase: (phase) => {
        phases.push(phase);
        if (phase === "members") stopAt = performance.now() + 30;
      },
      shouldStop: () => performance.now() >= stopAt,
    });
    const error = await started.catch((e: unknown) => e);
    const late = performance.now() - stopAt;
    expect(isCancelled(error)).toBe(true);
    expect(error).toBeInstanceOf(Cancelled);
    expect(phases.at(-1)).toBe("members");
    console.log(`cancel → Cancelled: ${late.toFixed(0)} ms (the budget in DEVELOPERS.md is 200 ms; timings are not asserted in tests)`);
    const small = uniformCube(300, 40, 4);
    const smallParams = { ...params, features: small.columns.map((c) => c.name), radius: 5 };
    expect(buildArrays(await buildCoverOnThreads(small, smallParams, runner, { minPartWork: 0 }))).toEqual(buildArrays(buildCover(small, smallParams)));
  }, 60_000);

  it("gives buildCover's result when the helper thread cannot start (its parts run in this thread)", async () => {
    const broken = nodePartRunner({ threads: 2, entry: new URL("./no-such-helper.mjs", import.meta.url) })!;
    const parsed = uniformCube(400, 12, 5);
    const params = { features: parsed.columns.map((c) => c.name), scale: "zscore" as const, metric: "euclidean" as const, radius: 2, landmarks: "greedy-file-order" as const, seed: 1 };
    try {
      expect(buildArrays(await buildCoverOnThreads(parsed, params, broken, { minPartWork: 0 }))).toEqual(buildArrays(buildCover(parsed, params)));
    } finally {
      broken.close();
    }
  }, 60_000);
});
