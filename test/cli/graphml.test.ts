// `shoal build --graphml` as a real process (two spawns, about half a second each): graph.graphml
// beside the other files, equal to core's writer, and read back by graphology against nodes.csv and edges.csv.
import { mkdtempSync, readdirSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import Graph from "graphology";
import { parse } from "graphology-graphml";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { parseBuildArgs } from "../../src/cli/parseBuildArgs.ts";
import { graphml } from "../../src/core/index.ts";
import { initialParams } from "../../src/state/slices/paramsSlice.ts";
import { demoPath, runShoal, uiExport, type Run } from "./runShoal.ts";

const scratch = mkdtempSync(join(tmpdir(), "shoal-graphml-test-"));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

const roles = { idColumn: "pump_id", outcomes: ["failed_within_90d", "downtime_h"] } as const;
const roleArgs = ["--id", "pump_id", "--outcome", "failed_within_90d,downtime_h", "--radius", "0.5"];
// The header of public/demo/pump-fleet.csv without pump_id, district and family (text) and the two outcomes.
const demoFeatures = ["age_years", "flow_m3h", "head_m", "power_kw", "efficiency_pct", "vibration_mm_s", "bearing_temp_c", "starts_per_day", "runtime_h_per_day", "suction_pressure_kpa"];

describe("parseBuildArgs --graphml", () => {
  const base = ["data.csv", "--out", "dir"];
  it("--graphml sets graphml true; without it graphml is false", () => {
    expect(parseBuildArgs([...base, "--graphml"]).graphml).toBe(true);
    expect(parseBuildArgs(base).graphml).toBe(false);
  });

  it("--graphml given twice, or with a value, is one error naming it", () => {
    expect(() => parseBuildArgs([...base, "--graphml", "--graphml"])).toThrow(new Error("--graphml given twice"));
    expect(() => parseBuildArgs([...base, "--graphml=yes"])).toThrow(/--graphml/);
  });
});

describe("shoal build --graphml on the demo table", () => {
  const dir = join(scratch, "out");
  let withFile: Run;
  let without: Run;
  let written = "";
  let manifest = "";
  beforeAll(async () => {
    withFile = await runShoal(["build", demoPath, "--out", dir, ...roleArgs, "--graphml"]);
    written = readFileSync(join(dir, "graph.graphml"), "utf8");
    manifest = readFileSync(join(dir, ".shoal-files"), "utf8");
    without = await runShoal(["build", demoPath, "--out", dir, ...roleArgs]);
  }, 60_000);

  it("writes graph.graphml beside the four files and lists it in the manifest", () => {
    expect(withFile.stderr).toBe("");
    expect(withFile.code).toBe(0);
    expect(written.startsWith('<?xml version="1.0" encoding="UTF-8"?>')).toBe(true);
    expect(manifest.trimEnd().split("\n").filter((line) => !line.startsWith("#")).sort()).toEqual(["edges.csv", "graph.graphml", "members.csv", "nodes.csv", "summary.json"]);
  });

  const { scale, metric, landmarks, seed, missing, weights } = initialParams;
  const workbench = (): ReturnType<typeof uiExport> => uiExport(demoPath, { features: demoFeatures, scale, metric, landmarks, seed, missing, weights, radius: 0.5 }, roles);

  it("graph.graphml is core's graphml for the workbench's build of the same file and parameters, byte for byte", () => {
    const { parsed, result } = workbench();
    expect(written).toBe(graphml(parsed, result, { outcomes: roles.outcomes }));
  });

  it("graphology reads back as many nodes as nodes.csv has lines and as many edges as edges.csv, with nodes.csv's size per node", () => {
    const { result, files } = workbench();
    const graph = parse(Graph, written);
    const nodeLines = files["nodes.csv"].trimEnd().split("\n").slice(1);
    expect(graph.order).toBe(nodeLines.length); // nodes.csv
    expect(graph.size).toBe(files["edges.csv"].trimEnd().split("\n").length - 1); // edges.csv
    expect(graph.order).toBe(result.landmarks.length);
    for (const line of nodeLines) {
      const [node, landmarkRow, size] = line.split(",");
      expect(graph.getNodeAttribute(node!, "size")).toBe(Number(size)); // nodes.csv's size
      expect(graph.getNodeAttribute(node!, "landmark_row")).toBe(Number(landmarkRow)); // nodes.csv's landmark_row
    }
  });

  it("a later run without --graphml removes the graph.graphml of the earlier run (the manifest's set is replaced)", () => {
    expect(without.code).toBe(0);
    expect(readdirSync(dir).sort()).toEqual([".shoal-files", "edges.csv", "members.csv", "nodes.csv", "summary.json"]);
  });
});
