// The whole headless command as a user runs it: `node bin/shoal.mjs build DATA --out DIR` as a
// child process, from start to exit, reading the CSV and writing the four files. Run by
// `npm run bench` (after the build table) or alone: `npx tsx bench/wholeProcess.ts [--ten-million]`.
// Tables: seeded uniform points in the unit cube, written with 17 significant digits, generated
// once into a temporary folder (removed at the end). Timings live here, never in tests.
// --ten-million (or SHOAL_BENCH_TEN_MILLION=1) adds 10,000,000 × 8 (about 1.6 GB of CSV, not
// committed) and its peak resident memory; --only-ten-million runs that case alone.
import { execFileSync, spawn } from "node:child_process";
import { once } from "node:events";
import { createWriteStream } from "node:fs";
import { mkdir, mkdtemp, readFile, rm, stat, writeFile } from "node:fs/promises";
import { loadavg, tmpdir } from "node:os";
import { join } from "node:path";
import { performance } from "node:perf_hooks";
import { fileURLToPath } from "node:url";
import { readInput } from "../src/cli/readInput.ts";
import { writeFileSet } from "../src/cli/writeFileSet.ts";
import { buildCover, coverExportChunks, coverSummary, randomSource } from "../src/core/index.ts";

const bin = fileURLToPath(new URL("../bin/shoal.mjs", import.meta.url));

export interface WholeCase {
  readonly rows: number;
  readonly dims: number;
  /** Euclidean radius on z-scored columns; found once by bisection for the landmark count named beside it. */
  readonly radius: number;
  readonly runs: number;
}

/** The two contract cases: 100,000 × 16 at about 1,200 landmarks (≤ 2.0 s) and 100,000 × 4 at about 2,000 (≤ 0.7 s). */
export const wholeCases: readonly WholeCase[] = [
  { rows: 100_000, dims: 16, radius: 3.81, runs: 5 }, // 1,2xx landmarks: bench/calibrateRadius.ts on this seeded table (target 1,200 ± 2 %), rounded to 3 digits
  { rows: 100_000, dims: 4, radius: 0.486, runs: 5 }, // 2,0xx landmarks: the same, target 2,000 ± 2 %
];
export const tenMillionCase: WholeCase = { rows: 10_000_000, dims: 8, radius: 1.87, runs: 1 }; // 1,032 landmarks on the first 200,000 rows (calibrateRadius, target 1,000 ± 5 %)

/** Writes rows × dims uniform numbers in [0, 1) (xoshiro128**, seed = dims) with 17 significant digits, header x1..xd, streamed. */
export async function writeUniformCsv(path: string, rows: number, dims: number): Promise<number> {
  const random = randomSource(dims);
  const out = createWriteStream(path);
  let block = `${Array.from({ length: dims }, (_, j) => `x${j + 1}`).join(",")}\n`;
  for (let i = 0; i < rows; ++i) {
    let line = random().toPrecision(17);
    for (let j = 1; j < dims; ++j) line += `,${random().toPrecision(17)}`;
    block += `${line}\n`;
    if (block.length >= 1 << 20) {
      if (!out.write(block)) await once(out, "drain");
      block = "";
    }
  }
  out.end(block);
  await once(out, "finish");
  return (await stat(path)).size;
}

const median = (xs: readonly number[]): number => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

function wall(args: readonly string[]): number {
  const started = performance.now();
  execFileSync(process.execPath, args, { stdio: "ignore" });
  return performance.now() - started;
}

// Printed by the child at exit: its peak resident set (getrusage ru_maxrss, KiB on Linux).
const peakHook = `data:text/javascript,process.on("exit",()=>process.stderr.write("\\nshoal-peak-rss-kib "+process.resourceUsage().maxRSS+"\\n"))`;

interface ChildRun {
  readonly ms: number;
  readonly peakKiB: number;
}

/** One `shoal build` from spawn to exit; with `peak`, through the exit hook above (which costs 10–50 ms, so timed runs go without it). */
async function runBuild(input: string, out: string, radius: number, peak: boolean): Promise<ChildRun> {
  const started = performance.now();
  const child = spawn(process.execPath, [...(peak ? ["--import", peakHook] : []), bin, "build", input, "--radius", String(radius), "--out", out], { stdio: ["ignore", "ignore", "pipe"] });
  let stderr = "";
  child.stderr.on("data", (chunk: Buffer) => (stderr += chunk.toString()));
  const [code] = (await once(child, "exit")) as [number | null];
  const ms = performance.now() - started;
  if (code !== 0) throw new Error(`shoal build exited ${code}: ${stderr}`);
  return { ms, peakKiB: Number(/shoal-peak-rss-kib (\d+)/.exec(stderr)?.[1] ?? NaN) };
}

