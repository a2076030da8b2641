import type { ParsedTable } from "../table/types.ts";
import type { CoverParams } from "../params.ts";
import { buildCover, coverSteps, type BuildOptions, type CoverResult } from "./buildCover.ts";
import type { PartRunner } from "./partRunner.ts";
import { runCoverPart } from "./coverParts.ts";
import { isCancelled } from "../control.ts";

/**
 * buildCover with its split steps (the balls found after the net, the edge count) spread over
 * the runner's threads: this thread runs the first part of each step while the helpers run the
 * others, then it joins their outputs in range order, so the result is buildCover's bit for bit
 * (a property test builds both). Without a runner, or with one thread, it is buildCover.
 * A Cancelled from this thread's part, or from the runner (shouldStop while it waits), stops the
 * helpers too; a helper that fails (it could not start, say) leaves its parts to this thread.
 * Cost: buildCover's, the split steps divided among the threads, plus one shared copy of the
 * scaled table when the balls are split (indexParts).
 */
export async function buildCoverOnThreads(parsed: ParsedTable, params: CoverParams, runner: PartRunner | null, options: BuildOptions = {}): Promise<CoverResult> {
  if (!runner || runner.threads <= 1) return buildCover(parsed, params, options);
  const steps = coverSteps(parsed, params, { parts: runner.threads, ...(runner.minPartWork === undefined ? {} : { minPartWork: runner.minPartWork }), ...options }, runner.share);
  for (let next = steps.next(); ; ) {
    if (next.done) return next.value;
    const { task, remote, local } = next.value;
    const pending = runner.run(task, remote, options);
    try {
      local();
    } catch (error) {
      runner.abort();
      pending.catch(() => undefined); // the helpers' answer no longer matters
      throw error;
    }
    next = steps.next(await pending.catch((error: unknown) => {
      // a helper that could not start or died: its parts run here (a kernel's own error recurs here)
      if (isCancelled(error)) throw error;
      return remote.map((range) => runCoverPart(task, range, options));
    }));
  }
}
