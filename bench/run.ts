// npm run bench [-- --quick]: times the cover build phase by phase on seeded synthetic tables and
// prints a table (also written as JSON to bench/results/latest.json). Timings live here, never in
// tests. Each radius is calibrated so that the greedy file-order net has 1,000 ± 10 % landmarks.
// On the 10,000-row cases the plain computation (bench/plainCover.ts) is timed too and checked
// to give identical landmarks, balls and edges. --quick (or SHOAL_BENCH_QUICK=1) runs those only.
// Each case is built again on two threads (bench/threadSteps.ts): the per-step speed-up.
// Then the radius sweep against 24 separate builds (bench/sweep.ts, its own table and JSON), the
// reading speed (bench/readTable.ts), and the whole command as a process (bench/wholeProcess.ts;
// --ten-million adds 10,000,000 × 8).
import { mkdir, writeFile } from "node:fs/promises";
import { cpus, loadavg } from "node:os";
import { performance } from "node:perf_hooks";
import { buildCover, euclidean, scaleTable, selectFeatures, type CoverParams, type CoverResult, type ParsedTable } from "../src/core/index.ts";
import { calibrateRadius } from "./calibrateRadius.ts";
import { timeLoops } from "./timeLoops.ts";
import { memoryProbe, memoryProbeName } from "./memoryProbe.ts";
import { plainCover } from "./plainCover.ts";
import { closeThreads, threadColumns } from "./threadSteps.ts";
import { gaussianClusters, uniformCube } from "./syntheticTables.ts";

interface Case {
  readonly name: string;
  readonly rows: number;
  readonly dims: number;
  readonly make: () => ParsedTable;
}

const quick = process.argv.includes("--quick") || process.env.SHOAL_BENCH_QUICK === "1";
const sizes: readonly (readonly [number, readonly number[]])[] = quick ? [[10_000, [4, 16, 64]]] : [[10_000, [4, 16, 64]], [100_000, [4, 16, 64]], [1_000_000, [4, 8]]];
const cases: Case[] = sizes.flatMap(([rows, dimsList]) =>
  dimsList.flatMap((dims) => [
    { name: "uniform cube", rows, dims, make: () => uniformCube(rows, dims, 1) },
    { name: "8 Gaussian clusters", rows, dims, make: () => gaussianClusters(rows, dims, 8, 2) },
  ]),
);
const repeatsFor = (rows: number): number => (rows <= 10_000 ? 5 : rows <= 100_000 ? 3 : 1);
const median = (xs: readonly number[]): number => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
const ms = (x: number): string => x.toFixed(x < 10 ? 1 : 0);
const sameLists = (a: ArrayLike<number>, b: ArrayLike<number>): boolean => a.length === b.length && Array.prototype.every.call(a, (x, i) => x === b[i]);

