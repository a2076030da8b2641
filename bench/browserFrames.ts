// npm run bench:frames: moving through a graph of about 5,000 nodes (the most the workbench lays
// out) in Debian's headless Chromium, driven by playwright-core. A synthetic table of 20,000 rows ×
// 3 (8 Gaussian clusters, seeded) is built at a radius calibrated in Node to about 4,800 greedy
// file-order landmarks. Reports, per run: the node and edge counts; result → first complete
// drawing (User Timing marks the app sets: "shoal:build-answered" → "shoal:graph-drawn", the first
// drawing of the new layout, every node on its starting spiral); result → layout settled (no new
// drawing for 1 s, read from the page's graph probe); and frames per second during a scripted pan
// (a pointer drag on empty space, 1.5 s) and zoom (wheel steps about the middle, in then out,
// 1.5 s), driven and counted by a requestAnimationFrame loop in the page that dispatches one event
// per frame, so every frame redraws the whole graph; with the longest gap between two frames and
// the script time of one drawing (the canvas calls; rasterising is the browser's, after them).
// `-- --runs 2` repeats the page (default 1; the figures are medians).
import { mkdtemp, mkdir, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { euclidean, selectFeatures, zScore, type ParsedTable } from "../src/core/index.ts";
import type { Page } from "playwright-core";
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

// In the page: a requestAnimationFrame loop dispatches one input event per frame on the canvas (a pan drag
// from the fit's empty margin, circling, then wheel steps about the middle, 20 in, 20 out, …) and records
// every frame's time; each event asks for one redraw, drawn in the next frame
const frameScript = `new Promise((resolve) => {
  const canvas = document.querySelector("[data-testid=graph-canvas]");
  const rect = canvas.getBoundingClientRect();
  const graph = window.shoalGraph;
  const origin = { x: rect.left + 4, y: rect.top + 4 };
  const middle = { x: rect.left + rect.width / 2, y: rect.top + rect.height / 2 };
  const pointer = (type, x, y) => canvas.dispatchEvent(new PointerEvent(type, {
    pointerId: 7, pointerType: "mouse", isPrimary: true, button: 0, buttons: type === "pointerup" ? 0 : 1, clientX: x, clientY: y, bubbles: true, cancelable: true,
  }));
  const frames = [];
  const drawings = graph.drawings();
  const drawingMs = graph.drawingMs();
  let start = null;
  let panning = true;
  let step = 0;
  const frame = (t) => {
    frames.push(t);
    if (start === null) {
      start = t;
      pointer("pointerdown", origin.x, origin.y);
    }
    const elapsed = t - start;
    if (elapsed < ${phaseMs}) {
      pointer("pointermove", origin.x + 150 + 120 * Math.cos(step / 20), origin.y + 120 + 90 * Math.sin(step / 20));
    } else if (elapsed < ${2 * phaseMs}) {
      if (panning) pointer("pointerup", origin.x, origin.y);
      panning = false;
      canvas.dispatchEvent(new WheelEvent("wheel", { deltaY: Math.floor(step / 20) % 2 === 0 ? -60 : 60, clientX: middle.x, clientY: middle.y, bubbles: true, cancelable: true }));
    } else {
      resolve({ frames, drawings: graph.drawings() - drawings, drawingMs: graph.drawingMs() - drawingMs });
      return;
    }
    ++step;
    requestAnimationFrame(frame);
  };
  requestAnimationFrame(frame);
    })`;

/** Frames per second, the longest frame and the script time of one drawing during the scripted pan and zoom. */
async function measureFrames(page: Page): Promise<{ fps: number; drawingMs: number; longestFrameMs: number }> {
  await page.getByRole("button", { name: /^Fit/ }).click(); // start from the fitted view, its margin empty
  await page.waitForTimeout(300);
  const measured = (await page.evaluate(frameScript)) as { frames: number[]; drawings: number; drawingMs: number };
  const { frames } = measured;
  let longestGap = 0;
  for (let i = 1; i < frames.length; ++i) longestGap = Math.max(longestGap, frames[i]! - frames[i - 1]!);
  const seconds = (frames.at(-1)! - frames[0]!) / 1000;
  return { fps: (frames.length - 1) / seconds, drawingMs: measured.drawingMs / measured.drawings, longestFrameMs: longestGap };
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
    await page.evaluate(() => performance.clearMarks()); // the demo's marks are not the table's
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
    if (nodes !== landmarks) throw new Error(`the page built ${nodes} nodes at radius ${radius}, Node ${landmarks}`);
    const edges = Number((await page.getByTestId("edge-count").textContent())!.replaceAll(",", ""));

    const plain = await measureFrames(page);
    // every node its own colour (a sequential fill over x1): one fill per node, the slowest colouring to draw
    await page.locator(".legend select").first().selectOption("x1");
    await page.waitForTimeout(500);
    const coloured = await measureFrames(page);
    results.push({
      nodes,
      edges,
      firstDrawnMs,
      settledMs,
      fps: plain.fps,
      drawingMs: plain.drawingMs,
      longestFrameMs: plain.longestFrameMs,
      colouredFps: coloured.fps,
      colouredDrawingMs: coloured.drawingMs,
      colouredLongestFrameMs: coloured.longestFrameMs,
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
  "frames per second, pan + zoom (plain fill)": Number(pick("fps").toFixed(1)),
  "script time per drawing ms (plain)": Number(pick("drawingMs").toFixed(1)),
  "longest frame ms (plain)": Math.round(pick("longestFrameMs")),
  "frames per second, pan + zoom (coloured by x1)": Number(pick("colouredFps").toFixed(1)),
  "script time per drawing ms (coloured)": Number(pick("colouredDrawingMs").toFixed(1)),
  "longest frame ms (coloured)": Math.round(pick("colouredLongestFrameMs")),
};
console.log("moving through a ~5,000-node graph in headless Chromium (medians over runs)");
for (const [key, value] of Object.entries(summary)) console.log(`${key.padEnd(48)} ${value}`);
await mkdir(new URL("./results/", import.meta.url), { recursive: true });
await writeFile(new URL("./results/frames.json", import.meta.url), `${JSON.stringify({ summary, results }, null, 2)}\n`);
