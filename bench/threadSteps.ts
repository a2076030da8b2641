// The build on two threads (buildCoverOnThreads over worker_threads) beside the one-thread build
// of bench/run.ts: per-step medians and the speed-up of each step, which steps were split, and
// whether the result is the same bit for bit.
import { performance } from "node:perf_hooks";
import { buildCoverOnThreads, type CoverParams, type CoverResult, type CoverTask, type ParsedTable, type PartRunner } from "../src/core/index.ts";
import { nodePartRunner } from "../src/cli/nodePartRunner.ts";

const median = (xs: readonly number[]): number => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
const same = (a: ArrayLike<number>, b: ArrayLike<number>): boolean => a.length === b.length && Array.prototype.every.call(a, (x, i) => x === b[i]);

let shared: PartRunner | null = null;

/** The bench's columns for the two-thread build of `params`, against the one-thread runs' `one` results (medians of `repeats` runs). */
export async function threadColumns(parsed: ParsedTable, params: CoverParams, one: readonly CoverResult[], repeats: number): Promise<Record<string, string>> {
  shared ??= nodePartRunner({ threads: 2 });
  if (!shared) return { "2 threads": "one core only" };
  const kinds = new Set<CoverTask["kind"]>();
  const inner = shared;
  const runner: PartRunner = { ...inner, run: (task, ranges, control) => (kinds.add(task.kind), inner.run(task, ranges, control)) };
  await buildCoverOnThreads(parsed, params, runner, { loops: false }); // starts the helper (its start is not a build's cost)
  const runs: CoverResult[] = [];
  for (let r = 0; r < repeats; ++r) runs.push(await buildCoverOnThreads(parsed, params, runner, { now: () => performance.now(), loops: false }));
  const last = runs.at(-1)!;
  const reference = one.at(-1)!;
  const identical = same(last.members.items, reference.members.items) && same(last.members.offsets, reference.members.offsets) && (["source", "target", "shared"] as const).every((key) => same(last.edges[key], reference.edges[key]));
  const step = (results: readonly CoverResult[], key: "landmarks" | "members" | "edges"): number => median(results.map((result) => result.timings[key]));
  const speedUp = (key: "members" | "edges"): string => `${(step(one, key) / step(runs, key)).toFixed(2)}×`;
  return {
    "split (2 threads)": kinds.size > 0 ? [...kinds].sort().join("+") : "none (net dominates)",
    "members ms 2t": step(runs, "members").toFixed(0),
    "members ×": speedUp("members"),
    "edges ms 2t": step(runs, "edges").toFixed(0),
    "edges ×": speedUp("edges"),
    "build ms 2t": median(runs.map(({ timings: t }) => t.landmarks + t.members + t.edges + t.components)).toFixed(0),
    "2t identical": identical ? "yes" : "NO",
  };
}

/** Ends the helper thread. */
export function closeThreads(): void {
  shared?.close();
  shared = null;
}
