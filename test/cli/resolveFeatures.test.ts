import { describe, expect, it } from "vitest";
import { resolveFeatures } from "../../src/cli/commonOptions.ts";
import { parseBuildArgs } from "../../src/cli/parseBuildArgs.ts";
import { parseCsvText } from "../../src/core/index.ts";

const table = parseCsvText("id,a,b,y,group\n1,0.5,2,0,u\n2,0.7,3,1,v\n3,0.1,5,0,u\n");
const options = (...args: string[]) => parseBuildArgs(["data.csv", "--out", "dir", ...args]);

describe("resolveFeatures: the command's roles must not overlap, and every weight must name a feature", () => {
  it("without --columns the features are the numeric columns but the id and outcomes: a, b", () => {
    expect(resolveFeatures(table, options("--id", "id", "--outcome", "y"))).toEqual(["a", "b"]);
  });

  it.each([
    [["--columns", "a,id", "--id", "id"], "--columns includes the --id column: id"],
    [["--columns", "a,y", "--outcome", "y"], "--columns includes an --outcome column: y"],
    [["--one-hot", "group", "--outcome", "group"], "--one-hot includes an --outcome column: group"],
    [["--weights", "nope=2"], "unknown column in --weights: nope"],
    [["--weights", "a=2,y=3", "--outcome", "y"], "--weights names a column that is not a feature: y"],
    [["--weights", "b=2", "--columns", "a"], "--weights names a column that is not a feature: b"],
  ])("%j is refused with %j", (args, message) => {
    expect(() => resolveFeatures(table, options(...args))).toThrow(new Error(message));
  });

  it("a weight on a one-hot column is allowed (group=2)", () => {
    expect(resolveFeatures(table, options("--id", "id", "--one-hot", "group", "--weights", "group=2,a=0.5"))).toEqual(["a", "b", "y"]);
  });
});
