// `shoal hotspots`, run as real processes (support: runShoal.ts): the shipped demo, a small table
// with a numeric row label, help and bad input. Six spawns, about half a second each.
import { mkdtempSync, readFileSync, readdirSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { parseCsvText } from "../../src/core/index.ts";
import { hotspotsHeader } from "../../src/cli/hotspotFiles.ts";
import { hotspotsUsage } from "../../src/cli/parseHotspotArgs.ts";
import { demoPath, runShoal, type Run } from "./runShoal.ts";

const scratch = mkdtempSync(join(tmpdir(), "shoal-hotspots-test-"));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));
const linesOf = (text: string): string[] => text.split("\n").slice(0, -1);

describe("shoal hotspots on the demo finds the failure flare as the top hotspot for failed_within_90d", () => {
  const dir = join(scratch, "demo");
  let run: Run;
  let hotspots: string[][];
  let json: Record<string, unknown> & { rows: { scanned: number; missingOutcome: number }; timingsMs: Record<string, number> };
  let hotspotRows: string[][];
  let members: string[][];
  let nodeRates: { node: number; rate: number }[];
  beforeAll(async () => {
    run = await runShoal(["hotspots", demoPath, "--id", "pump_id", "--outcome", "failed_within_90d,downtime_h", "--scan", "failed_within_90d", "--out", dir]);
    hotspots = linesOf(readFileSync(join(dir, "hotspots.csv"), "utf8")).map((line) => line.split(","));
    json = JSON.parse(readFileSync(join(dir, "hotspots.json"), "utf8"));
    hotspotRows = linesOf(readFileSync(join(dir, "hotspot-rows.csv"), "utf8")).map((line) => line.split(","));
    members = linesOf(readFileSync(join(dir, "members.csv"), "utf8")).map((line) => line.split(","));
    const nodes = parseCsvText(readFileSync(join(dir, "nodes.csv"), "utf8"));
    const rate = nodes.columns.find((c) => c.name === "mean_failed_within_90d")!.numbers;
    nodeRates = Array.from(rate, (value, k) => ({ node: k + 1, rate: value })).sort((a, b) => b.rate - a.rate);
  }, 30_000);

  it("exits 0 and writes the build's four files and the three hotspot files", () => {
    expect(run.stderr).toBe("");
    expect(run.code).toBe(0);
    expect(readdirSync(dir).sort()).toEqual([".shoal-files", "edges.csv", "hotspot-rows.csv", "hotspots.csv", "hotspots.json", "members.csv", "nodes.csv", "summary.json"]);
  });

  it("the top hotspot holds the five nodes with the highest failure rates in nodes.csv (9, 37, 61, 15, 35), with p = 1/1000", () => {
    expect(hotspots[0]).toEqual([...hotspotsHeader]);
    const top = hotspots[1]!;
    expect(top[0]).toBe("1");
    const nodes = top[1]!.split(" ").map(Number);
    const flare = nodeRates.slice(0, 5).map((line) => line.node);
    expect(flare).toEqual([9, 37, 61, 15, 35]); // read from this run's nodes.csv (mean_failed_within_90d 0.718, 0.692, 0.457, 0.407, 0.356)
    for (const node of flare) expect(nodes).toContain(node);
    expect(Number(top[10])).toBe(1 / 1000); // worked by hand: no replicate of 999 reaches it, (1 + 0)/(1 + 999)
    expect(Number(top[4])).toBeGreaterThan(Number(top[5])); // the rate inside is above the rate outside
    expect(top[11]).toBe(""); // no --stability-seeds
    expect(top[12]).toBe("flexible");
  });

  it("hotspot-rows.csv lists the top hotspot's n_inside rows, each a member of one of its nodes, with its pump_id", () => {
    expect(hotspotRows[0]).toEqual(["rank", "row", "pump_id"]);
    const top = hotspots[1]!;
    const rows = hotspotRows.slice(1).filter((line) => line[0] === "1");
    expect(rows.length).toBe(Number(top[2]));
    const nodes = new Set(top[1]!.split(" "));
    const held = new Set(members.slice(1).filter((line) => nodes.has(line[0]!)).map((line) => line[1]));
    for (const line of rows) expect(held.has(line[1])).toBe(true);
    expect(rows[0]![2]).toMatch(/^P-\d+$/); // the demo's pump ids
  });

  it("hotspots.json records the parameters, the score chosen from 0/1 values, the candidate count, rows left out and timings", () => {
    expect(json).toMatchObject({ scan: "failed_within_90d", score: "bernoulli", direction: "high", maxNodes: 8, replicates: 999, scanSeed: 1, stabilitySeeds: 0, search: "flexible" });
    expect(json.candidateSets).toBeGreaterThan(0);
    expect(json.rows).toEqual({ scanned: 2349, missingOutcome: 0 }); // the demo's row count (nodes.csv/summary.json), no outcome missing
    expect(json.timingsMs.scan).toBeGreaterThan(0);
    console.log(`demo: ${run.stdout.trim()}`);
  });
});

