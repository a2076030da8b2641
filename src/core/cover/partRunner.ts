import { Cancelled, type RunControl } from "../control.ts";
import type { ShareArray } from "../search/indexParts.ts";
import type { CoverTask, PartAnswer, PartMessage, PartOutput, PartRange } from "./coverParts.ts";

/** One helper thread as the runner sees it: Node's worker_threads and the browser's Worker each give one (src/cli, src/worker). */
export interface HelperThread {
  post(message: PartMessage): void;
  /** Registers the listeners once: each answer, and a failure of the thread itself (it did not start, or died). */
  listen(onAnswer: (answer: PartAnswer) => void, onFailure: (error: unknown) => void): void;
  /** Stops the thread at once, wherever it is. */
  terminate(): void;
}

/** Runs parts of a build's tasks on helper threads, beside the part the calling thread runs itself. */
export interface PartRunner {
  /** Threads counting the caller's own. */
  readonly threads: number;
  /** Least work worth sending to the helpers, where the runner knows better than BuildOptions' default (an option given to the build wins). */
  readonly minPartWork?: number;
  /** Puts an array where the helpers read it without a copy; null when nothing can be shared (arrays are then copied to each helper). */
  readonly share: ShareArray | null;
  /** The outputs of `ranges`, in order, one helper per range (at most threads − 1 ranges); rejects with Cancelled once `control.shouldStop()` is true. */
  run(task: CoverTask, ranges: readonly PartRange[], control: RunControl): Promise<PartOutput[]>;
  /** Stops the helpers' work now (they are started again by the next run). */
  abort(): void;
  /** Stops the helpers for good. */
  close(): void;
}

export interface PartRunnerOptions {
  /** Starts one helper thread running answerPart (coverParts.ts) on every message. */
  readonly spawn: () => HelperThread;
  /** Helper threads (default 1: two threads in all). */
  readonly helpers?: number;
  readonly share?: ShareArray | null;
  /** A repeating timer (setInterval), asked to call `tick` every `ms` while helpers work; returns its stop. */
  readonly every: (ms: number, tick: () => void) => () => void;
}

const stopCheckMs = 20; // how often a wait for helpers asks shouldStop: well inside the 200 ms a cancel may take (DEVELOPERS.md)

/**
 * A PartRunner over helper threads started on first use and kept between runs. A cancel while the
 * helpers work (shouldStop, asked every 20 ms) or a failure terminates them; the next run starts
 * new ones. Answers are matched to messages by id, so a late answer of a terminated run is ignored.
 */
export function createPartRunner({ spawn, helpers = 1, share = null, every }: PartRunnerOptions): PartRunner {
  let threads: HelperThread[] = [];
  let nextId = 1;
  // the run waiting for answers: its handlers, replaced by each run and cleared when it settles
  let current: { readonly settle: (answer: PartAnswer) => void; readonly finish: (error: unknown) => void } | null = null;
  const start = (): HelperThread[] => {
    if (threads.length > 0) return threads;
    threads = Array.from({ length: helpers }, () => {
      const thread = spawn();
      thread.listen(
        (answer) => current?.settle(answer),
        (error) => threads.includes(thread) && current?.finish(error instanceof Error ? error : new Error(String(error))), // a terminated thread's exit is no failure
      );
      return thread;
    });
    return threads;
  };
  const terminate = (): void => {
    const stopping = threads;
    threads = [];
    for (const thread of stopping) thread.terminate();
  };
  const abort = (): void => {
    current?.finish(new Cancelled("the build"));
    terminate();
  };
  const run = (task: CoverTask, ranges: readonly PartRange[], control: RunControl): Promise<PartOutput[]> => {
    if (ranges.length > helpers) throw new Error(`more parts than helper threads: ${ranges.length}`);
    if (ranges.length === 0) return Promise.resolve([]);
    current?.finish(new Error("a new run started before the last one ended"));
    const first = nextId;
    nextId += ranges.length;
    // inside the executor, a helper that cannot even be constructed rejects the run instead of throwing
    return new Promise<PartOutput[]>((resolve, reject) => {
      const running = start();
      const outputs: (PartOutput | undefined)[] = ranges.map(() => undefined);
      let left = ranges.length;
      let stopTimer = (): void => undefined;
      const finish = (error: unknown): void => {
        if (current !== self) return;
        current = null;
        stopTimer();
        if (error === null) return resolve(outputs as PartOutput[]);
        terminate(); // the helpers may be mid-part
        reject(error);
      };
      const settle = (answer: PartAnswer): void => {
        const k = answer.id - first;
        if (k < 0 || k >= ranges.length || outputs[k] !== undefined) return;
        if ("error" in answer) return finish(new Error(answer.error));
        outputs[k] = answer.output;
        if (--left === 0) finish(null);
      };
      const self = { settle, finish };
      current = self;
      stopTimer = every(stopCheckMs, () => {
        if (control.shouldStop?.()) finish(new Cancelled("the build"));
      });
      ranges.forEach((range, k) => running[k]!.post({ id: first + k, task, range }));
    });
  };
  return { threads: helpers + 1, share, run, abort, close: abort };
}
