/// <reference lib="webworker" />
// The build worker's helper (a second Web Worker, started by browserPartRunner.ts): answers each
// part of a split build step with core's kernel and moves the result's buffers back.
import { answerPart, answerTransferables, type PartMessage } from "../core/index.ts";

const scope = self as unknown as DedicatedWorkerGlobalScope;
scope.onmessage = (event: MessageEvent<PartMessage>) => {
  const answer = answerPart(event.data);
  scope.postMessage(answer, answerTransferables(answer));
};
