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
  await page.addInitScript(() => {
    const w = window as unknown as { __longTasks: number[] };
    w.__longTasks = [];
    new PerformanceObserver((list) => list.getEntries().forEach((e) => w.__longTasks.push(e.duration))).observe({ type: "longtask", buffered: true });
  });
  await page.goto(preview.url);
  await page.getByTestId("node-count").waitFor();
  await page.evaluate(() => ((window as unknown as { __longTasks: number[] }).__longTasks = []));
  const cdp = await page.context().newCDPSession(page);
  await cdp.send("Performance.enable");
  let peakMain = 0;
  const sampler = setInterval(() => {
    void cdp
      .send("Performance.getMetrics")
      .then((r) => (peakMain = Math.max(peakMain, (r as { metrics: { name: string; value: number }[] }).metrics.find((m) => m.name === "JSHeapUsedSize")!.value)))
      .catch(() => {});
  }, 100);
  const started = Date.now();
  await page.getByTestId("file-input").setInputFiles(file);
  await page.getByText(`${rows.toLocaleString("en-US")} rows`).waitFor({ timeout: 900_000 });
  const loadMs = Date.now() - started;
  clearInterval(sampler);
  const longest = await page.evaluate(() => Math.max(0, ...(window as unknown as { __longTasks: number[] }).__longTasks));
  const memory = await page.evaluate(async () => {
    const measure = (performance as unknown as { measureUserAgentSpecificMemory?: () => Promise<{ bytes: number }> }).measureUserAgentSpecificMemory;
    return measure ? (await measure.call(performance)).bytes : NaN;
  });
  const table = rows * columns * 8;
  const mb = (x: number): string => (x / 2 ** 20).toFixed(0);
  console.log(`| file | size MiB | load s | longest main task ms | main heap peak MiB | memory after load (main + worker) MiB | Float64 table MiB |`);
  console.log(`| --- | --- | --- | --- | --- | --- | --- |`);
  console.log(`| ${rows.toLocaleString("en-US")} × ${columns} CSV | ${mb(bytes)} | ${(loadMs / 1000).toFixed(1)} | ${longest.toFixed(0)} | ${mb(peakMain)} | ${mb(memory)} | ${mb(table)} |`);
} finally {
  await browser.close();
  await preview.stop();
}
