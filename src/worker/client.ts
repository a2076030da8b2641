import type { ParsedTable } from "../core/index.ts";
import { lane, laneOf, type Answer, type Progress, type Request, type WorkerMessage } from "./protocol.ts";

export type RequestBody = Request extends infer R ? (R extends Request ? Omit<R, "id"> : never) : never;

export interface WorkerClient {
  /**
   * Sends a request; progress reports arrive through `onProgress` until the answer resolves.
   * A compute request (a build, default radius, sweep or seed run) cancels every older compute request still running
   * or queued: the newest wins, and the older answer is `cancelled`. A region table likewise cancels older region tables
   * (and nothing else: node statistics and exports run to the end).
   */
  send(body: RequestBody, onProgress?: (progress: Progress) => void): Promise<Answer>;
  /** Cancels the running and queued requests of a lane (the load's Cancel button). */
  cancel(which: keyof typeof lane): void;
}

interface Pending {
  readonly request: Request;
  readonly resolve: (answer: Answer) => void;
  readonly onProgress: ((p: Progress) => void) | undefined;
}

/**
 * Main-thread side of the protocol: numbers requests, routes progress and answers by id, and
 * cancels. In a cross-origin-isolated page cancellation goes through flags in a SharedArrayBuffer
 * that the worker's loops read; elsewhere the client ends the worker, starts a new one, hands it
 * the last table again and re-sends the requests that were not cancelled. Without Web Workers (jsdom tests) the same handler runs in this thread.
 */
export function createWorkerClient(): WorkerClient {
  let nextId = 1;
  const pending = new Map<number, Pending>();
  let table: ParsedTable | null = null; // the worker's current table, to hand to a restarted worker
  const deliver = (message: WorkerMessage): void => {
    const entry = pending.get(message.id);
    if (!entry) return;
    if (message.type === "progress") {
      entry.onProgress?.(message);
      return;
    }
    pending.delete(message.id);
    if (message.type === "loaded") table = message.table;
    entry.resolve(message);
  };

  if (typeof Worker === "undefined") {
    // loaded only here, so the engine is bundled with the worker and not with the page
    const handler = import("./handle.ts").then(({ createHandler }) => createHandler({ progressInterval: 0 })); // in-thread reports cost nothing to deliver
    let queue: Promise<unknown> = handler;
    return {
      send(body, onProgress) {
        const request = { ...body, id: nextId++ } as Request;
        return new Promise<Answer>((resolve) => {
          pending.set(request.id, { request, resolve, onProgress });
          // one request at a time, in order, as in the worker
          queue = queue.then(async () => {
            let answer: Answer;
            try {
              answer = await (await handler)(request, deliver);
            } catch (error) {
              answer = { id: request.id, type: "failed", message: String(error) };
            }
            deliver(answer);
          }).catch(() => undefined); // a failure to deliver must not stop later requests
        });
      },
      cancel() {},
    };
  }

  const shared = typeof SharedArrayBuffer !== "undefined" && globalThis.crossOriginIsolated === true;
  const flagBytes = Object.keys(lane).length * Int32Array.BYTES_PER_ELEMENT; // one slot per lane
  const flags = new Int32Array(shared ? new SharedArrayBuffer(flagBytes) : new ArrayBuffer(flagBytes));
  let worker = spawn();

  function spawn(): Worker {
    const created = new Worker(new URL("./worker.ts", import.meta.url), { type: "module", name: "shoal-cover" });
    // a message still queued from a worker that was ended belongs to nobody
    created.onmessage = (event: MessageEvent<WorkerMessage>) => {
      if (created === worker) deliver(event.data);
    };
    created.onerror = (event) => {
      for (const [id, entry] of pending) entry.resolve({ id, type: "failed", message: `worker error: ${event.message}` });
      pending.clear();
    };
    if (shared) created.postMessage({ type: "setup", cancelFlags: flags });
    return created;
  }

  function stopLane(slot: number, upTo: number): void {
    if (shared) {
      Atomics.store(flags, slot, upTo);
      return;
    }
    const stale = [...pending.values()].filter((p) => laneOf(p.request.type) === slot && p.request.id <= upTo);
    if (stale.length === 0) return;
    // without shared memory a busy worker cannot be interrupted: end it and start afresh
    worker.terminate();
    for (const entry of stale) {
      pending.delete(entry.request.id);
      entry.resolve({ id: entry.request.id, type: "cancelled" });
    }
    worker = spawn();
    if (table) worker.postMessage({ id: nextId++, type: "adopt", table } satisfies Request);
    // the other lane's requests (a file load among them) were not cancelled: ask the new worker, in their order
    for (const entry of [...pending.values()].sort((a, b) => a.request.id - b.request.id)) post(entry);
  }

  /** Posts a pending request; one the browser cannot send (not cloneable, say) is answered "failed" at once. */
  function post(entry: Pending): void {
    try {
      worker.postMessage(entry.request);
    } catch (error) {
      pending.delete(entry.request.id);
      entry.resolve({ id: entry.request.id, type: "failed", message: error instanceof Error ? error.message : String(error) });
    }
  }

  return {
    send(body, onProgress) {
      const request = { ...body, id: nextId++ } as Request;
      const slot = laneOf(request.type);
      if (slot === lane.compute || slot === lane.region) stopLane(slot, request.id - 1);
      return new Promise<Answer>((resolve) => {
        const entry = { request, resolve, onProgress };
        pending.set(request.id, entry);
        post(entry);
      });
    },
    cancel(which) {
      stopLane(lane[which], nextId - 1);
    },
  };
}
