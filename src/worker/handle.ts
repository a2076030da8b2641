import {
  buildCover,
  buildCoverOnThreads,
  Cancelled,
  createFingerprint,
  countCandidateSets,
  coverExports,
  figureBuffers,
  graphml,
  isCancelled,
  radiusSweep,
  readTableBytes,
  readTableText,
  regionStability,
  scanHotspots,
  seedStability,
  defaultRadius,
  type ByteSource,
  type FileFingerprint,
  type ParsedTable,
  type PartRunner,
  type ReadOutcome,
  zipExports,
} from "../core/index.ts";
import { createNodeStatistics } from "./createNodeStatistics.ts";
import { regionRowsAnswer, regionTableAnswer } from "./regionAnswers.ts";
import { laneOf, type Answer, type Progress, type Request } from "./protocol.ts";

export type Handler = (request: Request, report: (progress: Progress) => void) => Answer | Promise<Answer>;

export interface HandlerOptions {
  readonly now?: () => number;
  /** True once the main thread has cancelled this request (read from shared flags in a worker). */
  readonly isStopped?: (request: Request) => boolean;
  /** Minimum milliseconds between two progress reports of one request. */
  readonly progressInterval?: number;
  /** Places a loaded table where other threads can see it without a copy (SharedArrayBuffer), when the page allows. */
  readonly share?: (table: ParsedTable) => ParsedTable;
  /** Helper threads for the build's split steps (browserPartRunner); none builds in this thread alone. */
  readonly partRunner?: PartRunner | null;
}

/**
 * The worker's pure dispatch, usable in Node and in the main thread: it keeps the last loaded
 * table so builds do not ship the table back and forth. Long computations report progress through
 * a callback that also checks for cancellation and stops them by throwing `Cancelled`.
 * Errors become a `failed` answer, cancellations a `cancelled` one.
 */
export function createHandler({ now = Date.now, isStopped = () => false, progressInterval = 50, share = (t) => t, partRunner = null }: HandlerOptions = {}): Handler {
  let table: ParsedTable | null = null;
  let nodeStatistics: ReturnType<typeof createNodeStatistics> | null = null; // whole-column summaries of `table`, kept
  const loaded = (): ParsedTable => {
    if (!table) throw new Error("no table is loaded");
    return table;
  };
  const keep = (next: ParsedTable): ParsedTable => {
    nodeStatistics = null;
    return (table = next);
  };
  const adoptOutcome = (request: Extract<Request, { type: "load" }>, outcome: ReadOutcome, fingerprint: FileFingerprint): Answer => {
    return { id: request.id, type: "loaded", table: keep(share(outcome.table)), report: outcome.report, fingerprint };
  };
  // text in memory is read at once (so the answer is synchronous); a file is streamed
  const load = (request: Extract<Request, { type: "load" }>, progress: (phase: Progress["phase"], fraction: number) => void): Answer | Promise<Answer> => {
    const hash = createFingerprint(); // of the text's UTF-8 bytes (the demo is fetched as text), or of the file's bytes as read
    if (request.source.kind === "text") {
      hash.update(new TextEncoder().encode(request.source.text));
      return adoptOutcome(request, readTableText(request.source.text, request.options), hash.finish());
    }
    return readTableBytes(blobSource(request.source.file), request.options, {
      utf8: () => {
        const decoder = new TextDecoder("utf-8", { fatal: true });
        return (bytes, last) => decoder.decode(bytes, { stream: !last });
      },
      onProgress: (fraction) => progress("parse", fraction),
      shouldStop: () => isStopped(request),
      onBytes: (bytes) => hash.update(bytes),
    })
      .then((outcome) => adoptOutcome(request, outcome, hash.finish()))
      .catch((error: unknown) => failure(request.id, error)); // also catches a throw in adoptOutcome (share)
  };
  return (request, report) => {
    let lastReport = -Infinity;
    const progress = (phase: Progress["phase"], fraction: number): void => {
      if (isStopped(request)) throw new Cancelled();
      const t = now();
      if (t - lastReport < progressInterval && fraction < 1) return;
      lastReport = t;
      report({ id: request.id, type: "progress", phase, fraction });
    };
    try {
      if (isStopped(request)) throw new Cancelled();
      switch (request.type) {
        case "load":
          return load(request, progress);
        case "adopt":
          keep(request.table);
          return { id: request.id, type: "adopted" };
        case "suggestRadius":
          return { id: request.id, type: "radius", radius: defaultRadius(loaded(), request.params, { onProgress: (fraction) => progress("suggest", fraction), shouldStop: () => isStopped(request) }) };
        case "build": {
          let phase: Progress["phase"] = "scale";
          const onPhase = (next: Progress["phase"]): void => void (phase = next);
          const options = { onPhase, onProgress: (fraction: number) => progress(phase, fraction), shouldStop: () => isStopped(request), now };
          // one thread answers at once, as before; helpers make the answer wait for them
          if (!partRunner) return { id: request.id, type: "built", result: buildCover(loaded(), request.params, options) };
          return buildCoverOnThreads(loaded(), request.params, partRunner, options)
            .then((result): Answer => ({ id: request.id, type: "built", result }))
            .catch((error: unknown) => failure(request.id, error));
        }
        case "sweep": {
          const { radiusMin, radiusMax, steps, current } = request.range;
          const options = {
            steps,
            ...(current === undefined ? {} : { current }),
            ...(radiusMin === undefined ? {} : { radiusMin }),
            ...(radiusMax === undefined ? {} : { radiusMax }),
            now,
            onProgress: (fraction: number) => progress("sweep", fraction),
            shouldStop: () => isStopped(request),
          };
          if (request.selection && request.selection.length > 0) {
            const { sweep, region } = regionStability(loaded(), request.params, request.selection, options);
            return { id: request.id, type: "swept", sweep, region };
          }
          return { id: request.id, type: "swept", sweep: radiusSweep(loaded(), request.params, options), region: null };
        }
        case "seeds": {
          const stability = seedStability(loaded(), request.params, {
            seeds: request.seeds,
            ...(request.selection && request.selection.length > 0 ? { selection: request.selection } : {}),
            onProgress: (fraction: number) => progress("seeds", fraction),
            shouldStop: () => isStopped(request),
          });
          return { id: request.id, type: "seeded", stability };
        }
        case "nodeStats":
          nodeStatistics ??= createNodeStatistics(loaded());
          return { id: request.id, type: "summarised", columns: nodeStatistics(request.rows, request.columns) };
        case "exportZip":
          return {
            id: request.id,
            type: "zipped",
            bytes: zipExports(
              { ...coverExports(loaded(), request.result, request.context), "graph.graphml": graphml(loaded(), request.result, request.context) },
              request.recipe === undefined ? {} : { "recipe.json": request.recipe },
            ),
          };
        case "regionTable":
          return regionTableAnswer(loaded(), request, { onProgress: (fraction) => progress("region", fraction), shouldStop: () => isStopped(request) });
        case "regionRows":
          return regionRowsAnswer(loaded(), request, { onProgress: (fraction) => progress("region", fraction), shouldStop: () => isStopped(request) })
            .catch((error: unknown) => failure(request.id, error));
        case "hotspots": {
          const scan = scanHotspots(loaded(), request.result, { ...request.options, onProgress: (fraction) => progress("hotspots", fraction), shouldStop: () => isStopped(request) });
          return { id: request.id, type: "hotspotsScanned", scan };
        }
        case "hotspotEstimate":
          return { id: request.id, type: "hotspotEstimated", candidateSets: countCandidateSets(loaded(), request.result, request.maxNodes) };
        default:
          return assertNever(request);
      }
    } catch (error) {
      return failure(request.id, error);
    }
  };
}

