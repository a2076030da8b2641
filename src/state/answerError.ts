import type { Answer } from "../worker/protocol.ts";

/** What to show for a worker answer that is not the one asked for. */
export const answerError = (answer: Answer): string =>
  answer.type === "failed" ? answer.message : answer.type === "cancelled" ? "the worker stopped before answering" : `unexpected answer: ${answer.type}`;

/** A file name without its last extension, for naming exports after the input ("table" when nothing is left). */
export const fileStem = (fileName: string): string => fileName.replace(/\.[^.]*$/, "") || "table";