describe("shoal hotspots on a small table keeps a numeric row label as written and counts missing outcomes", () => {
  const path = join(scratch, "small.csv");
  // Invented: ids with leading zeros, x on a line, y = 1 on the first four rows, one y missing.
  writeFileSync(path, "id,x,y\n001,0,1\n002,0.1,1\n003,0.2,1\n004,0.3,1\n005,5,0\n006,5.1,0\n007,5.2,NA\n008,10,0\n009,10.1,0\n010,10.2,0\n011,15,0\n012,15.1,0\n");
  const dir = join(scratch, "small");
  let run: Run;
  beforeAll(async () => {
    run = await runShoal(["hotspots", path, "--id", "id", "--columns", "x", "--scale", "none", "--radius", "0.5", "--scan", "y", "--replicates", "19", "--out", dir]);
  }, 30_000);

  it("finds node 1 (records 1–4, all ones) with p = 1/20 and writes its ids as 001 … 004", () => {
    expect(run.stderr).toBe("");
    const hotspots = linesOf(readFileSync(join(dir, "hotspots.csv"), "utf8")).map((line) => line.split(","));
    expect(hotspots[1]!.slice(0, 4)).toEqual(["1", "1", "4", "7"]); // worked by hand: node 1 holds records 1–4; 11 rows scanned
    expect(Number(hotspots[1]![10])).toBe(1 / 20); // worked by hand: (1 + 0)/(1 + 19), no permutation puts all four ones in one node
    const rows = parseCsvText(readFileSync(join(dir, "hotspot-rows.csv"), "utf8"));
    expect(rows.columns.find((c) => c.name === "row")!.numbers).toEqual(Float64Array.of(1, 2, 3, 4));
    expect(linesOf(readFileSync(join(dir, "hotspot-rows.csv"), "utf8")).slice(1).map((line) => line.split(",")[2])).toEqual(["001", "002", "003", "004"]);
    expect(JSON.parse(readFileSync(join(dir, "hotspots.json"), "utf8")).rows).toEqual({ scanned: 11, missingOutcome: 1 }); // worked by hand: record 7 has NA
  });
});

describe.concurrent("shoal hotspots help and bad input", () => {
  it("shoal hotspots --help prints the usage and exits 0", async () => {
    expect(await runShoal(["hotspots", "--help"])).toEqual({ code: 0, stdout: `${hotspotsUsage}\n`, stderr: "" });
  });

  it("a missing --scan, a bad --direction and an unknown column are one line each with exit 2", async () => {
    const out = join(scratch, "bad");
    expect(await runShoal(["hotspots", demoPath, "--out", out])).toEqual({ code: 2, stdout: "", stderr: "shoal: missing --scan COLUMN: the outcome to search\n" });
    expect(await runShoal(["hotspots", demoPath, "--out", out, "--scan", "failed_within_90d", "--direction", "up"])).toEqual({ code: 2, stdout: "", stderr: "shoal: invalid --direction: up (high, low or both)\n" });
    expect(await runShoal(["hotspots", demoPath, "--out", out, "--scan", "nope"])).toEqual({ code: 2, stdout: "", stderr: "shoal: unknown column: nope\n" });
    expect(await runShoal(["hotspots", demoPath, "--out", out, "--scan", "failed_within_90d", "--max-nodes", "16"])).toEqual({ code: 2, stdout: "", stderr: "shoal: invalid --max-nodes: 16\n" });
  });
});