/** The answer for an error: `cancelled` for a cancellation, otherwise `failed` with the error's message. */
export function failure(id: number, error: unknown): Answer {
  if (isCancelled(error)) return { id, type: "cancelled" };
  return { id, type: "failed", message: error instanceof Error ? error.message : String(error) };
}

function blobSource(file: Blob): ByteSource {
  return { size: file.size, read: async (start, end) => new Uint8Array(await file.slice(start, end).arrayBuffer()) };
}

/** Cancellation read from shared flags: request id ≤ the value in its lane's slot is stopped. */
export function flagsStopper(flags: Int32Array): (request: Request) => boolean {
  return (request) => request.id <= Atomics.load(flags, laneOf(request.type));
}

function assertNever(value: never): never {
  throw new Error(`unknown request: ${JSON.stringify(value)}`);
}

/** Typed-array buffers in an answer, so the worker can transfer them instead of copying. */
export function transferables(answer: Answer): ArrayBuffer[] {
  if (answer.type === "swept") {
    return [...new Set([...figureBuffers(answer.sweep.figures), ...(answer.region ? [answer.region.jaccard.buffer as ArrayBuffer] : [])])];
  }
  if (answer.type === "zipped") return [answer.bytes.buffer as ArrayBuffer];
  if (answer.type === "regionTabled") return [...new Set(answer.curves.flatMap((c) => [c.inside.buffer as ArrayBuffer, c.outside.buffer as ArrayBuffer]))];
  // a view into shared memory (the table's, say) cannot be transferred: it is copied
  if (answer.type === "hotspotsScanned") return [...new Set(answer.scan.hotspots.flatMap((h) => [h.nodes.buffer, h.rows.buffer]))].filter((b): b is ArrayBuffer => b instanceof ArrayBuffer);
  if (answer.type === "seeded") return answer.stability.regionShare ? [answer.stability.regionShare.buffer as ArrayBuffer] : [];
  if (answer.type !== "built") return [];
  const { result } = answer;
  const arrays = [result.usedRows, result.droppedRows, result.undefinedRows, result.landmarks, result.members.offsets, result.members.items,
    result.edges.source, result.edges.target, result.edges.shared, result.component];
  return [...new Set(arrays.map((a) => a.buffer))].filter((b): b is ArrayBuffer => b instanceof ArrayBuffer); // a shared one is copied
}
