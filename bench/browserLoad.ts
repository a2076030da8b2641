// npx tsx bench/browserLoad.ts: reading a 1,000,000-row × 20-column CSV (about 200 MB) in the
// workbench's worker in headless Chromium. Prints load time (file chosen → table shown), the
// longest main-thread task while loading (PerformanceObserver "longtask"), and memory: the
// DevTools protocol's Performance.getMetrics JSHeapUsedSize on the main thread (sampled every
// 100 ms; peak) and performance.measureUserAgentSpecificMemory() after loading (main + worker).
import { createWriteStream } from "node:fs";
import { mkdtemp, stat } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { randomSource } from "../src/core/index.ts";
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

const preview = await startPreview();
const browser = await launchBrowser();
try {
  const { page } = browser;
  await watchLongTasks(page);
  await page.goto(preview.url);
  await page.getByTestId("node-count").waitFor();
  await resetLongTasks(page);
  const heap = await sampleMainHeap(page);
  const started = Date.now();
  await page.getByTestId("file-input").setInputFiles(file);
  await page.getByText(`${rows.toLocaleString("en-US")} rows`).waitFor({ timeout: 900_000 });
  const loadMs = Date.now() - started;
  heap.stop();
  const longest = await longestTask(page);
  const memory = await pageMemory(page);
  const table = rows * columns * 8;
  const mb = (x: number): string => (x / 2 ** 20).toFixed(0);
  console.log(`| file | size MiB | load s | longest main task ms | main heap peak MiB | memory after load (main + worker) MiB | Float64 table MiB |`);
  console.log(`| --- | --- | --- | --- | --- | --- | --- |`);
  console.log(`| ${rows.toLocaleString("en-US")} × ${columns} CSV | ${mb(bytes)} | ${(loadMs / 1000).toFixed(1)} | ${longest.toFixed(0)} | ${mb(heap.peak())} | ${mb(memory)} | ${mb(table)} |`);
} finally {
  await browser.close();
  await preview.stop();
}
