// npx tsx bench/readTable.ts [rows]: writes a generated CSV of `rows` (default 1,000,000) × 20
// columns to a temporary file, then reads it the way the worker does (1 MiB byte chunks, decoded
// and pushed into createTableReader) and prints rows/s and the peak resident set size.
// Columns: 17 numbers with 3–6 decimals, one integer code, one categorical text (12 levels) and
// one identifier text. Timings live here, never in tests.
import { createReadStream, createWriteStream } from "node:fs";
import { mkdtemp, rm, stat } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { performance } from "node:perf_hooks";
import { once } from "node:events";
import { createTableReader } from "../src/core/table/createTableReader.ts";
import { randomSource } from "../src/core/random.ts";

const rows = Number(process.argv[2] ?? 1_000_000);
const levels = ["north", "south", "east", "west", "centre", "harbour", "hill", "river", "plain", "forest", "coast", "valley"];

async function writeCsv(path: string): Promise<void> {
  const random = randomSource(7);
  const out = createWriteStream(path);
  const header = [...Array.from({ length: 17 }, (_, j) => `x${j + 1}`), "code", "zone", "tag"];
  let block = `${header.join(",")}\n`;
  for (let i = 0; i < rows; ++i) {
    const cells: string[] = [];
    for (let j = 0; j < 17; ++j) cells.push(((random() - 0.5) * 10 ** (1 + (j % 5))).toFixed(3 + (j % 4)));
    cells.push(String(Math.floor(random() * 100)), levels[Math.floor(random() * levels.length)]!, `specimen-${i.toString(36).padStart(6, "0")}`);
    block += `${cells.join(",")}\n`;
    if (block.length > 1 << 20) {
      if (!out.write(block)) await once(out, "drain");
      block = "";
    }
  }
  out.end(block);
  await once(out, "finish");
}

const folder = await mkdtemp(join(tmpdir(), "shoal-bench-"));
const path = join(folder, "table.csv");
try {
  await writeCsv(path);
  const bytes = (await stat(path)).size;
  globalThis.gc?.();
  const baseline = process.memoryUsage().rss;
  let peak = baseline;
  const sampler = setInterval(() => (peak = Math.max(peak, process.memoryUsage().rss)), 20);
  const started = performance.now();
  const reader = createTableReader();
  const decoder = new TextDecoder("utf-8");
  for await (const chunk of createReadStream(path, { highWaterMark: 1 << 20 })) {
    reader.push(decoder.decode(chunk as Buffer, { stream: true }));
    peak = Math.max(peak, process.memoryUsage().rss);
  }
  reader.push(decoder.decode());
  const { table, report } = reader.finish();
  const seconds = (performance.now() - started) / 1000;
  peak = Math.max(peak, process.memoryUsage().rss);
  clearInterval(sampler);
  const mb = (n: number): string => `${(n / 2 ** 20).toFixed(0)} MiB`;
  console.log(`read ${table.rows.toLocaleString("en")} rows × ${table.columns.length} columns (${mb(bytes)} of CSV) in ${seconds.toFixed(2)} s`);
  console.log(`${Math.round(table.rows / seconds).toLocaleString("en")} rows/s, ${(bytes / 2 ** 20 / seconds).toFixed(1)} MiB/s`);
  console.log(`peak RSS ${mb(peak)} (${mb(peak - baseline)} above the ${mb(baseline)} before reading)`);
  console.log(`types: ${report.columns.map((c) => `${c.name}=${c.type}`).join(" ")}`);
} finally {
  await rm(folder, { recursive: true, force: true });
}
