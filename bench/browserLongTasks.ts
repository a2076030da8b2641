// npx tsx bench/browserLongTasks.ts (after npm run build): what the main thread's long tasks around
// one build are made of. Loads 100,000 × 16 (8 Gaussian clusters) in headless Chromium, traces
// one rebuild at the suggested radius (nudged by 10⁻¹²) until 1.5 s after its first drawing with
// the DevTools protocol's Tracing domain (devtools.timeline), and prints each main-thread task
// over 30 ms with the events over 3 ms inside it (animation frames, script, collections, commits).
import { mkdtemp, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { launchBrowser, startPreview } from "../test/browser/harness.ts";
import { gaussianClusters } from "./syntheticTables.ts";

interface TraceEvent {
  readonly name: string;
  readonly ph: string;
  readonly pid: number;
  readonly tid: number;
  readonly ts: number;
  readonly dur?: number;
  readonly args?: { readonly name?: string; readonly data?: { readonly functionName?: string; readonly url?: string; readonly lineNumber?: number } };
}

const table = gaussianClusters(100_000, 16, 8, 2);
const lines = [table.columns.map((c) => c.name).join(",")];
for (let i = 0; i < table.rows; ++i) lines.push(table.columns.map((c) => String(c.numbers[i])).join(","));
const file = join(await mkdtemp(join(tmpdir(), "shoal-trace-")), "clusters.csv");
await writeFile(file, `${lines.join("\n")}\n`);

const preview = await startPreview();
const browser = await launchBrowser();
const { page } = browser;
try {
  await page.goto(preview.url);
  await page.getByTestId("node-count").waitFor();
  await page.getByTestId("file-input").setInputFiles(file);
  await page.waitForFunction(() => performance.getEntriesByName("shoal:graph-drawn").length > 0 && !document.querySelector("[data-testid=build-progress]"), undefined, { timeout: 600_000, polling: 100 });
  await page.waitForTimeout(3000); // the load's layout settles
  const cdp = await page.context().newCDPSession(page);
  const events: TraceEvent[] = [];
  cdp.on("Tracing.dataCollected", (event) => events.push(...(event.value as unknown as TraceEvent[])));
  const complete = new Promise((resolve) => cdp.on("Tracing.tracingComplete", resolve));
  await cdp.send("Tracing.start", { categories: "devtools.timeline,disabled-by-default-devtools.timeline,v8.execute", transferMode: "ReportEvents" });
  await page.evaluate(() => performance.clearMarks());
  const radius = Number(await page.locator("#radius-number").inputValue());
  await page.locator("#radius-number").fill(String(radius * (1 + 1e-12)));
  await page.locator("#radius-number").press("Enter");
  await page.waitForFunction(
    () => {
      const answer = performance.getEntriesByName("shoal:build-answered").at(-1);
      return answer !== undefined && performance.getEntriesByName("shoal:graph-drawn").some((m) => m.startTime >= answer.startTime);
    },
    undefined,
    { timeout: 600_000, polling: 50 },
  );
  await page.waitForTimeout(1500);
  await cdp.send("Tracing.end");
  await complete;
  const main = events.find((e) => e.name === "thread_name" && e.args?.name === "CrRendererMain");
  if (!main) throw new Error("no main thread in the trace");
  const onMain = events.filter((e) => e.pid === main.pid && e.tid === main.tid && e.ph === "X" && e.dur !== undefined);
  const tasks = onMain.filter((e) => e.name === "RunTask" && e.dur! > 30_000).sort((a, b) => b.dur! - a.dur!);
  const label = (e: TraceEvent): string => {
    const where = e.args?.data?.url ? `@${e.args.data.url.split("/").pop()}:${e.args.data.lineNumber}` : "";
    return `${e.name}${e.args?.data?.functionName ? `:${e.args.data.functionName}` : ""}${where} ${(e.dur! / 1000).toFixed(0)}`;
  };
  console.log(`main-thread tasks over 30 ms around one build of 100,000 × 16 (${tasks.length}), with the events over 3 ms inside, in ms:`);
  for (const task of tasks) {
    const inside = onMain.filter((e) => e !== task && e.ts >= task.ts && e.ts + e.dur! <= task.ts + task.dur! && e.dur! > 3000 && !e.name.startsWith("V8.GC_"));
    console.log(`${(task.dur! / 1000).toFixed(0)}: ${inside.sort((a, b) => a.ts - b.ts).map(label).join(" | ")}`);
  }
} finally {
  await browser.close();
  await preview.stop();
}
