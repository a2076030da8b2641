import { createHandler } from "./handle.ts";
import type { Answer, Progress, Request, WorkerMessage } from "./protocol.ts";

export type RequestBody = Request extends infer R ? (R extends Request ? Omit<R, "id"> : never) : never;

export interface WorkerClient {
  /** Sends a request; progress reports arrive through `onProgress` until the answer resolves. */
  send(body: RequestBody, onProgress?: (progress: Progress) => void): Promise<Answer>;
}

/**
 * Main-thread side of the protocol: numbers requests, routes progress and answers by id.
 * Uses a module Web Worker where the platform has one, and otherwise runs the same handler
 * in this thread (tests in jsdom, or a browser without module workers).
 */
export function createWorkerClient(): WorkerClient {
  let nextId = 1;
  const pending = new Map<number, { resolve: (answer: Answer) => void; onProgress: ((p: Progress) => void) | undefined }>();
  const deliver = (message: WorkerMessage): void => {
    const entry = pending.get(message.id);
    if (!entry) return;
    if (message.type === "progress") {
      entry.onProgress?.(message);
      return;
    }
    pending.delete(message.id);
    entry.resolve(message);
  };

  let post: (request: Request) => void;
  if (typeof Worker === "undefined") {
    const handle = createHandler();
    post = (request) => {
      queueMicrotask(() => deliver(handle(request, deliver)));
    };
  } else {
    const worker = new Worker(new URL("./worker.ts", import.meta.url), { type: "module", name: "shoal-cover" });
    worker.onmessage = (event: MessageEvent<WorkerMessage>) => deliver(event.data);
    worker.onerror = (event) => {
      for (const [id, entry] of pending) entry.resolve({ id, type: "failed", message: `worker error: ${event.message}` });
      pending.clear();
    };
    post = (request) => worker.postMessage(request);
  }

  return {
    send(body, onProgress) {
      const id = nextId++;
      const request = { ...body, id } as Request;
      return new Promise<Answer>((resolve) => {
        pending.set(id, { resolve, onProgress });
        post(request);
      });
    },
  };
}
