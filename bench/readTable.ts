// npx tsx bench/readTable.ts [rows] [--quick] [--runs N]: the reading speed in Node, through the
// pipeline the worker and the headless command use (readTableBytes: 4 MiB byte chunks, UTF-8
// decoding, the incremental reader). Two generated files in a temporary folder:
// - "mixed": rows (default 1,000,000) × 20 columns, 17 numbers with 3–6 decimals, one integer code,
//   one categorical text (12 levels) and one identifier text (about 180 MB);
// - "17 digits": rows × 10 columns of numbers written with 17 significant digits (about 200 MB),
//   which Clinger's fast path declines and Number() reads.
// Prints the median of `runs` reads (default 3; `--quick`: 100,000 rows, 1 run): seconds, MB/s
// (10^6 bytes of file per second), rows/s, the process's CPU time (user + system, GC threads
// included; on a busy machine it moves far less than the clock) and the speed it gives, and the
// peak resident set size above the level before.
// Also the last part of `npm run bench`. Timings live here, never in tests.
import { createWriteStream } from "node:fs";
import { mkdtemp, open, rm, stat } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { performance } from "node:perf_hooks";
import { once } from "node:events";
import { fileSource, utf8 } from "../src/cli/readInput.ts";
import { readTableBytes } from "../src/core/table/readTableBytes.ts";
import { randomSource } from "../src/core/random.ts";

const args = process.argv.slice(2);
const quick = args.includes("--quick");
const runsAt = args.indexOf("--runs");
const runs = runsAt >= 0 ? Number(args[runsAt + 1]) : quick ? 1 : 3;
const rowsArg = args.find((a, i) => /^\d+$/.test(a) && args[i - 1] !== "--runs");
const rows = rowsArg ? Number(rowsArg) : quick ? 100_000 : 1_000_000;
const levels = ["north", "south", "east", "west", "centre", "harbour", "hill", "river", "plain", "forest", "coast", "valley"];

/** Writes `rows` lines from `line(i)` after `header`, in blocks of about 1 MiB. */
async function writeCsv(path: string, header: string, line: (i: number) => string): Promise<number> {
  const out = createWriteStream(path);
  let block = `${header}\n`;
  for (let i = 0; i < rows; ++i) {
    block += `${line(i)}\n`;
    if (block.length > 1 << 20) {
      if (!out.write(block)) await once(out, "drain");
      block = "";
    }
  }
  out.end(block);
  await once(out, "finish");
  return (await stat(path)).size;
}

function mixedFile(path: string): Promise<number> {
  const random = randomSource(7);
  const header = [...Array.from({ length: 17 }, (_, j) => `x${j + 1}`), "code", "zone", "tag"].join(",");
  return writeCsv(path, header, (i) => {
    const cells: string[] = [];
    for (let j = 0; j < 17; ++j) cells.push(((random() - 0.5) * 10 ** (1 + (j % 5))).toFixed(3 + (j % 4)));
    cells.push(String(Math.floor(random() * 100)), levels[Math.floor(random() * levels.length)]!, `specimen-${i.toString(36).padStart(6, "0")}`);
    return cells.join(",");
  });
}

function digitsFile(path: string): Promise<number> {
  const random = randomSource(17);
  const header = Array.from({ length: 10 }, (_, j) => `d${j + 1}`).join(",");
  return writeCsv(path, header, () => Array.from({ length: 10 }, (_, j) => ((random() - 0.5) * 10 ** (j % 7 - 2)).toPrecision(17)).join(","));
}

const median = (xs: readonly number[]): number => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
const mib = (n: number): string => `${(n / 2 ** 20).toFixed(0)} MiB`;

async function timeReads(name: string, path: string, bytes: number): Promise<void> {
  const seconds: number[] = [];
  const cpuSeconds: number[] = [];
  let peakAbove = 0;
  let shape = "";
  for (let run = 0; run < runs; ++run) {
    globalThis.gc?.();
    const baseline = process.memoryUsage().rss;
    let peak = baseline;
    const sampler = setInterval(() => (peak = Math.max(peak, process.memoryUsage().rss)), 20);
    const handle = await open(path, "r");
    const started = performance.now();
    const cpuStarted = process.cpuUsage();
    const { table } = await readTableBytes(fileSource(handle, bytes), {}, { utf8, onProgress: () => (peak = Math.max(peak, process.memoryUsage().rss)) });
    seconds.push((performance.now() - started) / 1000);
    const cpu = process.cpuUsage(cpuStarted);
    cpuSeconds.push((cpu.user + cpu.system) / 1e6);
    await handle.close();
    clearInterval(sampler);
    peakAbove = Math.max(peakAbove, Math.max(peak, process.memoryUsage().rss) - baseline);
    shape = `${table.rows.toLocaleString("en")} rows × ${table.columns.length} columns`;
  }
  const s = median(seconds);
  const cpu = median(cpuSeconds);
  console.log(
    `| ${name} | ${shape} | ${(bytes / 1e6).toFixed(0)} MB | ${s.toFixed(2)} s | ${(bytes / 1e6 / s).toFixed(0)} MB/s | ${Math.round(rows / s).toLocaleString("en")} | ${cpu.toFixed(2)} s | ${(bytes / 1e6 / cpu).toFixed(0)} MB/s | ${mib(peakAbove)} | ${seconds.map((x) => x.toFixed(2)).join(", ")} |`,
  );
}

const folder = await mkdtemp(join(tmpdir(), "shoal-bench-"));
try {
  console.log(`reading through readTableBytes (4 MiB chunks, TextDecoder), median of ${runs} run(s); Node ${process.version}`);
  console.log("| file | table | size | median | speed | rows/s | CPU | speed by CPU time | peak RSS above start | runs (s) |");
  console.log("| --- | --- | --- | --- | --- | --- | --- | --- | --- | --- |");
  for (const [name, make] of [["mixed", mixedFile], ["17 digits", digitsFile]] as const) {
    const path = join(folder, `${name.replace(" ", "")}.csv`);
    const bytes = await make(path);
    await timeReads(name, path, bytes);
    await rm(path);
  }
} finally {
  await rm(folder, { recursive: true, force: true });
}
