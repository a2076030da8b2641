/// <reference lib="webworker" />
import { createHandler, failure, flagsStopper, transferables } from "./handle.ts";
import { shareTable } from "./shareTable.ts";
import { browserPartRunner } from "./browserPartRunner.ts";
import type { Answer, Request, Setup } from "./protocol.ts";

const scope = self as unknown as DedicatedWorkerGlobalScope;
let isStopped: (request: Request) => boolean = () => false;
const handle = createHandler({ now: () => performance.now(), isStopped: (request) => isStopped(request), share: shareTable, partRunner: browserPartRunner() });
let queue: Promise<void> = Promise.resolve();

async function answer(request: Request): Promise<void> {
  let reply: Answer;
  try {
    reply = await handle(request, (progress) => scope.postMessage(progress));
  } catch (error) {
    reply = failure(request.id, error);
  }
  try {
    scope.postMessage(reply, transferables(reply));
  } catch (error) {
    scope.postMessage(failure(request.id, error)); // an answer that cannot be posted (not cloneable, say) still gets one
  }
}

scope.onmessage = (event: MessageEvent<Request | Setup>) => {
  const message = event.data;
  if (message.type === "setup") {
    isStopped = flagsStopper(message.cancelFlags);
    return;
  }
  // one request at a time, in order, even while a file is being read; a failure must not stop the chain
  queue = queue.then(() => answer(message)).catch(() => undefined);
};
