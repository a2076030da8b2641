import { availableParallelism } from "node:os";
import { createRequire } from "node:module";
import { pathToFileURL } from "node:url";
import { Worker } from "node:worker_threads";
import { createPartRunner, type HelperThread, type PartAnswer, type PartRunner, type ShareArray } from "../core/index.ts";

export interface NodeRunnerOptions {
  /** Threads in all, the caller's included (default: the machine's parallelism, at most 2). */
  readonly threads?: number;
  /** The helper's entry (default coverThread.ts through tsx's loader beside this source, coverThread.mjs beside a bundle). */
  readonly entry?: URL;
}

/** Copies an array into a SharedArrayBuffer of its own (Node always has them). */
export const shareInNode: ShareArray = (array) => {
  const copy = new (array.constructor as new (buffer: SharedArrayBuffer) => typeof array)(new SharedArrayBuffer(array.byteLength));
  copy.set(array);
  return copy;
};

/**
 * The build's part runner on worker_threads, or null with one thread. Helpers are unreferenced, so
 * an idle one never keeps the process alive (the runner's timer does while it waits); close() ends them.
 */
export function nodePartRunner(options: NodeRunnerOptions = {}): PartRunner | null {
  const threads = options.threads ?? Math.min(2, availableParallelism());
  if (threads <= 1) return null;
  const spawn = (): HelperThread => {
    const worker = startWorker(options.entry);
    worker.unref();
    return {
      post: (message) => worker.postMessage(message),
      listen: (onAnswer, onFailure) => {
        worker.on("message", (answer: PartAnswer) => onAnswer(answer));
        worker.on("error", onFailure);
        worker.on("exit", (code) => code !== 0 && onFailure(new Error(`helper thread exited with code ${code}`)));
      },
      terminate: () => void worker.terminate(),
    };
  };
  const every = (ms: number, tick: () => void): (() => void) => {
    const timer = setInterval(tick, ms);
    return () => clearInterval(timer);
  };
  return createPartRunner({ spawn, helpers: threads - 1, share: shareInNode, every });
}

// From source (tsx), the worker registers tsx's loader itself before it imports the entry: a
// loader given by execArgv is not in place yet when Node 20 loads a worker's main module.
function startWorker(entry: URL | undefined): Worker {
  const here = import.meta.url;
  if (entry?.pathname.endsWith(".mjs") || (!entry && !here.endsWith(".ts"))) return new Worker(entry ?? new URL("./coverThread.mjs", here));
  const source = entry ?? new URL("./coverThread.ts", here);
  const loader = new URL("./esm/api/index.mjs", pathToFileURL(createRequire(here).resolve("tsx"))).href;
  const boot = `import(${JSON.stringify(loader)}).then((tsx) => { tsx.register(); return import(${JSON.stringify(source.href)}); });`;
  return new Worker(boot, { eval: true });
}