/** Start-up: median of 15 `node bin/shoal.mjs help` minus median of 15 `node -e 0`, alternated. */
export function startUp(): { node: number; help: number } {
  const bare: number[] = [];
  const help: number[] = [];
  for (let i = 0; i < 15; ++i) {
    bare.push(wall(["-e", "0"]));
    help.push(wall([bin, "help"]));
  }
  return { node: median(bare), help: median(help) };
}

const ms = (x: number): string => x.toFixed(0);

/**
 * The writing alone, in this process: the table read and built as the command does (without the
 * loops, which the files do not need), then, `runs` times, the node means computed
 * (coverExportChunks resolves them before any line) and the four files made and written through
 * writeFileSet. Returns the output bytes, and the median milliseconds of the means and of the
 * writing (wall clock and CPU time of this process).
 */
export async function writeSpeed(input: string, radius: number, folder: string, runs: number): Promise<{ bytes: number; meansMs: number; wallMs: number; cpuMs: number }> {
  const { table } = await readInput(input, {});
  const features = table.columns.map((c) => c.name);
  const result = buildCover(table, { features, scale: "zscore", metric: "euclidean", radius, landmarks: "greedy-file-order", seed: 1 }, { loops: false });
  const context = { fileName: "t.csv", fileSize: 0, idColumn: null, outcomes: [] };
  const means: number[] = [];
  const wall: number[] = [];
  const cpu: number[] = [];
  for (let r = 0; r < runs; ++r) {
    const meansStarted = performance.now();
    const files = coverExportChunks(table, result, context);
    means.push(performance.now() - meansStarted);
    const usage = process.cpuUsage();
    const started = performance.now();
    await writeFileSet(folder, { "nodes.csv": files["nodes.csv"](), "members.csv": files["members.csv"](), "edges.csv": files["edges.csv"](), "summary.json": `${JSON.stringify(coverSummary(result, context), null, 2)}\n` });
    wall.push(performance.now() - started);
    const used = process.cpuUsage(usage);
    cpu.push((used.user + used.system) / 1000);
  }
  const sizes = await Promise.all(["nodes.csv", "members.csv", "edges.csv", "summary.json"].map((name) => stat(join(folder, name))));
  await rm(folder, { recursive: true, force: true });
  return { bytes: sizes.reduce((sum, s) => sum + s.size, 0), meansMs: median(means), wallMs: median(wall), cpuMs: median(cpu) };
}

