import { buildCover, parseCsvText, suggestRadius, type ParsedTable } from "../core/index.ts";
import type { Answer, Progress, Request } from "./protocol.ts";

export type Handler = (request: Request, report: (progress: Progress) => void) => Answer;

/**
 * The worker's pure dispatch, usable in Node and in the main thread: it keeps the last loaded
 * table so builds do not ship the table back and forth. Errors become a `failed` answer.
 */
export function createHandler(now: () => number = Date.now): Handler {
  let table: ParsedTable | null = null;
  const loaded = (): ParsedTable => {
    if (!table) throw new Error("no table is loaded");
    return table;
  };
  return (request, report) => {
    try {
      switch (request.type) {
        case "load":
          table = parseCsvText(request.text);
          return { id: request.id, type: "loaded", table };
        case "suggestRadius":
          return { id: request.id, type: "radius", radius: suggestRadius(loaded(), request.params) };
        case "build": {
          const onProgress = (phase: Progress["phase"], fraction: number): void => report({ id: request.id, type: "progress", phase, fraction });
          return { id: request.id, type: "built", result: buildCover(loaded(), request.params, { onProgress, now }) };
        }
        default:
          return assertNever(request);
      }
    } catch (error) {
      return { id: request.id, type: "failed", message: error instanceof Error ? error.message : String(error) };
    }
  };
}

function assertNever(value: never): never {
  throw new Error(`unknown request: ${JSON.stringify(value)}`);
}

/** Typed-array buffers in an answer, so the worker can transfer them instead of copying. */
export function transferables(answer: Answer): ArrayBuffer[] {
  if (answer.type !== "built") return [];
  const { result } = answer;
  const arrays = [result.usedRows, result.droppedRows, result.undefinedRows, result.landmarks, result.members.offsets, result.members.items,
    result.edges.source, result.edges.target, result.edges.shared, result.component];
  return [...new Set(arrays.map((a) => a.buffer as ArrayBuffer))];
}
