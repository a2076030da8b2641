// `shoal build --region-nodes` and `shoal explain`, run as real processes (support: runShoal.ts).
// Eight spawns, about half a second each; the error cases run concurrently.
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { nodeRows, parseCsvText, regionSides, regionTable, regionTableCsv } from "../../src/core/index.ts";
import { explainUsage } from "../../src/cli/parseExplainArgs.ts";
import { initialParams } from "../../src/state/slices/paramsSlice.ts";
import { assertClose } from "../assertClose.ts";
import { demoPath, runShoal, uiExport, type Run } from "./runShoal.ts";

// The header of public/demo/pump-fleet.csv without pump_id, district and family (text) and the two outcomes.
const demoFeatures = ["age_years", "flow_m3h", "head_m", "power_kw", "efficiency_pct", "vibration_mm_s", "bearing_temp_c", "starts_per_day", "runtime_h_per_day", "suction_pressure_kpa"];

const scratch = mkdtempSync(join(tmpdir(), "shoal-regions-test-"));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

// Invented: a blank line after the header and one between records, a quoted line break, ids with
// leading zeros, a 20-digit code, -5, a cell that would run as a formula. With --columns x,
// --scale none and --radius 0.5 the greedy net gives nodes 1 {records 1, 2}, 2 {3, 4}, 3 {5}.
const smallCsv = 'id,code,x,y,note,g\n\n007,12345678901234567890,0,1,=1+1,a\n008,-5,0.1,2,"two\nlines",a\n\n009,+3,5,3,plain,b\n010,0042,5.1,4,x,b\n011,7,10,5,y,a\n';
const smallPath = join(scratch, "small.csv");
writeFileSync(smallPath, smallCsv);
const smallArgs = ["--id", "id", "--columns", "x", "--scale", "none", "--radius", "0.5"];

// The table of test/core/regions/regionTable.test.ts, whose region table is worked by hand there.
const handPath = join(scratch, "hand.csv");
writeFileSync(handPath, "id,x,y,z,g,name\n1,1,10,1,a,p\n2,2,10,NA,a,q\n3,3,10,3,b,r\n4,2,10,5,b,s\n5,4,10,7,b,t\n6,100,10,9,b,u\n");

/** CSV lines without the final empty one. */
const linesOf = (text: string): string[] => text.split("\n").slice(0, -1);

describe("shoal build --region-nodes writes region-rows.csv and lists the region in summary.json", () => {
  const dir = join(scratch, "small-out");
  let first: Run;
  let regionRows: string;
  let members: string;
  let summary: { regions: unknown; rows: { read: number } };
  let second: Run;
  beforeAll(async () => {
    first = await runShoal(["build", smallPath, "--out", dir, ...smallArgs, "--region-nodes", "1,3", "--region-name", "ends"]);
    regionRows = readFileSync(join(dir, "region-rows.csv"), "utf8");
    members = readFileSync(join(dir, "members.csv"), "utf8");
    summary = JSON.parse(readFileSync(join(dir, "summary.json"), "utf8"));
    second = await runShoal(["build", smallPath, "--out", dir, ...smallArgs]);
  }, 30_000);

  it("exits 0 and names the region and its row count", () => {
    expect(first.stderr).toBe("");
    expect(first.code).toBe(0);
    expect(first.stdout).toContain("; region ends: 3 rows; wrote ");
  });

  it("the region's rows are the union of the members of nodes 1 and 3 in members.csv", () => {
    const wanted = new Set(["1", "3"]);
    const fromMembers = [...new Set(linesOf(members).slice(1).map((line) => line.split(",")).filter(([node]) => wanted.has(node!)).map(([, row]) => Number(row)))].sort((a, b) => a - b);
    const fromRegion = Array.from(parseCsvText(regionRows).columns.find((c) => c.name === "row")!.numbers); // a CSV reader: a quoted field holds a line break
    expect(fromMembers).toEqual([1, 2, 5]); // worked by hand: see the comment on smallCsv
    expect(fromRegion).toEqual(fromMembers);
  });

  it("keeps 007, the 20-digit code and -5 exactly as read, neutralises =1+1, and quotes the line break (the whole file, by hand)", () => {
    expect(regionRows).toBe(
      "region,row,id,code,x,y,note,g\n" +
        "ends,1,007,12345678901234567890,0,1,'=1+1,a\n" +
        'ends,2,008,-5,0.1,2,"two\nlines",a\n' +
        "ends,5,011,7,10,5,y,a\n",
    );
  });

  it("summary.json lists the region by name with its row count and record numbers", () => {
    expect(summary.regions).toEqual([{ name: "ends", rowCount: 3, records: [1, 2, 5] }]);
    expect(summary.rows.read).toBe(5);
  });

  it("a later run without --region-nodes removes the stale region-rows.csv and lists no region", () => {
    expect(second.code).toBe(0);
    expect(existsSync(join(dir, "region-rows.csv"))).toBe(false);
    expect(JSON.parse(readFileSync(join(dir, "summary.json"), "utf8")).regions).toEqual([]);
  });
});