/** Runs the cases and prints the "whole process" table; returns its rows. */
export async function wholeProcess(options: { tenMillion: boolean; onlyTenMillion?: boolean }): Promise<Record<string, string>[]> {
  const folder = await mkdtemp(join(tmpdir(), "shoal-whole-"));
  const rows: Record<string, string>[] = [];
  try {
    execFileSync(process.execPath, [bin, "--version"], { stdio: "ignore" }); // builds the bundle if it is stale, outside the timings
    const { node, help } = startUp();
    for (const c of options.onlyTenMillion ? [tenMillionCase] : options.tenMillion ? [...wholeCases, tenMillionCase] : wholeCases) {
      const input = join(folder, `uniform-${c.rows}x${c.dims}.csv`);
      const t0 = performance.now();
      const bytes = await writeUniformCsv(input, c.rows, c.dims);
      console.error(`generated ${input} (${(bytes / 1e6).toFixed(0)} MB) in ${((performance.now() - t0) / 1000).toFixed(1)} s`);
      const out = join(folder, `out-${c.rows}x${c.dims}`);
      const runs: { run: ChildRun; timings: Record<string, number> }[] = [];
      // one run only (10,000,000 rows) both times and measures memory; otherwise one extra run measures memory
      const peakKiB = c.runs === 1 ? null : (await runBuild(input, out, c.radius, true)).peakKiB;
      for (let r = 0; r < c.runs; ++r) {
        const run = await runBuild(input, out, c.radius, peakKiB === null);
        const summary = JSON.parse(await readFile(join(out, "summary.json"), "utf8")) as { nodes: number; edges: number; timingsMs: Record<string, number> };
        runs.push({ run, timings: summary.timingsMs });
      }
      const summary = JSON.parse(await readFile(join(out, "summary.json"), "utf8")) as { nodes: number; edges: number; memberships: number };
      const outBytes = (await Promise.all(["nodes.csv", "members.csv", "edges.csv", "summary.json"].map((name) => stat(join(out, name))))).reduce((sum, s) => sum + s.size, 0);
      const phase = (key: string): number => median(runs.map((r) => r.timings[key] ?? 0));
      const total = median(runs.map((r) => r.run.ms));
      const build = phase("total");
      const rest = median(runs.map((r) => r.run.ms - node - (help - node) - (r.timings.read ?? 0) - (r.timings.total ?? 0)));
      const tableBytes = c.rows * c.dims * 8;
      const listBytes = summary.memberships * 4 + (summary.nodes + 1) * 4;
      const peak = (peakKiB ?? runs[0]!.run.peakKiB) * 1024;
      const speed = c.rows <= 1_000_000 ? await writeSpeed(input, c.radius, join(folder, "write"), 5) : null;
      const rate = (bytes: number, msTaken: number): string => (bytes / 1e3 / msTaken).toFixed(0);
      rows.push({
        case: `uniform ${c.rows.toLocaleString("en")} × ${c.dims}`,
        radius: String(c.radius),
        landmarks: summary.nodes.toLocaleString("en"),
        "CSV MB": (bytes / 1e6).toFixed(0),
        "node ms": ms(node),
        "start-up ms": ms(help - node),
        "read ms": ms(phase("read")),
        "scale ms": ms(phase("scale")),
        "net ms": ms(phase("landmarks")),
        "members ms": ms(phase("members")),
        "edges ms": ms(phase("edges")),
        "components ms": ms(phase("components")),
        "loops ms": ms(phase("loops")),
        "build ms": ms(build),
        "write+rest ms": ms(rest),
        "out MB": (outBytes / 1e6).toFixed(1),
        "means ms": speed ? ms(speed.meansMs) : "",
        "write MB/s wall": speed ? rate(speed.bytes, speed.wallMs) : "",
        "write MB/s cpu": speed ? rate(speed.bytes, speed.cpuMs) : "",
        "total ms": ms(total),
        "peak RSS MiB": (peak / 2 ** 20).toFixed(0),
        "peak / (3·table + lists)": (peak / (3 * tableBytes + listBytes)).toFixed(2),
        runs: String(runs.length),
      });
      await rm(input, { force: true });
      await rm(out, { recursive: true, force: true });
      console.error(`done: ${rows.at(-1)!.case}`);
    }
  } finally {
    await rm(folder, { recursive: true, force: true });
  }
  printTable(rows);
  await mkdir(new URL("./results/", import.meta.url), { recursive: true });
  await writeFile(new URL("./results/whole.json", import.meta.url), `${JSON.stringify({ node: process.version, loadAfter: loadavg(), rows }, null, 2)}\n`);
  return rows;
}

function printTable(rows: readonly Record<string, string>[]): void {
  const headers = [...new Set(rows.flatMap((row) => Object.keys(row)))];
  const widths = headers.map((h) => Math.max(h.length, ...rows.map((row) => (row[h] ?? "").length)));
  const line = (cells: readonly string[]): string => `| ${cells.map((text, i) => text.padEnd(widths[i]!)).join(" | ")} |`;
  console.log(`whole process: node bin/shoal.mjs build DATA --radius R --out DIR, wall clock from spawn to exit, median of \`runs\`; Node ${process.version}, load average now ${loadavg().map((x) => x.toFixed(2)).join(" ")}`);
  console.log("node = bare `node -e 0`; start-up = `node bin/shoal.mjs help` minus that; read and build phases from summary.json's timingsMs;");
  console.log("write+rest = total − node − start-up − read − build (the exports written, and the rest); peak RSS = the child's getrusage maxRSS (in a run of its own);");
  console.log("table = rows × dims × 8 bytes (Float64), lists = 4 bytes per membership and per node offset;");
  console.log("means, write MB/s: in this process, the node means (coverExportChunks), then the four files made and written (writeFileSet), output bytes over the median wall (and CPU) time of 5 runs");
  console.log(line(headers));
  console.log(line(widths.map((w) => "-".repeat(w))));
  for (const row of rows) console.log(line(headers.map((h) => row[h] ?? "")));
}

if (process.argv[1] === fileURLToPath(import.meta.url)) {
  const onlyTenMillion = process.argv.includes("--only-ten-million");
  await wholeProcess({ tenMillion: onlyTenMillion || process.argv.includes("--ten-million") || process.env.SHOAL_BENCH_TEN_MILLION === "1", onlyTenMillion });
}
