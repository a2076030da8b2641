// npm run bench:frames: moving through a graph of about 5,000 nodes (the most the workbench lays
// out) in Debian's headless Chromium, driven by playwright-core. A synthetic table of 20,000 rows ×
// 3 (8 Gaussian clusters, seeded) is built at a radius calibrated in Node to about 4,800 greedy
// file-order landmarks. Reports, per run: the node and edge counts; result → first complete
// drawing (User Timing marks the app sets: "shoal:build-answered" → "shoal:graph-drawn", the first
// drawing of the new layout, every node on its starting spiral); result → layout settled (no new
// drawing for 1 s, read from the page's graph probe); and frames per second during a scripted pan
// (a mouse drag on empty space, ~1.5 s) and zoom (wheel steps about the middle, in then out,
// ~1.5 s), counted by a requestAnimationFrame loop in the page, with the longest gap between two
// frames. Each input event asks for one redraw, so while the events arrive faster than frames every
// frame redraws the whole graph. `-- --runs 2` repeats the page (default 1; the figure is the median).
import { mkdtemp, mkdir, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { euclidean, selectFeatures, zScore, type ParsedTable } from "../src/core/index.ts";
import { launchBrowser, startPreview } from "../test/browser/harness.ts";
import { calibrateRadius } from "./calibrateRadius.ts";
import { gaussianClusters } from "./syntheticTables.ts";

const runsArgument = process.argv.indexOf("--runs");
const runs = runsArgument > 0 ? Math.max(1, Number(process.argv[runsArgument + 1]) || 1) : 1;
const targetNodes = 4800; // just under maxDrawnNodes (5,000), src/ui/graph/drawLimits.ts
const phaseMs = 1500;

const median = (xs: readonly number[]): number => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

function toCsv(table: ParsedTable): string {
  const lines = [table.columns.map((c) => c.name).join(",")];
  for (let i = 0; i < table.rows; ++i) lines.push(table.columns.map((c) => String(c.numbers[i])).join(","));
  return `${lines.join("\n")}\n`;
}

/** In the page: true once a graph was drawn after the latest build answer. */
function drawnAfterAnswer(): boolean {
  const answer = performance.getEntriesByName("shoal:build-answered").at(-1);
  return answer !== undefined && performance.getEntriesByName("shoal:graph-drawn").some((m) => m.startTime >= answer.startTime);
}

const table = gaussianClusters(20_000, 3, 8, 5);
const features = table.columns.map((c) => c.name);
const { radius, landmarks } = calibrateRadius(zScore(selectFeatures(table, features).table).table, euclidean, targetNodes, 0.03);
const folder = await mkdtemp(join(tmpdir(), "shoal-frames-"));
const file = join(folder, "clusters-20000x3.csv");
await writeFile(file, toCsv(table));

const preview = await startPreview();
const results: Record<string, number>[] = [];
try {
  for (let run = 0; run < runs; ++run) {
    const browser = await launchBrowser();
    const { page } = browser;
    await page.goto(`${preview.url}?probe`); // the graph probe (window.shoalGraph) reads the drawing count and the view
    await page.getByTestId("node-count").waitFor();
    await page.getByTestId("file-input").setInputFiles(file);
    await page.waitForFunction(drawnAfterAnswer, undefined, { timeout: 600_000, polling: 50 });
    await page.evaluate(() => performance.clearMarks());
    await page.locator("#radius-number").fill(String(radius));
    await page.locator("#radius-number").press("Enter");
    await page.waitForFunction(drawnAfterAnswer, undefined, { timeout: 600_000, polling: 50 });
    const firstDrawnMs = await page.evaluate(
      () => performance.getEntriesByName("shoal:graph-drawn").at(-1)!.startTime - performance.getEntriesByName("shoal:build-answered").at(-1)!.startTime,
    );
    // settled: the drawing count stops growing for a second (the simulation has cooled and stopped)
    let drawings = -1;
    for (let k = 0; k < 600; ++k) {
      const now = (await page.evaluate("window.shoalGraph.drawings()")) as number;
      if (now === drawings) break;
      drawings = now;
      await page.waitForTimeout(1000);
    }
    const settledMs = (await page.evaluate(() => performance.now() - performance.getEntriesByName("shoal:build-answered").at(-1)!.startTime)) - 1000;
    const nodes = Number((await page.getByTestId("node-count").textContent())!.replaceAll(",", ""));
    const edges = Number((await page.getByTestId("edge-count").textContent())!.replaceAll(",", ""));

    // frames: a requestAnimationFrame loop in the page records every frame's time while the mouse pans, then zooms
    await page.evaluate(`(() => {
      const w = window;
      w.__frames = [];
      w.__counting = true;
      const count = (t) => { w.__frames.push(t); if (w.__counting) requestAnimationFrame(count); };
      requestAnimationFrame(count);
    })()`);
    const box = (await page.getByTestId("graph-canvas").boundingBox())!;
    const drawingsBefore = (await page.evaluate("window.shoalGraph.drawings()")) as number;
    const started = Date.now();
    // pan: press in the fit's empty margin, then circle around it
    const origin = { x: box.x + 4, y: box.y + 4 };
    await page.mouse.move(origin.x, origin.y);
    await page.mouse.down();
    for (let step = 0; Date.now() - started < phaseMs; ++step) {
      const angle = step / 20;
      await page.mouse.move(origin.x + 150 + 120 * Math.cos(angle), origin.y + 120 + 90 * Math.sin(angle));
    }
    await page.mouse.up();
    // zoom: wheel steps about the middle, 20 in, 20 out, and again
    await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
    for (let step = 0; Date.now() - started < 2 * phaseMs; ++step) await page.mouse.wheel(0, Math.floor(step / 20) % 2 === 0 ? -60 : 60);
    const frames = (await page.evaluate("(window.__counting = false, window.__frames)")) as number[];
    const drawingsAfter = (await page.evaluate("window.shoalGraph.drawings()")) as number;
    let longestGap = 0;
    for (let i = 1; i < frames.length; ++i) longestGap = Math.max(longestGap, frames[i]! - frames[i - 1]!);
    const seconds = (frames.at(-1)! - frames[0]!) / 1000;
    results.push({
      nodes,
      edges,
      firstDrawnMs,
      settledMs,
      fps: (frames.length - 1) / seconds,
      redrawsPerSecond: (drawingsAfter - drawingsBefore) / seconds,
      longestFrameMs: longestGap,
    });
    await browser.close();
  }
} finally {
  await preview.stop();
}

const pick = (key: string): number => median(results.map((r) => r[key]!));
const summary = {
  table: "8 Gaussian clusters, 20,000 × 3 (seed 5)",
  radius: Number(radius.toPrecision(4)),
  "landmarks (Node calibration)": landmarks,
  nodes: pick("nodes"),
  edges: pick("edges"),
  runs,
  "result → first complete drawing ms": Math.round(pick("firstDrawnMs")),
  "result → layout settled s": Number((pick("settledMs") / 1000).toFixed(1)),
  "frames per second, pan + zoom": Number(pick("fps").toFixed(1)),
  "redraws per second": Number(pick("redrawsPerSecond").toFixed(1)),
  "longest frame ms": Math.round(pick("longestFrameMs")),
};
console.log("moving through a ~5,000-node graph in headless Chromium (medians over runs)");
for (const [key, value] of Object.entries(summary)) console.log(`${key.padEnd(38)} ${value}`);
await mkdir(new URL("./results/", import.meta.url), { recursive: true });
await writeFile(new URL("./results/frames.json", import.meta.url), `${JSON.stringify({ summary, results }, null, 2)}\n`);
