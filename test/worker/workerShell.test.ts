// The Web Worker shell (src/worker/worker.ts) run in Node over a fake global scope: whatever one
// request does, the worker keeps answering the next ones.
import { beforeAll, describe, expect, it, vi } from "vitest";
import type { Answer, Request, WorkerMessage } from "../../src/worker/protocol.ts";

const posted: WorkerMessage[] = [];
const scope = {
  onmessage: null as ((event: { data: Request }) => void) | null,
  /** Throws once for the answer whose id is set here, as postMessage does for an answer it cannot clone. */
  refuseAnswerOf: 0,
  postMessage(message: WorkerMessage): void {
    if (message.type !== "progress" && message.id === scope.refuseAnswerOf && message.type !== "failed") throw new Error("could not clone the answer");
    posted.push(message);
  },
};

beforeAll(async () => {
  vi.stubGlobal("self", scope);
  await import("../../src/worker/worker.ts");
});

const answerOf = async (id: number): Promise<Answer> => {
  await vi.waitFor(() => expect(posted.some((m) => m.type !== "progress" && m.id === id)).toBe(true));
  return posted.find((m): m is Answer => m.type !== "progress" && m.id === id)!;
};

describe("worker shell", () => {
  it("an answer that cannot be posted becomes a 'failed' answer with the error's message, and the next request is still answered", async () => {
    scope.refuseAnswerOf = 1;
    scope.onmessage!({ data: { id: 1, type: "load", source: { kind: "text", text: "x\n1\n2\n4\n" }, options: {} } });
    scope.onmessage!({ data: { id: 2, type: "suggestRadius", params: { features: ["x"], metric: "euclidean", scale: "zscore" } } });
    expect(await answerOf(1)).toEqual({ id: 1, type: "failed", message: "could not clone the answer" });
    expect((await answerOf(2)).type).toBe("radius"); // the table was loaded in the worker even though its answer failed
  });
});