const started = Date.now();
const loadBefore = loadavg();
const table: Record<string, string | number>[] = [];
for (const c of cases) {
  const parsed = c.make();
  const features = parsed.columns.map((column) => column.name);
  const scaled = scaleTable(selectFeatures(parsed, features, "drop").table, "zscore").table;
  const calibration = calibrateRadius(scaled, euclidean, 1000, 0.1);
  const params: CoverParams = { features, scale: "zscore", metric: "euclidean", radius: calibration.radius, landmarks: "greedy-file-order", seed: 1 };
  const runs: { result: CoverResult; total: number; cpu: number; peak: number }[] = [];
  for (let r = 0; r < repeatsFor(c.rows); ++r) {
    const probe = memoryProbe();
    const cpu = process.cpuUsage();
    const t0 = performance.now();
    const result = buildCover(parsed, params, { now: () => performance.now(), loops: false, onProgress: probe.sample });
    const total = performance.now() - t0;
    const used = process.cpuUsage(cpu);
    probe.sample();
    runs.push({ result, total, cpu: (used.user + used.system) / 1000, peak: probe.peak() });
  }
  const last = runs.at(-1)!.result;
  const phase = (key: keyof CoverResult["timings"]): number => median(runs.map((run) => run.result.timings[key]));
  const build = median(runs.map(({ result: { timings: t } }) => t.landmarks + t.members + t.edges + t.components));
  const loops = timeLoops(last);
  const row: Record<string, string | number> = {
    case: `${c.name} ${c.rows.toLocaleString("en")} × ${c.dims}`,
    radius: Number(calibration.radius.toPrecision(6)),
    landmarks: last.landmarks.length,
    "balls/row": (last.members.items.length / last.usedRows.length).toFixed(2),
    edges: last.edges.source.length,
    "scale ms": ms(phase("scale")),
    "net ms": ms(phase("landmarks")),
    "members ms": ms(phase("members")),
    "edges ms": ms(phase("edges")),
    "build ms": ms(build),
    "total ms": ms(median(runs.map((run) => run.total))),
    "cpu ms": ms(median(runs.map((run) => run.cpu))),
    "peak B/row": Math.round(Math.max(...runs.map((run) => run.peak)) / c.rows),
    "loops ms": loops.skipped ? `skipped (${loops.tripleVisits.toExponential(1)} triples)` : `${ms(loops.ms)} (T ${loops.triangles}, b1 ${loops.b1})`,
    runs: runs.length,
  };
  Object.assign(row, await threadColumns(parsed, params, runs.map((run) => run.result), repeatsFor(c.rows)));
  if (c.rows <= 10_000) {
    const times: number[] = [];
    let plain = plainCover(scaled, euclidean, calibration.radius);
    for (let r = 0; r < 3; ++r) {
      const t0 = performance.now();
      plain = plainCover(scaled, euclidean, calibration.radius);
      times.push(performance.now() - t0);
    }
    const same =
      sameLists(plain.landmarks, last.landmarks) &&
      sameLists(plain.members.offsets, last.members.offsets) &&
      sameLists(plain.members.items, last.members.items) &&
      (["source", "target", "shared"] as const).every((key) => sameLists(plain.edges[key], last.edges[key]));
    row["plain ms"] = ms(median(times));
    row.identical = same ? "yes" : "NO";
    row["speed-up"] = `${(median(times) / build).toFixed(1)}×`;
  }
  table.push(row);
  console.error(`done: ${String(row.case)} (${((Date.now() - started) / 1000).toFixed(0)} s)`);
}

closeThreads();
const headers = [...new Set(table.flatMap((row) => Object.keys(row)))];
const cell = (row: Record<string, string | number>, h: string): string => String(row[h] ?? "");
const widths = headers.map((h) => Math.max(h.length, ...table.map((row) => cell(row, h).length)));
const line = (cells: string[]): string => `| ${cells.map((text, i) => text.padEnd(widths[i]!)).join(" | ")} |`;
const note = [
  `cover build, Euclidean on z-scored columns, greedy file-order net; Node ${process.version}, ${cpus().length} × ${cpus()[0]?.model ?? "cpu"}, clock performance.now()`,
  "times: median of `runs` runs; build = net + members + edges + components (from the scaled table to edges); total adds scaling; cpu = process.cpuUsage() of the whole build",
  `peak B/row: ${memoryProbeName}, above the level before the build, per row`,
  "2t = buildCoverOnThreads with a worker_threads helper (bench/threadSteps.ts): × = one-thread step ÷ two-thread step; split = the steps that had enough work to split (balls found after the net, the edge count); none = the greedy net found the balls itself and the serial net dominates",
  "loops = nerve triangles and b1 (timed once, skipped above 2.5e7 triple visits Σ C(c, 3)); plain = bench/plainCover.ts on the same scaled table",
  `load average before ${loadBefore.map((x) => x.toFixed(2)).join(" ")}, after ${loadavg().map((x) => x.toFixed(2)).join(" ")}; whole bench ${((Date.now() - started) / 1000).toFixed(0)} s`,
];
console.log(note.join("\n"));
console.log(line(headers));
console.log(line(widths.map((w) => "-".repeat(w))));
for (const row of table) console.log(line(headers.map((h) => cell(row, h))));
await mkdir(new URL("./results/", import.meta.url), { recursive: true });
await writeFile(new URL("./results/latest.json", import.meta.url), `${JSON.stringify({ node: process.version, quick, note, rows: table }, null, 2)}\n`);

console.log("");
await import("./sweep.ts"); // prints the sweep table, writes bench/results/sweep.json

console.log("");
await import("./readTable.ts"); // prints the reading speed (MB/s) of a mixed and a 17-digit file

console.log("");
const { wholeProcess } = await import("./wholeProcess.ts");
await wholeProcess({ tenMillion: process.argv.includes("--ten-million") || process.env.SHOAL_BENCH_TEN_MILLION === "1" });
