/// <reference lib="webworker" />
import { createHandler, transferables } from "./handle.ts";
import type { Request } from "./protocol.ts";

const scope = self as unknown as DedicatedWorkerGlobalScope;
const handle = createHandler(() => performance.now());

scope.onmessage = (event: MessageEvent<Request>) => {
  const answer = handle(event.data, (progress) => scope.postMessage(progress));
  scope.postMessage(answer, transferables(answer));
};
