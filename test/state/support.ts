import type { Answer, Progress, Request } from "../../src/worker/protocol.ts";
import { createHandler } from "../../src/worker/handle.ts";
import type { RequestBody, WorkerClient } from "../../src/worker/client.ts";

/** A client over the in-thread handler that answers on the next microtask, as the client's fallback does. */
export function inThreadClient(): WorkerClient & { readonly sent: RequestBody[] } {
  const handle = createHandler({ now: () => 0 });
  const sent: RequestBody[] = [];
  let id = 0;
  return {
    sent,
    cancel() {},
    send(body, onProgress) {
      sent.push(body);
      const request = { ...body, id: ++id } as Request;
      return Promise.resolve().then(() => handle(request, (p) => onProgress?.(p)));
    },
  };
}

/**
 * A client whose build answers wait until the test releases them, in any order: while `hold` is
 * true each build request is parked, and `release(k)` runs the k-th parked build (progress
 * included) and resolves its answer. Other requests are answered at once.
 */
export function delayingClient() {
  const handle = createHandler({ now: () => 0 });
  const parked: { request: Request; onProgress: ((p: Progress) => void) | undefined; resolve: (answer: Answer) => void }[] = [];
  let id = 0;
  const state = { hold: false };
  const client: WorkerClient = {
    cancel() {},
    send(body, onProgress) {
      const request = { ...body, id: ++id } as Request;
      if (!state.hold || body.type !== "build") return Promise.resolve().then(() => handle(request, (p) => onProgress?.(p)));
      return new Promise<Answer>((resolve) => parked.push({ request, onProgress, resolve }));
    },
  };
  const release = async (k: number): Promise<void> => {
    const entry = parked[k]!;
    void Promise.resolve(handle(entry.request, (p) => entry.onProgress?.(p))).then(entry.resolve);
    await new Promise((resolve) => setTimeout(resolve, 0)); // let the awaiting action run
  };
  return { client, state, parked, release };
}

/** A clock that advances 5 ms per call. */
export function steppingClock(): () => number {
  let t = 0;
  return () => (t += 5);
}

export const noDemo = (): Promise<string> => Promise.reject(new Error("no demo in this test"));

/**
 * A client that behaves like one worker thread: every request waits in a first-in, first-out
 * queue, and `step()` lets the worker handle the oldest one (progress included) and answer it.
 * The test decides what the user does between steps.
 */
export function queuedClient() {
  const handle = createHandler({ now: () => 0 });
  const queue: { request: Request; onProgress: ((p: Progress) => void) | undefined; resolve: (answer: Answer) => void }[] = [];
  let id = 0;
  const client: WorkerClient = {
    cancel() {},
    send(body, onProgress) {
      const request = { ...body, id: ++id } as Request;
      return new Promise<Answer>((resolve) => queue.push({ request, onProgress, resolve }));
    },
  };
  const settle = (): Promise<void> => new Promise((resolve) => setTimeout(resolve, 0));
  return {
    client,
    pending: (): string[] => queue.map((entry) => entry.request.type),
    async step(): Promise<void> {
      const entry = queue.shift();
      if (!entry) throw new Error("no request is waiting");
      void Promise.resolve(handle(entry.request, (p) => entry.onProgress?.(p))).then(entry.resolve);
      await settle();
    },
    async drain(): Promise<void> {
      while (queue.length > 0) await this.step();
    },
  };
}

/**
 * A client that answers at once except requests of the `held` types, which wait until
 * `release(type)` answers the oldest waiting one of that type (as the worker would have, or with
 * the answer the test gives).
 */
export function parkingClient(held: readonly Request["type"][]) {
  const handle = createHandler({ now: () => 0 });
  const parked: { request: Request; resolve: (answer: Answer) => void }[] = [];
  const sent: RequestBody[] = [];
  let id = 0;
  const client: WorkerClient = {
    cancel() {},
    send(body, onProgress) {
      sent.push(body);
      const request = { ...body, id: ++id } as Request;
      if (!held.includes(request.type)) return Promise.resolve().then(() => handle(request, (p) => onProgress?.(p)));
      return new Promise<Answer>((resolve) => parked.push({ request, resolve }));
    },
  };
  const release = async (type: Request["type"], answer?: (request: Request) => Answer): Promise<void> => {
    const k = parked.findIndex((entry) => entry.request.type === type);
    if (k < 0) throw new Error(`no ${type} request is waiting`);
    const [entry] = parked.splice(k, 1);
    entry!.resolve(answer ? answer(entry!.request) : await handle(entry!.request, () => {}));
    await new Promise((resolve) => setTimeout(resolve, 0)); // let the awaiting action run
  };
  return { client, sent, parked, release };
}
