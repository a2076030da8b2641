/// <reference lib="webworker" />
import { createHandler, flagsStopper, transferables } from "./handle.ts";
import { shareTable } from "./shareTable.ts";
import type { Request, Setup } from "./protocol.ts";

const scope = self as unknown as DedicatedWorkerGlobalScope;
let isStopped: (request: Request) => boolean = () => false;
const handle = createHandler({ now: () => performance.now(), isStopped: (request) => isStopped(request), share: shareTable });
let queue: Promise<void> = Promise.resolve();

scope.onmessage = (event: MessageEvent<Request | Setup>) => {
  const message = event.data;
  if (message.type === "setup") {
    isStopped = flagsStopper(message.cancelFlags);
    return;
  }
  // one request at a time, in order, even while a file is being read asynchronously
  queue = queue.then(async () => {
    const answer = await handle(message, (progress) => scope.postMessage(progress));
    scope.postMessage(answer, transferables(answer));
  });
};