describe("shoal explain", () => {
  let hand: Run;
  let demo: Run;
  const demoOut = join(scratch, "demo-explain.csv");
  const roleArgs = ["--id", "pump_id", "--outcome", "failed_within_90d,downtime_h"];
  beforeAll(async () => {
    [hand, demo] = await Promise.all([
      runShoal(["explain", handPath, "--id", "id", "--columns", "x", "--scale", "none", "--radius", "1", "--rows", "1,2,3", "--versus-rows", "4,5"]),
      runShoal(["explain", demoPath, ...roleArgs, "--radius", "0.5", "--nodes", "3,4,7", "--out", demoOut]),
    ]);
  }, 30_000);

  it("records 1–3 against 4–5 of the hand-worked table give its figures, one line per column, on standard output", () => {
    expect(hand.code).toBe(0);
    const lines = linesOf(hand.stdout).map((line) => line.split(","));
    expect(lines[0]!.join(",")).toBe("column,kind,test,n_inside,n_outside,mean_inside,mean_outside,median_inside,median_outside,d,statistic,p,p_adj");
    expect(lines.slice(1).map((cells) => cells.slice(0, 5))).toEqual([
      ["z", "numeric", "ks", "2", "2"],
      ["x", "numeric", "ks", "3", "2"],
      ["y", "numeric", "ks", "3", "2"],
      ["g", "categorical", "chi2", "3", "2"],
    ]); // worked by hand: the missing z is left out; record 6 is in neither set; name is identifier-like
    const [z, x, y, g] = lines.slice(1).map((cells) => cells.slice(5).map((cell) => (cell === "" ? NaN : Number(cell))));
    assertClose(z, [2, 6, 2, 6, -2 * Math.SQRT2, 1, 1 / 3, 2 / 3]); // worked by hand (regionTable.test.ts)
    assertClose(x, [2, 3, 2, 3, -Math.sqrt(3) / 2, 0.5, 0.9, 1]); // worked by hand (compareNumeric.test.ts)
    assertClose(y, [10, 10, 10, 10, NaN, 0, 1, 1], { absolute: 0 }); // worked by hand: equal samples
    assertClose(g!.slice(0, 6), [NaN, NaN, NaN, NaN, NaN, 20 / 9]); // worked by hand: figures that do not apply are empty
    expect(hand.stderr).toBe("shoal: 3 rows inside, 2 in the second set; 0 rows left out of the build; chi-squared with an expected count below 5: g; not tested: name (identifier)\n"); // g: expected 1.2, 1.8 / 0.8, 1.2
  });

  it("nodes 3, 4, 7 of the demo: the file is the core's region table for the union of those nodes' members, byte for byte", () => {
    expect(demo.stderr).toBe("");
    expect(demo.code).toBe(0);
    const { scale, metric, landmarks, seed, missing, weights } = initialParams;
    const { parsed, result } = uiExport(demoPath, { features: demoFeatures, scale, metric, landmarks, seed, missing, weights, radius: 0.5 }, { idColumn: "pump_id", outcomes: [] });
    const region = nodeRows(result.members, [2, 3, 6]); // nodes 3, 4, 7, 0-based inside
    const expected = regionTableCsv(regionTable(parsed, regionSides(result.rowsRead, result.usedRows, region), { labelColumn: "pump_id" }));
    expect(readFileSync(demoOut, "utf8")).toBe(expected);
    expect(linesOf(expected).length).toBe(1 + 14); // the header and every column of the demo but pump_id
    expect(demo.stdout).toMatch(/^14 columns compared; \d+ rows inside, \d+ outside; 51 rows left out of the build; wrote /);
  });
});

describe.concurrent("region errors: one line on stderr, exit code 2, nothing written", () => {
  async function fails(args: readonly string[], message: string): Promise<void> {
    const run = await runShoal(args);
    expect(run).toEqual({ code: 2, stdout: "", stderr: `shoal: ${message}\n` });
  }

  it("build --region-nodes 2,9 on a graph of 3 nodes: \"node out of range: 9 (the graph has nodes 1 to 3)\"; nothing in --out", async () => {
    const out = join(scratch, "error-node");
    await fails(["build", smallPath, "--out", out, ...smallArgs, "--region-nodes", "2,9"], "node out of range: 9 (the graph has nodes 1 to 3)");
    expect(existsSync(out)).toBe(false);
  });

  it("shoal help explain prints the explain usage on stdout and exits 0", async () => {
    expect(await runShoal(["help", "explain"])).toEqual({ code: 0, stdout: `${explainUsage}\n`, stderr: "" });
  });

  it("explain --nodes 4 on a graph of 3 nodes: \"node out of range: 4 (the graph has nodes 1 to 3)\"", async () => {
    await fails(["explain", smallPath, ...smallArgs, "--nodes", "4"], "node out of range: 4 (the graph has nodes 1 to 3)");
  });

  it("explain --rows 1,6 on a file of 5 records: \"record out of range: 6 (the file has records 1 to 5)\"", async () => {
    await fails(["explain", smallPath, ...smallArgs, "--rows", "1,6"], "record out of range: 6 (the file has records 1 to 5)");
  });

  it("explain --nodes 1 --versus-nodes 1: \"both sides are empty after leaving out the 2 rows in both sets\" (node 1 = records 1, 2)", async () => {
    await fails(["explain", smallPath, ...smallArgs, "--nodes", "1", "--versus-nodes", "1"], "both sides are empty after leaving out the 2 rows in both sets");
  });

  it("explain --rows 1 --versus-rows 5 with --out says '1 row inside, 1 in the second set' in the singular", async () => {
    const run = await runShoal(["explain", smallPath, ...smallArgs, "--rows", "1", "--versus-rows", "5", "--out", join(scratch, "one.csv")]);
    expect(run.stdout).toContain("; 1 row inside, 1 in the second set; 0 rows left out of the build;");
  });

  it("explain --versus-rows 0: \"invalid --versus-rows: 0 (expected numbers from 1, separated by commas)\"", async () => {
    await fails(["explain", smallPath, ...smallArgs, "--nodes", "1", "--versus-rows", "0"], "invalid --versus-rows: 0 (expected numbers from 1, separated by commas)");
  });
});
