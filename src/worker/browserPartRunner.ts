import { createPartRunner, type PartAnswer, type PartRunner, type ShareArray } from "../core/index.ts";

/** Copies an array into a SharedArrayBuffer of its own. */
const shareInPage: ShareArray = (array) => {
  const copy = new (array.constructor as new (buffer: SharedArrayBuffer) => typeof array)(new SharedArrayBuffer(array.byteLength));
  copy.set(array);
  return copy;
};

/**
 * The build worker's part runner: one helper Web Worker (partWorker.ts) beside the build worker,
 * reading the scaled table and the index through SharedArrayBuffers. Null, for one thread, where
 * the page is not cross-origin isolated (no SharedArrayBuffer: a helper would need its own copy
 * of the table), where workers cannot start workers, or on one core.
 */
export function browserPartRunner(): PartRunner | null {
  if (typeof SharedArrayBuffer === "undefined" || globalThis.crossOriginIsolated !== true || typeof Worker === "undefined") return null;
  if ((globalThis.navigator?.hardwareConcurrency ?? 2) < 2) return null;
  return createPartRunner({
    spawn: () => {
      const worker = new Worker(new URL("./partWorker.ts", import.meta.url), { type: "module" });
      return {
        post: (message) => worker.postMessage(message),
        listen: (onAnswer, onFailure) => {
          worker.onmessage = (event: MessageEvent<PartAnswer>) => onAnswer(event.data);
          worker.onerror = (event) => onFailure(new Error(event.message || "the helper worker failed"));
        },
        terminate: () => worker.terminate(),
      };
    },
    share: shareInPage,
    every: (ms, tick) => {
      const timer = setInterval(tick, ms);
      return () => clearInterval(timer);
    },
  });
}
