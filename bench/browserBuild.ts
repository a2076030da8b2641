// npm run bench:browser: the cover build in the workbench's worker, in Debian's headless Chromium
// driven by playwright-core, against the same build in Node. Prints a table (and writes
// bench/results/browser.json). Probes: User Timing marks the app sets (build requested → first
// frame drawn with the result; Cancel → "cancelled" answer), a PerformanceObserver for long tasks
// on the main thread, the worker's memory from the DevTools protocol's Runtime.getHeapUsage
// (JS heap + array buffer contents, sampled every 50 ms during the builds, from a collected heap;
// it includes the table, which the worker shares with the main thread) and the main thread's
// from its Performance.getMetrics JSHeapUsedSize (typed-array contents not included).
// The page's worker builds on two threads (a helper worker, src/worker/partWorker.ts) when the
// split steps have the work for it; Node's two-thread build (worker_threads) is timed beside the
// one-thread one. The helper is a worker started by the worker, which the DevTools session here
// does not attach to: its memory is not in "worker peak" (it reads the build worker's shared
// table and holds one part's lists). The long-task column lists every main-thread task over 50 ms in the builds.
// Build times are medians: six warm builds in Node (three before the page's and three after, as
// the machine's speed drifts), three requests in the page (the radius nudged by 10⁻¹² so each is
// a new request with the same graph); "request→answer" is the worker's part, "→drawn" adds the
// main thread's render and the first drawing. Long tasks are reported for the load (file chosen
// → first graph drawn) and for the builds (first request → 1 s after the last drawing).
import { mkdir, mkdtemp, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { performance as nodePerformance } from "node:perf_hooks";
import { buildCover, buildCoverOnThreads, euclidean, selectFeatures, zScore, type ParsedTable } from "../src/core/index.ts";
import { nodePartRunner } from "../src/cli/nodePartRunner.ts";
import { launchBrowser, startPreview } from "../test/browser/harness.ts";
import { longestTask, longTasks, resetLongTasks, sampleMainHeap, sampleWorkerMemory, watchLongTasks } from "./browserProbes.ts";
import { calibrateRadius } from "./calibrateRadius.ts";
import { gaussianClusters, uniformCube } from "./syntheticTables.ts";

interface Case {
  readonly name: string;
  readonly table: ParsedTable;
  readonly landmarks: number;
}

const quick = process.argv.includes("--quick");
const cases: Case[] = [
  { name: "8 Gaussian clusters 100,000 × 16", table: gaussianClusters(100_000, 16, 8, 2), landmarks: 1000 },
  // the index prunes little here, so the balls are found after the net: the page's helper worker shares that step
  { name: "uniform cube 100,000 × 16", table: uniformCube(100_000, 16, 1), landmarks: 1000 },
  ...(quick ? [] : [{ name: "8 Gaussian clusters 1,000,000 × 8", table: gaussianClusters(1_000_000, 8, 8, 3), landmarks: 1000 }]),
];

const median = (xs: readonly number[]): number => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

/** In the page: true once a graph was drawn after the latest build answer (marks set by the app). */
function drawnAfterAnswer(): boolean {
  const answer = performance.getEntriesByName("shoal:build-answered").at(-1);
  return answer !== undefined && performance.getEntriesByName("shoal:graph-drawn").some((m) => m.startTime >= answer.startTime);
}

function toCsv(table: ParsedTable): string {
  const names = table.columns.map((c) => c.name);
  const lines = [names.join(",")];
  for (let i = 0; i < table.rows; ++i) lines.push(table.columns.map((c) => String(c.numbers[i])).join(","));
  return `${lines.join("\n")}\n`;
}

const folder = await mkdtemp(join(tmpdir(), "shoal-bench-"));
const preview = await startPreview();
const rows: Record<string, string | number>[] = [];
try {
  for (const c of cases) {
    const features = c.table.columns.map((col) => col.name);
    const scaled = zScore(selectFeatures(c.table, features).table).table;
    const { radius, landmarks } = calibrateRadius(scaled, euclidean, c.landmarks, 0.1);
    const nodeParams = { features, scale: "zscore", metric: "euclidean", radius, landmarks: "greedy-file-order", seed: 1 } as const;
    const nodeTimes: number[] = [];
    let nodeResult = buildCover(c.table, nodeParams); // warm-up
    // three Node builds before the browser's and three after: the machine's speed drifts within minutes
    const timeNode = (): void => {
      for (let r = 0; r < 3; ++r) {
        const started = nodePerformance.now();
        nodeResult = buildCover(c.table, nodeParams);
        nodeTimes.push(nodePerformance.now() - started);
      }
    };
    timeNode();
    // the same build on two threads in Node (worker_threads), as the page's worker builds with its helper
    const runner = nodePartRunner({ threads: 2 });
    const twoThreadTimes: number[] = [];
    await buildCoverOnThreads(c.table, nodeParams, runner); // starts the helper
    for (let r = 0; r < 3; ++r) {
      const started = nodePerformance.now();
      await buildCoverOnThreads(c.table, nodeParams, runner);
      twoThreadTimes.push(nodePerformance.now() - started);
    }
    runner?.close();
    const file = join(folder, `${c.table.rows}x${features.length}.csv`);
    await writeFile(file, toCsv(c.table));

    const browser = await launchBrowser();
    const { page } = browser;
    await watchLongTasks(page);
    const workerMemory = await sampleWorkerMemory(page);
    await page.goto(preview.url);
    await page.getByTestId("node-count").waitFor();
    const heap = await sampleMainHeap(page);

    // load: from choosing the file to the first drawing of its graph (read, suggested radius, build)
    await page.evaluate(() => performance.clearMarks());
    await resetLongTasks(page);
    const loadStarted = Date.now();
    await page.getByTestId("file-input").setInputFiles(file);
    await page.waitForFunction(drawnAfterAnswer, undefined, { timeout: 600_000, polling: 50 });
    const loadMs = Date.now() - loadStarted;
    const longestInLoad = await longestTask(page);

    // builds at r, r(1 + 10⁻¹²), r(1 + 2·10⁻¹²): the same graph, three requests; long tasks from the first request until 1 s after the last drawing
    await resetLongTasks(page);
    const answered: number[] = [];
    const drawn: number[] = [];
    let nodes = 0;
    let edges = 0;
    for (let k = 0; k < 3; ++k) {
      await workerMemory.collect(); // each build starts from a collected heap, as in the Node bench
      if (k === 0) workerMemory.reset(); // after the collection: the load's garbage is not the build's
      await page.evaluate(() => performance.clearMarks());
      await page.locator("#radius-number").fill(String(radius * (1 + k * 1e-12)));
      await page.locator("#radius-number").press("Enter");
      await page.waitForFunction(drawnAfterAnswer, undefined, { timeout: 600_000, polling: 50 });
      // (no named functions inside page.evaluate: tsx would wrap them in a helper the page lacks)
      const times = await page.evaluate(() =>
        ["shoal:build-requested", "shoal:build-answered", "shoal:graph-drawn"].map((name) => performance.getEntriesByName(name).at(-1)!.startTime),
      ).then(([requested, answer, drew]) => ({ answered: answer! - requested!, drawn: drew! - requested! }));
      answered.push(times.answered);
      drawn.push(times.drawn);
      const count = Number((await page.getByTestId("node-count").textContent())!.replaceAll(",", ""));
      const edgeCount = Number((await page.getByTestId("edge-count").textContent())!.replaceAll(",", ""));
      if (k > 0 && (count !== nodes || edgeCount !== edges)) throw new Error(`radius ${radius}: ${nodes} nodes, ${edges} edges, then ${count}, ${edgeCount}`);
      nodes = count;
      edges = edgeCount;
    }
    await page.waitForTimeout(1000);
    const answeredMs = median(answered);
    const drawnMs = median(drawn);
    const longest = await longestTask(page);
    const buildTasks = await longTasks(page);
    const workerPeak = workerMemory.peak();
    timeNode();
    const nodeMs = median(nodeTimes);

    // cancel: start a build at half the radius (several times the landmarks), cancel it, time the worker's answer
    await page.evaluate(() => performance.clearMarks());
    await page.locator("#radius-number").fill(String(radius / 2));
    await page.locator("#radius-number").press("Enter");
    await page.getByTestId("build-progress").waitFor();
    await page.waitForTimeout(150);
    // click Cancel in the page itself, at a known time, and wait for the worker's "cancelled" answer
    const cancelMs = await page.evaluate(async () => {
      const button = [...document.querySelectorAll<HTMLButtonElement>("[data-testid=build-progress] button")].find((b) => b.textContent === "Cancel");
      if (!button) return NaN; // the build finished before it could be cancelled
      const at = performance.now();
      button.click();
      for (let k = 0; k < 6000; ++k) {
        const m = performance.getEntriesByName("shoal:build-cancelled").at(-1);
        if (m) return m.startTime - at;
        await new Promise((resolve) => setTimeout(resolve, 10));
      }
      return Infinity;
    });
    // the table survives: the calibrated radius builds again
    await page.locator("#radius-number").fill(String(radius * 1.01));
    await page.locator("#radius-number").press("Enter");
    await page.waitForFunction(() => !document.querySelector("[data-testid=build-progress]"), undefined, { timeout: 600_000 });
    const survived = (await page.getByTestId("node-count").count()) === 1;
    heap.stop();
    workerMemory.stop();
    await browser.close();

    const tableBytes = c.table.rows * features.length * 8;
    rows.push({
      case: c.name,
      radius: Number(radius.toPrecision(4)),
      "landmarks (Node)": landmarks,
      "nodes (browser)": nodes,
      "same nodes and edges": nodes === nodeResult.landmarks.length && edges === nodeResult.edges.source.length ? "yes" : "NO",
      "load s": (loadMs / 1000).toFixed(1),
      "longest main task in load ms": longestInLoad.toFixed(0),
      "Node build ms": nodeMs.toFixed(0),
      "Node 2-thread build ms": median(twoThreadTimes).toFixed(0),
      "browser request→answer ms": answeredMs.toFixed(0),
      "browser request→drawn ms": drawnMs.toFixed(0),
      "ratio drawn ÷ Node": (drawnMs / nodeMs).toFixed(2),
      "longest main task in builds ms": longest.toFixed(0),
      "main tasks > 50 ms in builds": buildTasks.filter((t) => t > 50).map((t) => t.toFixed(0)).join(" ") || "none",
      "cancel→answer ms": cancelMs.toFixed(0),
      "table survives cancel": survived ? "yes" : "NO",
      "worker peak in builds ÷ table": (workerPeak / tableBytes).toFixed(2),
      "main heap peak ÷ table": (heap.peak() / tableBytes).toFixed(2),
    });
  }
} finally {
  await preview.stop();
}

const headers = Object.keys(rows[0] ?? {});
const widths = headers.map((h) => Math.max(h.length, ...rows.map((r) => String(r[h]).length)));
const line = (cells: string[]): string => `| ${cells.map((c, i) => c.padEnd(widths[i]!)).join(" | ")} |`;
console.log("cover build in the browser worker (headless Chromium) vs Node: medians of 6 Node builds (3 before, 3 after the page's) and 3 page builds");
console.log("probes: times = User Timing marks set by the app; long tasks = PerformanceObserver 'longtask'; worker peak = DevTools protocol Runtime.getHeapUsage (usedSize + backingStorageSize) in the worker every 50 ms, from a collected heap (HeapProfiler.collectGarbage) before each build, table included; main heap = DevTools protocol Performance.getMetrics JSHeapUsedSize");
console.log(line(headers));
console.log(line(widths.map((w) => "-".repeat(w))));
for (const r of rows) console.log(line(headers.map((h) => String(r[h]))));
await mkdir(new URL("./results/", import.meta.url), { recursive: true });
await writeFile(new URL("./results/browser.json", import.meta.url), `${JSON.stringify({ rows }, null, 2)}\n`);
