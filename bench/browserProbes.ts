// Probes shared by the browser benchmarks: long tasks on the main thread (PerformanceObserver
// "longtask"), the main thread's JS heap (DevTools protocol Performance.getMetrics
// JSHeapUsedSize, sampled every 100 ms), and memory of the page with its workers
// (performance.measureUserAgentSpecificMemory, available because the page is cross-origin isolated).
import type { Page } from "playwright-core";

type Probed = { __longTasks: number[] };

/** Call before the page loads: records every long task's duration. */
export async function watchLongTasks(page: Page): Promise<void> {
  await page.addInitScript(() => {
    const w = window as unknown as Probed;
    w.__longTasks = [];
    new PerformanceObserver((list) => list.getEntries().forEach((e) => w.__longTasks.push(e.duration))).observe({ type: "longtask", buffered: true });
  });
}

export const resetLongTasks = (page: Page): Promise<void> => page.evaluate(() => void ((window as unknown as Probed).__longTasks = []));
export const longestTask = (page: Page): Promise<number> => page.evaluate(() => Math.max(0, ...(window as unknown as Probed).__longTasks));
/** Every long task's duration since the last reset, longest first. */
export const longTasks = (page: Page): Promise<number[]> => page.evaluate(() => [...(window as unknown as Probed).__longTasks].sort((a, b) => b - a));

/** Starts sampling the main thread's JS heap; `peak()` is the largest sample, `stop()` ends sampling. */
export async function sampleMainHeap(page: Page): Promise<{ peak: () => number; stop: () => void }> {
  const cdp = await page.context().newCDPSession(page);
  await cdp.send("Performance.enable");
  let peak = 0;
  const timer = setInterval(() => {
    void cdp
      .send("Performance.getMetrics")
      .then((r) => (peak = Math.max(peak, (r as { metrics: { name: string; value: number }[] }).metrics.find((m) => m.name === "JSHeapUsedSize")!.value)))
      .catch(() => {});
  }, 100);
  return { peak: () => peak, stop: () => clearInterval(timer) };
}

/** Bytes used by the page and its workers, or NaN where the browser does not offer the measurement. */
export function pageMemory(page: Page): Promise<number> {
  return page
    .evaluate(async () => {
      const measure = (performance as unknown as { measureUserAgentSpecificMemory?: () => Promise<{ bytes: number }> }).measureUserAgentSpecificMemory;
      return measure ? (await measure.call(performance)).bytes : NaN;
    })
    .catch(() => NaN);
}

/**
 * Samples the memory of the page's worker every 50 ms through the DevTools protocol: the page's
 * session auto-attaches to workers and sends them Runtime.getHeapUsage (answered between the
 * worker's own steps, so a long build is sampled while it runs). A sample is usedSize (JS heap)
 * + backingStorageSize (ArrayBuffer and SharedArrayBuffer contents), the browser's counterpart
 * of Node's heapUsed + arrayBuffers; uncollected garbage counts, as it does in Node.
 * `collect()` asks the worker for a full collection (HeapProfiler.collectGarbage), as the Node
 * bench runs gc() before each build, so a peak is not inflated by an earlier step's garbage.
 * Call before page.goto. `reset()` starts a new peak; `peak()` is the largest sample since.
 */
export async function sampleWorkerMemory(page: Page): Promise<{ reset: () => void; peak: () => number; collect: () => Promise<void>; stop: () => void }> {
  const cdp = await page.context().newCDPSession(page);
  let session: string | null = null;
  let nextId = 1;
  const waiting = new Map<number, (result: unknown) => void>();
  cdp.on("Target.attachedToTarget", (event) => {
    if (event.targetInfo.type === "worker") session = event.sessionId;
  });
  cdp.on("Target.receivedMessageFromTarget", (event) => {
    const message = JSON.parse(event.message) as { id?: number; result?: unknown; error?: { message?: string } };
    if (message.id === undefined) return;
    waiting.get(message.id)?.(message.error ? new Error(message.error.message ?? "protocol error") : message.result);
    waiting.delete(message.id);
  });
  await cdp.send("Target.setAutoAttach", { autoAttach: true, waitForDebuggerOnStart: false, flatten: false });
  /** One protocol call in the worker; undefined when there is no worker or no reply within `timeoutMs` (the worker was replaced). */
  const call = (method: string, timeoutMs: number): Promise<unknown> => {
    if (!session) return Promise.resolve(undefined);
    const id = nextId++;
    return new Promise((resolve) => {
      waiting.set(id, resolve);
      setTimeout(() => {
        if (waiting.delete(id)) resolve(undefined);
      }, timeoutMs);
      cdp.send("Target.sendMessageToTarget", { sessionId: session!, message: JSON.stringify({ id, method }) }).catch(() => resolve(undefined));
    });
  };
  let peak = 0;
  let busy = false;
  let warned = false;
  const timer = setInterval(() => {
    if (busy) return;
    busy = true;
    void call("Runtime.getHeapUsage", 2000)
      .then((result) => {
        const usage = result instanceof Error ? undefined : (result as HeapUsage | undefined);
        if (!usage) return;
        if (usage.backingStorageSize === undefined && !warned) {
          warned = true;
          console.error("worker memory probe: this browser reports no backingStorageSize; array buffers are not counted");
        }
        peak = Math.max(peak, usage.usedSize + (usage.backingStorageSize ?? 0));
      })
      .finally(() => (busy = false));
  }, 50);
  return {
    reset: () => (peak = 0),
    peak: () => peak,
    collect: async () => {
      const result = await call("HeapProfiler.collectGarbage", 30_000);
      if (result === undefined || result instanceof Error) console.error(`worker memory probe: no collection before the build (${result instanceof Error ? result.message : "no reply"}); the peak may include older garbage`);
    },
    stop: () => clearInterval(timer),
  };
}

interface HeapUsage {
  readonly usedSize: number;
  readonly backingStorageSize?: number;
}
