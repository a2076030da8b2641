// npx tsx bench/sweep.ts [--quick], also run at the end of `npm run bench`: times a 24-step
// radius sweep against the 24 separate buildCover calls it replaces, at the same radii (the
// default range of each table), and checks that both give the same figures at every radius.
// Timings live here, never in tests. Each figure is the median of `repeats` runs after one
// warm-up sweep; --quick skips the 100,000-row table.
import { mkdir, readFile, writeFile } from "node:fs/promises";
import { performance } from "node:perf_hooks";
import { buildCover, parseCsvText, type LandmarkRule, type MetricName, type ParsedTable } from "../src/core/index.ts";
import { radiusSweep, type RadiusSweep } from "../src/core/sweep/radiusSweep.ts";
import { gaussianClusters } from "./syntheticTables.ts";

interface Case {
  readonly name: string;
  readonly table: ParsedTable;
  readonly features: readonly string[];
  readonly landmarks: LandmarkRule;
  readonly metric: MetricName;
  readonly repeats: number;
}

const quick = process.argv.includes("--quick") || process.env.SHOAL_BENCH_QUICK === "1";
const median = (xs: number[]): number => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
const clock = (): number => performance.now();

async function cases(): Promise<Case[]> {
  const demo = parseCsvText(await readFile(new URL("../public/demo/pump-fleet.csv", import.meta.url), "utf8"));
  const demoFeatures = ["age_years", "flow_m3h", "head_m", "power_kw", "efficiency_pct", "vibration_mm_s", "bearing_temp_c", "starts_per_day", "runtime_h_per_day", "suction_pressure_kpa"];
  const out: Case[] = (["greedy-file-order", "greedy-shuffled", "maximin"] as const).map((landmarks) => ({ name: "demo pump fleet 2,400 × 10", table: demo, features: demoFeatures, landmarks, metric: "euclidean", repeats: 11 }));
  out.push({ name: "demo pump fleet 2,400 × 10", table: demo, features: demoFeatures, landmarks: "greedy-file-order", metric: "cosine", repeats: 11 });
  if (!quick) {
    const clusters = gaussianClusters(100_000, 16, 8, 2);
    out.push({ name: "8 Gaussian clusters 100,000 × 16", table: clusters, features: clusters.columns.map((c) => c.name), landmarks: "greedy-file-order", metric: "euclidean", repeats: 1 });
  }
  return out;
}

function separateBuilds(c: Case, radii: Float64Array): { ms: number; equal: (sweep: RadiusSweep) => boolean } {
  const started = clock();
  const results = Array.from(radii, (radius) => buildCover(c.table, { features: c.features, scale: "zscore", metric: c.metric, landmarks: c.landmarks, seed: 1, radius }));
  const ms = clock() - started;
  const equal = (sweep: RadiusSweep): boolean =>
    results.every((b, k) => {
      const f = sweep.figures;
      return f.nodes[k] === b.landmarks.length && f.edges[k] === b.edges.source.length && f.b0[k] === b.componentCount && f.b1[k] === b.betti!.b1 && f.cycleRank[k] === b.cycleRank;
    });
  return { ms, equal };
}

const all = await cases();
radiusSweep(all[0]!.table, { features: all[0]!.features, scale: "zscore", metric: "euclidean", landmarks: "greedy-file-order", seed: 1 }); // warm-up
const rows: Record<string, string | number>[] = [];
for (const c of all) {
  const params = { features: c.features, scale: "zscore", metric: c.metric, landmarks: c.landmarks, seed: 1 } as const;
  const radii = radiusSweep(c.table, params).figures.radius;
  // the three kinds of run alternate, so that a busy machine slows them alike
  const withRange: RadiusSweep[] = [];
  const sweeps: { sweep: RadiusSweep; ms: number }[] = [];
  const builds: ReturnType<typeof separateBuilds>[] = [];
  for (let r = 0; r < c.repeats; ++r) {
    withRange.push(radiusSweep(c.table, params, { now: clock }));
    const started = clock();
    const sweep = radiusSweep(c.table, params, { radii, now: clock });
    sweeps.push({ sweep, ms: clock() - started });
    builds.push(separateBuilds(c, radii));
  }
  const sweepMs = median(sweeps.map((s) => s.ms));
  const buildMs = median(builds.map((b) => b.ms));
  const rangeMs = median(withRange.map((s) => s.timings.range));
  rows.push({
    case: `${c.name}, ${c.metric}, ${c.landmarks}`,
    steps: radii.length,
    radii: `${radii[0]!} … ${radii[radii.length - 1]!}`,
    "default range ms": rangeMs.toFixed(0),
    "sweep ms": sweepMs.toFixed(0),
    "24 builds ms": buildMs.toFixed(0),
    ratio: (sweepMs / buildMs).toFixed(2),
    "ratio with range": ((sweepMs + rangeMs) / buildMs).toFixed(2),
    "same figures": builds[0]!.equal(sweeps[0]!.sweep) ? "yes" : "NO",
  });
}

const headers = Object.keys(rows[0]!);
const widths = headers.map((h) => Math.max(h.length, ...rows.map((r) => String(r[h]).length)));
const line = (cells: string[]): string => `| ${cells.map((cell, i) => cell.padEnd(widths[i]!)).join(" | ")} |`;
console.log(`radius sweep vs separate builds, median of the stated repeats, Node ${process.version}, clock: performance.now()`);
console.log(line(headers));
console.log(line(widths.map((w) => "-".repeat(w))));
for (const r of rows) console.log(line(headers.map((h) => String(r[h]))));
await mkdir(new URL("./results/", import.meta.url), { recursive: true });
await writeFile(new URL("./results/sweep.json", import.meta.url), `${JSON.stringify({ node: process.version, quick, rows }, null, 2)}\n`);
