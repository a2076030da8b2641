// Help, version and usage text, run as real processes (about half a second each, run concurrently).
import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { buildUsage } from "../../src/cli/parseBuildArgs.ts";
import { sweepUsage } from "../../src/cli/parseSweepArgs.ts";
import { explainUsage } from "../../src/cli/parseExplainArgs.ts";
import { hotspotsUsage } from "../../src/cli/parseHotspotArgs.ts";
import { topUsage } from "../../src/cli/main.ts";
import { repoRoot, runShoal } from "./runShoal.ts";

const packageVersion = (JSON.parse(readFileSync(`${repoRoot}package.json`, "utf8")) as { version: string }).version;

describe.concurrent("shoal help and version", () => {
  it("shoal build --help prints the build usage on stdout and exits 0", async () => {
    expect(await runShoal(["build", "--help"])).toEqual({ code: 0, stdout: `${buildUsage}\n`, stderr: "" });
  });

  it("shoal sweep --help and sweep -h print the sweep usage and exit 0, even after other options", async () => {
    expect(await runShoal(["sweep", "--help"])).toEqual({ code: 0, stdout: `${sweepUsage}\n`, stderr: "" });
    expect(await runShoal(["sweep", "data.csv", "--steps", "4", "-h"])).toEqual({ code: 0, stdout: `${sweepUsage}\n`, stderr: "" });
  });

  it("shoal help build prints the build usage; shoal help nope is an error with exit 2", async () => {
    expect(await runShoal(["help", "build"])).toEqual({ code: 0, stdout: `${buildUsage}\n`, stderr: "" });
    expect(await runShoal(["help", "nope"])).toEqual({ code: 2, stdout: "", stderr: "shoal: unknown command: nope\n" });
  });

  it("shoal --version prints shoal and the package.json version and exits 0", async () => {
    expect(await runShoal(["--version"])).toEqual({ code: 0, stdout: `shoal ${packageVersion}\n`, stderr: "" });
  });

  it("shoal --version --x is an error with exit 2: \"unexpected argument: --x\"", async () => {
    expect(await runShoal(["--version", "--x"])).toEqual({ code: 2, stdout: "", stderr: "shoal: unexpected argument: --x\n" });
  });

  it("shoal with no arguments prints the short command list on stderr, nothing on stdout, and exits 2", async () => {
    expect(await runShoal([])).toEqual({ code: 2, stdout: "", stderr: `${topUsage}\n` });
    expect(topUsage.split("\n").length).toBe(7); // build, sweep, explain, hotspots, draw, help, --version
  });
});

describe("usage text", () => {
  it("says DATA, not DATA.csv, and names the formats read (CSV, TSV, Parquet)", () => {
    for (const usage of [buildUsage, sweepUsage, explainUsage, hotspotsUsage]) {
      expect(usage).not.toContain("DATA.csv");
      expect(usage).toContain("a delimited text file (CSV, TSV, ; or | separated) or a Parquet file");
    }
  });

  it("names the landmark rules and delimiters as the workbench and summary.json do", () => {
    expect(buildUsage).toContain("greedy-file-order | greedy-shuffled (seeded order) | maximin");
    expect(buildUsage).toContain("comma | semicolon | tab | pipe");
    expect(buildUsage).toContain("reject | pad");
  });
});
