// `shoal build` run as a real process (node bin/shoal.mjs) and compared with what the workbench
// exports for the same file and parameters (support: runShoal.ts). Twelve spawns in all, about
// half a second each; the error cases run concurrently.
import { existsSync, mkdirSync, mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { basename, dirname, join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { parseCsvText, defaultRadius, type CoverParams } from "../../src/core/index.ts";
import { defaultRoles } from "../../src/state/defaultRoles.ts";
import { demoTable } from "../../src/state/demo.ts";
import { initialParams } from "../../src/state/slices/paramsSlice.ts";
import { demoPath, runShoal, uiExport, type Run } from "./runShoal.ts";

const scratch = mkdtempSync(join(tmpdir(), "shoal-cli-test-"));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

const outputNames = [".shoal-files", "edges.csv", "members.csv", "nodes.csv", "summary.json"];
const roles = { idColumn: "pump_id", outcomes: ["failed_within_90d", "downtime_h"] } as const;
const roleArgs = ["--id", "pump_id", "--outcome", "failed_within_90d,downtime_h"];
// The header of public/demo/pump-fleet.csv without pump_id, district and family (text) and the two outcomes.
const demoFeatures = ["age_years", "flow_m3h", "head_m", "power_kw", "efficiency_pct", "vibration_mm_s", "bearing_temp_c", "starts_per_day", "runtime_h_per_day", "suction_pressure_kpa"];

/** The workbench's build parameters (selectCoverParams over the store's initial values) with a patch. */
const uiParams = (patch: Partial<CoverParams> & Pick<CoverParams, "radius">): CoverParams => {
  const { scale, metric, landmarks, seed, missing, weights } = initialParams;
  return { features: demoFeatures, scale, metric, landmarks, seed, missing, weights, ...patch };
};

interface Built {
  readonly run: Run;
  readonly dir: string;
}

async function build(name: string, args: readonly string[]): Promise<Built> {
  const dir = join(scratch, name);
  return { run: await runShoal(["build", demoPath, "--out", dir, ...args]), dir };
}

/** The written files equal the workbench's byte for byte, and summary.json is its summary plus timingsMs. */
function expectSameAsWorkbench(built: Built, params: CoverParams, context: { idColumn: string | null; outcomes: readonly string[] } = roles): void {
  expect(built.run.stderr).toBe("");
  expect(built.run.code).toBe(0);
  expect(readdirSync(built.dir).sort()).toEqual(outputNames);
  expect(readdirSync(dirname(built.dir)).filter((name) => name.startsWith(`${basename(built.dir)}.partial`))).toEqual([]);
  const { files } = uiExport(demoPath, params, context);
  for (const name of ["nodes.csv", "members.csv", "edges.csv"] as const) {
    const bytes = readFileSync(join(built.dir, name));
    expect(bytes.toString("utf8"), name).toBe(files[name]);
    expect(bytes.equals(Buffer.from(files[name], "utf8")), name).toBe(true);
  }
  const { timingsMs, ...summary } = JSON.parse(readFileSync(join(built.dir, "summary.json"), "utf8"));
  expect(summary).toEqual(JSON.parse(files["summary.json"]));
  expect(Object.keys(timingsMs).sort()).toEqual(["components", "edges", "landmarks", "loops", "members", "read", "scale", "total"]);
  for (const ms of Object.values(timingsMs)) expect(ms).toBeGreaterThanOrEqual(0);
}

describe("shoal build on the demo table writes what the workbench exports", () => {
  let plain: Built;
  let cosine: Built;
  let defaults: Built;
  let options: Built;
  beforeAll(async () => {
    [plain, cosine, defaults, options] = await Promise.all([
      build("plain", [...roleArgs, "--radius", "0.5"]),
      build("cosine", [...roleArgs, "--radius", "0.05", "--metric", "cosine", "--scale", "robust", "--landmarks", "maximin", "--seed", "3"]),
      build("defaults", roleArgs),
      build("options", [
        ...roleArgs,
        ...["--columns", "age_years,flow_m3h,vibration_mm_s,bearing_temp_c", "--missing", "median", "--weights", "flow_m3h=2,vibration_mm_s=0.5"],
        ...["--scale", "minmax", "--metric", "manhattan", "--landmarks", "random", "--seed", "7", "--radius", "0.3"],
      ]),
    ]);
  }, 60_000);

  it("--radius 0.5 with --id and --outcome: nodes.csv, members.csv, edges.csv byte for byte, summary.json plus timingsMs", () => {
    expectSameAsWorkbench(plain, uiParams({ radius: 0.5 }));
  });

  it("prints one line naming the output folder and writes nothing else to stdout", () => {
    expect(plain.run.stdout.split("\n")).toEqual([expect.stringMatching(new RegExp(`wrote ${plain.dir.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")}$`)), ""]);
  });

  it("names the component count as b0 once: 'N components (b0)', then 'b1 N', with no separate 'b0 N'", () => {
    expect(plain.run.stdout).toMatch(/^\d+ nodes, \d+ edges?, \d+ components? \(b0\), cycle rank \d+, b1 \d+ at radius 0\.5;/);
    expect(plain.run.stdout).not.toMatch(/b0 \d/);
  });

  it("without --columns the features are every numeric column but the id and the outcomes (the demo header less pump_id, district, family and the two outcomes)", () => {
    const summary = JSON.parse(readFileSync(join(plain.dir, "summary.json"), "utf8"));
    expect(summary.params.features).toEqual(demoFeatures);
    const table = parseCsvText(readFileSync(demoPath, "utf8"));
    const ui = defaultRoles(table, demoTable.roles);
    expect(summary.params.features).toEqual(table.columns.filter((c) => ui[c.name] === "feature").map((c) => c.name)); // the workbench's default roles for the demo
  });

  it("--metric cosine --scale robust --landmarks maximin --seed 3 --radius 0.05: same bytes and summary as the workbench", () => {
    expectSameAsWorkbench(cosine, uiParams({ radius: 0.05, metric: "cosine", scale: "robust", landmarks: "maximin", seed: 3 }));
  });

  it("without --radius the radius is defaultRadius of the same features, metric and scaling, and the files are the workbench's at that radius", () => {
    const table = parseCsvText(readFileSync(demoPath, "utf8"));
    const radius = defaultRadius(table, { features: demoFeatures, metric: "euclidean", scale: "zscore", missing: "drop", weights: {} });
    expect(radius).toBeGreaterThan(0);
    expect(JSON.parse(readFileSync(join(defaults.dir, "summary.json"), "utf8")).params.radius).toBe(radius);
    expectSameAsWorkbench(defaults, uiParams({ radius }));
  });

  it("--columns, --missing median, --weights, minmax, manhattan, random seed 7: same bytes and summary as the workbench with those settings", () => {
    const features = ["age_years", "flow_m3h", "vibration_mm_s", "bearing_temp_c"];
    expectSameAsWorkbench(options, uiParams({ features, missing: "median", weights: { flow_m3h: 2, vibration_mm_s: 0.5 }, scale: "minmax", metric: "manhattan", landmarks: "greedy-shuffled", seed: 7, radius: 0.3 }));
    const summary = JSON.parse(readFileSync(join(options.dir, "summary.json"), "utf8"));
    expect(summary.rows.dropped).toBe(0); // median filling keeps every row
    expect(Object.values(summary.rows.imputedValues).some((count) => (count as number) > 0)).toBe(true); // the demo has gaps in these columns
  });
});

describe.concurrent("shoal build errors: one line on stderr, exit code 2, nothing written", () => {
  /** Runs with --out pointing at a fresh path under the scratch folder and checks the common contract. */
  async function fails(name: string, args: (out: string) => readonly string[], message: string, options: { existingOut?: boolean } = {}): Promise<void> {
    const out = join(scratch, `error-${name}`);
    if (options.existingOut) mkdirSync(out);
    const run = await runShoal(["build", ...args(out)]);
    expect(run.stderr).toBe(`shoal: ${message}\n`);
    expect(run.code).toBe(2);
    expect(run.stdout).toBe("");
    if (options.existingOut) expect(readdirSync(out)).toEqual([]);
    else expect(existsSync(out)).toBe(false);
    expect(readdirSync(scratch).filter((entry) => entry.startsWith(`error-${name}.partial`))).toEqual([]);
  }

  it("an unreadable input: \"shoal: cannot read input file: <path>\"", async () => {
    const missing = join(scratch, "no-such-file.csv");
    await fails("unreadable", (out) => [missing, "--out", out], `cannot read input file: ${missing}`);
  });

  it("an unknown column in --columns: \"shoal: unknown column: nope\"", async () => {
    await fails("unknown-column", (out) => [demoPath, "--out", out, "--columns", "age_years,nope", "--radius", "0.5"], "unknown column: nope");
  });

  it("a text column in --columns: \"shoal: not a numeric column: district\"", async () => {
    await fails("text-column", (out) => [demoPath, "--out", out, "--columns", "age_years,district"], "not a numeric column: district");
  });

  it("an unknown name in --weights: \"shoal: unknown column in --weights: nope\" (it was once ignored)", async () => {
    await fails("weights-unknown", (out) => [demoPath, "--out", out, "--weights", "flow_m3h=2,nope=3", "--radius", "0.5"], "unknown column in --weights: nope");
  });

  it("--columns naming the --id column: \"shoal: --columns includes the --id column: pump_id\"", async () => {
    await fails("columns-id", (out) => [demoPath, "--out", out, "--id", "pump_id", "--columns", "age_years,pump_id", "--radius", "0.5"], "--columns includes the --id column: pump_id");
  });

  it("--radius 0: \"shoal: invalid radius: 0\"", async () => {
    await fails("radius-zero", (out) => [demoPath, "--out", out, "--radius", "0"], "invalid radius: 0");
  });

  it("--radius=-1: \"shoal: invalid radius: -1\"", async () => {
    await fails("radius-negative", (out) => [demoPath, "--out", out, "--radius=-1"], "invalid radius: -1");
  });

  // node's parseArgs alone would take the token "-1" for an option; strictArgs joins it to --radius
  it("--radius -1 as two tokens: \"shoal: invalid radius: -1\"", async () => {
    await fails("radius-negative-token", (out) => [demoPath, "--out", out, "--radius", "-1"], "invalid radius: -1");
  });

  it("--metric hamming: \"shoal: invalid metric: hamming\"", async () => {
    await fails("metric", (out) => [demoPath, "--out", out, "--metric", "hamming", "--radius", "0.5"], "invalid metric: hamming");
  });

  it("a ragged CSV gives parseCsvText's one-line message and leaves an existing --out folder empty", async () => {
    const ragged = join(scratch, "ragged.csv");
    const text = "a,b\n1,2\n3\n4,5,6\n";
    writeFileSync(ragged, text);
    expect(() => parseCsvText(text)).toThrow("ragged records: the header has 2 fields but row 2 has 1 fields, row 3 has 3 fields"); // the core parser's message, in process
    await fails("ragged", (out) => [ragged, "--out", out, "--radius", "1"], "ragged records: the header has 2 fields but row 2 has 1 fields, row 3 has 3 fields (lines 3, 4)", { existingOut: true });
  });
});

describe("shoal build replaces its own files in --out as a set", () => {
  it("a user's file survives, a stale Shoal file listed in .shoal-files is removed, and the new set is complete", async () => {
    const out = join(scratch, "reused");
    mkdirSync(out);
    writeFileSync(join(out, "notes.txt"), "mine");
    writeFileSync(join(out, "regions.csv"), "from an earlier run with other options");
    writeFileSync(join(out, ".shoal-files"), "nodes.csv\nregions.csv\n");
    const run = await runShoal(["build", demoPath, "--out", out, ...roleArgs, "--radius", "0.5"]);
    expect(run.code).toBe(0);
    expect(readdirSync(out).sort()).toEqual([...outputNames, "notes.txt"].sort());
    expect(readFileSync(join(out, "notes.txt"), "utf8")).toBe("mine");
    expect(readFileSync(join(out, ".shoal-files"), "utf8").split("\n").slice(1)).toEqual(["nodes.csv", "members.csv", "edges.csv", "summary.json", ""]);
  }, 30_000);
});
