import type { Answer, Request } from "../../src/worker/protocol.ts";

/** A load request for text already in memory (answered synchronously by the handler). */
export const loadText = (id: number, text: string): Request => ({ id, type: "load", source: { kind: "text", text }, options: {} });

/** The handler's answer where the test expects it synchronously (text loads, builds). */
export function now(answer: Answer | Promise<Answer>): Answer {
  if (answer instanceof Promise) throw new Error("expected a synchronous answer");
  return answer;
}
