import { describe, expect, it } from "vitest";
import { parseDrawArgs } from "../../src/cli/parseDrawArgs.ts";

const base = ["data.csv", "--colour-by", "flow"];

describe("parseDrawArgs", () => {
  it("defaults: 1200x900, density 1, layout seed 1, not greyscale, the build's defaults, format from the extension", () => {
    const command = parseDrawArgs([...base, "--out", "graph.svg"]);
    expect(command).toMatchObject({ input: "data.csv", out: "graph.svg", format: "svg", colourBy: "flow", width: 1200, height: 900, density: 1, layoutSeed: 1, greyscale: false, radius: null, region: null });
    expect(command.params).toMatchObject({ scale: "zscore", metric: "euclidean", landmarks: "greedy-file-order", seed: 1 });
  });

  it("reads --size 640x480, --density 3, --layout-seed 9, --greyscale, --radius 0.5 and a region for a .PNG file", () => {
    const command = parseDrawArgs([...base, "--out", "g.PNG", "--size", "640x480", "--density", "3", "--layout-seed", "9", "--greyscale", "--radius", "0.5", "--region-nodes", "2,3", "--region-name", "north"]);
    expect(command).toMatchObject({ format: "png", width: 640, height: 480, density: 3, layoutSeed: 9, greyscale: true, radius: 0.5, region: { name: "north", choice: { by: "nodes", numbers: [2, 3] } } });
  });

  it.each([
    [["--out", "g.jpg"], "invalid --out: g.jpg (expected a name ending in .svg or .png)"],
    [["--out", "g"], "invalid --out: g (expected a name ending in .svg or .png)"],
    [[], "missing --out FILE.svg or FILE.png"],
    [["--out", "g.png", "--density", "4"], "invalid --density: 4 (expected 1, 2 or 3)"],
    [["--out", "g.svg", "--density", "2"], "--density applies to a .png picture only"],
    [["--out", "g.svg", "--size", "12x"], "invalid --size: 12x (expected WxH in whole pixels, such as 1200x900)"],
    [["--out", "g.svg", "--layout-seed", "1.5"], "invalid --layout-seed: 1.5"],
    [["--out", "g.svg", "--greyscale", "--greyscale"], "--greyscale given twice"],
    [["--out", "g.svg", "--radius", "-1"], "invalid radius: -1"],
    [["--out", "g.svg", "--region-name", "x"], "--region-name needs --region-nodes"],
  ])("%j is an error: %s", (extra, message) => {
    expect(() => parseDrawArgs([...base, ...extra])).toThrow(message);
  });

  it("--colour-by is required", () => {
    expect(() => parseDrawArgs(["data.csv", "--out", "g.svg"])).toThrow("missing --colour-by COLUMN");
  });
});
