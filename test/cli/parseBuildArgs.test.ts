import { mkdtemp, readdir } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import { parseBuildArgs } from "../../src/cli/parseBuildArgs.ts";

// In-process checks of the command line (no process spawn): every bad argument is one clear line.
describe("parseBuildArgs", () => {
  const base = ["data.csv", "--out", "dir"];
  it.each([
    [["--radius", "0x1"], "invalid radius: 0x1"], // hex is not a decimal number, as in the core's parseNumber
    [["--radius", "-2"], "invalid radius: -2"],
    [["--seed="], "invalid seed: "],
    [["--seed", "1.5"], "invalid seed: 1.5"],
    [["--weights", "flow_m3h="], "invalid weight: flow_m3h="],
    [["--weights", "flow_m3h=-1"], "invalid weight: flow_m3h=-1"],
    [["--bogus", "1"], "unknown option: --bogus"],
    [["--scale", "log"], "invalid scaling: log"],
    [["--landmarks", "kmeans"], "invalid landmark rule: kmeans"],
    [["--missing", "zero"], "invalid missing-value policy: zero"],
    [["--scale", "zscore", "--scale", "none"], "--scale given twice"],
    [["--seed=1", "--seed", "2"], "--seed given twice"],
    [["--region-nodes", "1", "--region-name"], "missing value for --region-name"],
  ])("%j is rejected with %j", (extra, message) => {
    expect(() => parseBuildArgs([...base, ...extra])).toThrow(new Error(message));
  });

  it("a negative number after a value option is that option's value, not an option: --seed -3 gives seed -3", () => {
    expect(parseBuildArgs([...base, "--seed", "-3"]).params.seed).toBe(-3);
  });

  it("weights parse to numbers by column: a=2,b=0.5", () => {
    expect(parseBuildArgs([...base, "--weights", "a=2,b=0.5"]).params.weights).toEqual({ a: 2, b: 0.5 });
  });
});

describe("runBuild", () => {
  it("a text column given as an outcome is refused: not a numeric column: district", async () => {
    const { runBuild } = await import("../../src/cli/runBuild.ts");
    const folder = await mkdtemp(join(tmpdir(), "shoal-outcome-"));
    const demo = new URL("../../public/demo/pump-fleet.csv", import.meta.url).pathname;
    const command = parseBuildArgs([demo, "--out", join(folder, "out"), "--outcome", "district", "--radius", "0.5"]);
    await expect(runBuild(command)).rejects.toThrow("not a numeric column: district");
    expect(await readdir(folder)).toEqual([]);
  });
});
