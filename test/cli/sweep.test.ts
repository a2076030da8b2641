// `shoal sweep` as a real process (node bin/shoal.mjs; two spawns, about half a second each, run
// concurrently), and its argument parsing and CSV in-process.
import { execFile } from "node:child_process";
import { existsSync, mkdtempSync, readFileSync, readdirSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { fileURLToPath } from "node:url";
import { afterAll, describe, expect, it } from "vitest";
import { parseCsvText } from "../../src/core/index.ts";
import { radiusSweep } from "../../src/core/sweep/radiusSweep.ts";
import { parseSweepArgs } from "../../src/cli/parseSweepArgs.ts";
import { runSweep, sweepColumns, sweepCsv } from "../../src/cli/runSweep.ts";

const root = fileURLToPath(new URL("../../", import.meta.url));
const demo = join(root, "public/demo/pump-fleet.csv");
const scratch = mkdtempSync(join(tmpdir(), "shoal-sweep-test-"));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

function shoal(args: readonly string[]): Promise<{ code: number; stdout: string; stderr: string }> {
  return new Promise((resolve, reject) => {
    execFile(process.execPath, [join(root, "bin/shoal.mjs"), ...args], { cwd: root, timeout: 30_000 }, (error, stdout, stderr) => {
      if (error && typeof error.code !== "number") reject(error);
      else resolve({ code: error ? Number(error.code) : 0, stdout, stderr });
    });
  });
}

const header = "radius,nodes,edges,components,b0,b1,cycle_rank,nodes_per_row,largest_node_share,largest_component_share,plateau,plateau_middle";
const demoArgs = ["--id", "pump_id", "--outcome", "failed_within_90d,downtime_h", "--radius-min", "0.3", "--radius-max", "3", "--steps", "4"];

describe("shoal sweep as a process", () => {
  it("writes the per-radius CSV to --out and exits 0; a bad argument exits 2 with one line on stderr and writes nothing", async () => {
    const good = join(scratch, "sweep.csv");
    const bad = join(scratch, "never.csv");
    const [ok, failed] = await Promise.all([shoal(["sweep", demo, "--out", good, ...demoArgs]), shoal(["sweep", demo, "--out", bad, "--steps", "1"])]);
    expect(ok.code).toBe(0);
    expect(ok.stderr).toBe("");
    expect(ok.stdout).toMatch(/^4 radii from 0\.3 to 3; .* wrote .*sweep\.csv\n$/);
    expect(ok.stdout).toMatch(/; (plateau middle [\d.]+ \(b0 \d+, b1 \d+\)|no plateau middle); /); // the screen's words for the widest plateau's middle
    expect(ok.stdout).not.toContain("suggested");
    const lines = readFileSync(good, "utf8").split("\n");
    expect(lines[0]).toBe(header);
    expect(lines.length).toBe(1 + 4 + 1); // header, 4 radii, the final newline
    expect(failed.code).toBe(2);
    expect(failed.stderr).toBe("shoal: invalid steps: 1\n");
    expect(failed.stdout).toBe("");
    expect(existsSync(bad)).toBe(false);
    expect(readdirSync(scratch).filter((name) => name.includes("partial"))).toEqual([]);
  });
});

describe("shoal sweep in-process", () => {
  it("without --out returns the CSV of radiusSweep over the same features: every numeric column but the id and outcomes", async () => {
    const command = parseSweepArgs([demo, ...demoArgs]);
    const text = await runSweep(command);
    const parsed = parseCsvText(readFileSync(demo, "utf8"));
    const features = parsed.columns.filter((c) => c.kind === "numeric" && !["pump_id", "failed_within_90d", "downtime_h"].includes(c.name)).map((c) => c.name);
    expect(text).toBe(sweepCsv(radiusSweep(parsed, { ...command.params, features }, { radiusMin: 0.3, radiusMax: 3, steps: 4 })));
    expect(text.split("\n")[0]!.split(",")).toEqual(sweepColumns);
  });

  it("parses the range options and the shared data options", () => {
    const c = parseSweepArgs(["data.csv", "--radius-min", "0.5", "--steps", "8", "--metric", "manhattan", "--landmarks", "maximin", "--seed", "3", "--weights", "a=2", "--columns", "a,b"]);
    expect(c).toMatchObject({ input: "data.csv", outFile: null, radiusMin: 0.5, radiusMax: null, steps: 8, columns: ["a", "b"], params: { metric: "manhattan", landmarks: "maximin", seed: 3, weights: { a: 2 }, scale: "zscore", missing: "drop" } });
  });

  it("rejects bad arguments with one lowercase message naming the value", () => {
    expect(() => parseSweepArgs([])).toThrow("expected one input file, got 0");
    expect(() => parseSweepArgs(["d.csv", "--radius-min", "-1"])).toThrow("invalid radius: -1");
    expect(() => parseSweepArgs(["d.csv", "--radius-max", "0"])).toThrow("invalid radius: 0");
    expect(() => parseSweepArgs(["d.csv", "--radius-min", "2", "--radius-max", "1"])).toThrow("invalid radius range: 2 to 1");
    expect(() => parseSweepArgs(["d.csv", "--steps", "2.5"])).toThrow("invalid steps: 2.5");
    expect(() => parseSweepArgs(["d.csv", "--metric", "hamming"])).toThrow("invalid metric: hamming");
    expect(() => parseSweepArgs(["d.csv", "--frobnicate"])).toThrow("unknown option: --frobnicate");
  });

  it("an unreadable input or an unknown column is one clear error", async () => {
    await expect(runSweep(parseSweepArgs([join(scratch, "missing.csv")]))).rejects.toThrow(`cannot read input file: ${join(scratch, "missing.csv")}`);
    await expect(runSweep(parseSweepArgs([demo, "--columns", "nope"]))).rejects.toThrow("unknown column: nope");
  });
});
