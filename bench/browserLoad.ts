// npx tsx bench/browserLoad.ts: reading a 1,000,000-row × 20-column CSV (about 200 MB) in the
// workbench's worker in headless Chromium. Prints load time (file chosen → table shown), the
// longest main-thread task while loading (PerformanceObserver "longtask"), and memory: the
// DevTools protocol's Performance.getMetrics JSHeapUsedSize on the main thread (sampled every
// 100 ms; peak) and performance.measureUserAgentSpecificMemory() after loading (main + worker).
// The reading speed in the worker is the file's size over the time from the "load" request posted
// to the worker to its "loaded" answer arriving (a wrapper of the page's Worker class records both).
import { createWriteStream } from "node:fs";
import { mkdtemp, stat } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { randomSource } from "../src/core/index.ts";
import type { Page } from "playwright-core";
import { launchBrowser, startPreview } from "../test/browser/harness.ts";
import { longestTask, pageMemory, resetLongTasks, sampleMainHeap, watchLongTasks } from "./browserProbes.ts";

const rows = Number(process.env.SHOAL_BENCH_ROWS ?? 1_000_000);
const columns = 20;
const file = join(await mkdtemp(join(tmpdir(), "shoal-load-")), `load-${rows}x${columns}.csv`);
await new Promise<void>((resolve, reject) => {
  const out = createWriteStream(file);
  const random = randomSource(7);
  out.write(`${Array.from({ length: columns }, (_, j) => `c${j + 1}`).join(",")}\n`);
  let i = 0;
  const write = (): void => {
    let ok = true;
    while (i < rows && ok) {
      ok = out.write(`${Array.from({ length: columns }, () => (random() * 1000).toFixed(4)).join(",")}\n`);
      i++;
    }
    if (i < rows) out.once("drain", write);
    else out.end(resolve);
  };
  out.on("error", reject);
  write();
});
const bytes = (await stat(file)).size;

type ReadClock = { __readStart: number; __readEnd: number };
/** Call before the page loads: notes when a "load" request is posted to a worker and when its "loaded" answer arrives. */
async function watchWorkerRead(page: Page): Promise<void> {
  await page.addInitScript(() => {
    const w = window as unknown as ReadClock;
    const post = Worker.prototype.postMessage as (this: Worker, ...args: unknown[]) => void;
    const watched = new WeakSet<Worker>();
    Worker.prototype.postMessage = function (this: Worker, ...args: unknown[]): void {
      if (!watched.has(this)) {
        watched.add(this);
        this.addEventListener("message", (event: MessageEvent<{ type?: string } | null>) => {
          if (event.data?.type === "loaded") w.__readEnd = performance.now();
        });
      }
      if ((args[0] as { type?: string } | null)?.type === "load") w.__readStart = performance.now();
      post.apply(this, args);
    } as typeof Worker.prototype.postMessage;
  });
}

const preview = await startPreview();
const browser = await launchBrowser();
try {
  const { page } = browser;
  await watchLongTasks(page);
  await watchWorkerRead(page);
  await page.goto(preview.url);
  await page.getByTestId("node-count").waitFor();
  await resetLongTasks(page);
  const heap = await sampleMainHeap(page);
  const started = Date.now();
  await page.getByTestId("file-input").setInputFiles(file);
  await page.getByText(`${rows.toLocaleString("en-US")} rows`).waitFor({ timeout: 900_000 });
  const loadMs = Date.now() - started;
  const readMs = await page.evaluate(() => (window as unknown as ReadClock).__readEnd - (window as unknown as ReadClock).__readStart);
  heap.stop();
  const longest = await longestTask(page);
  const memory = await pageMemory(page);
  const table = rows * columns * 8;
  const mb = (x: number): string => (x / 2 ** 20).toFixed(0);
  console.log(`| file | size MiB | load s | worker read s | worker read MB/s | longest main task ms | main heap peak MiB | memory after load (main + worker) MiB | Float64 table MiB |`);
  console.log(`| --- | --- | --- | --- | --- | --- | --- | --- | --- |`);
  console.log(`| ${rows.toLocaleString("en-US")} × ${columns} CSV | ${mb(bytes)} | ${(loadMs / 1000).toFixed(1)} | ${(readMs / 1000).toFixed(2)} | ${(bytes / 1e3 / readMs).toFixed(0)} | ${longest.toFixed(0)} | ${mb(heap.peak())} | ${mb(memory)} | ${mb(table)} |`);
} finally {
  await browser.close();
  await preview.stop();
}
