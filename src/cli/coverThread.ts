// A helper thread of the headless build (worker_threads): answers each part it is sent with
// core's kernel (answerPart) and moves the result's buffers back. Started by nodePartRunner.ts;
// a bundle of the command must carry this file as a second entry, coverThread.mjs beside it.
import { parentPort } from "node:worker_threads";
import { answerPart, answerTransferables, type PartMessage } from "../core/index.ts";

const port = parentPort;
if (!port) throw new Error("coverThread runs as a worker thread");
port.on("message", (message: PartMessage) => {
  const answer = answerPart(message);
  port.postMessage(answer, answerTransferables(answer));
});
