import { describe, expect, it } from "vitest";
import { parseBuildArgs } from "../../src/cli/parseBuildArgs.ts";
import { parseExplainArgs } from "../../src/cli/parseExplainArgs.ts";
import { numberList } from "../../src/cli/regionArgs.ts";

// In-process checks of the region options (no process spawn): every bad argument is one clear line.
describe("numberList", () => {
  it("3, 4,7 reads as the numbers 3, 4, 7 (spaces allowed, order and repeats kept)", () => {
    expect(numberList("--nodes", "3, 4,7,3")).toEqual([3, 4, 7, 3]);
  });

  it.each(["0", "a", "1.5", "-2", "1,,2", "", "1e2"])("%j is rejected naming the flag", (text) => {
    expect(() => numberList("--nodes", text)).toThrow(/^invalid --nodes: .* \(expected numbers from 1, separated by commas\)$/);
  });
});

describe("parseBuildArgs: the region options", () => {
  const base = ["data.csv", "--out", "dir"];
  it("--region-nodes 3,4 without a name makes a region called region", () => {
    expect(parseBuildArgs([...base, "--region-nodes", "3,4"]).region).toEqual({ name: "region", choice: { by: "nodes", numbers: [3, 4] } });
  });

  it("--region-name names it; without --region-nodes there is no region", () => {
    expect(parseBuildArgs([...base, "--region-nodes", "1", "--region-name", "hot spot"]).region?.name).toBe("hot spot");
    expect(parseBuildArgs(base).region).toBeNull();
  });

  it.each([
    [["--region-name", "x"], "--region-name needs --region-nodes"],
    [["--region-nodes", "1", "--region-name", ""], "invalid --region-name: an empty name"],
    [["--region-nodes", "0"], "invalid --region-nodes: 0 (expected numbers from 1, separated by commas)"],
  ])("%j is rejected with %j", (extra, message) => {
    expect(() => parseBuildArgs([...base, ...extra])).toThrow(new Error(message));
  });
});

describe("parseExplainArgs", () => {
  it("--nodes and --versus-rows give the two sets; --out is optional (standard output)", () => {
    const command = parseExplainArgs(["data.csv", "--nodes", "3,4,7", "--versus-rows", "12,40"]);
    expect(command.region).toEqual({ by: "nodes", numbers: [3, 4, 7] });
    expect(command.versus).toEqual({ by: "rows", numbers: [12, 40] });
    expect(command.outFile).toBeNull();
  });

  it.each([
    [["data.csv"], "missing --nodes or --rows: the region to explain"],
    [["data.csv", "--nodes", "1", "--rows", "2"], "give --nodes or --rows, not both"],
    [["data.csv", "--nodes", "1", "--versus-nodes", "2", "--versus-rows", "3"], "give --versus-nodes or --versus-rows, not both"],
    [["data.csv", "--rows", "x"], "invalid --rows: x (expected numbers from 1, separated by commas)"],
    [["--nodes", "1"], "expected one input file, got 0"],
    [["data.csv", "--nodes", "1", "--out", ""], "invalid --out: an empty file name"],
    [["data.csv", "--nodes", "1", "--radius", "0"], "invalid radius: 0"],
  ])("%j is rejected with %j", (args, message) => {
    expect(() => parseExplainArgs(args)).toThrow(new Error(message));
  });
});
