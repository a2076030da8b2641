import { describe, expect, it } from "vitest";
import { assertClose } from "../../assertClose.ts";
import { captionLines } from "../../../src/core/picture/captionLines.ts";
import { columnFill } from "../../../src/core/picture/columnFill.ts";
import { fitFrame } from "../../../src/core/picture/fitFrame.ts";
import { wrapWords } from "../../../src/core/picture/legendSvg.ts";
import { nodeColorScale } from "../../../src/core/picture/nodeColorScale.ts";
import { nodeRadius } from "../../../src/core/picture/nodeRadius.ts";
import { labelNumber, svgNumber } from "../../../src/core/picture/svgNumber.ts";
import { parseCsvText } from "../../../src/core/index.ts";

const facts = { fileName: "a.csv", features: ["x"], scale: "zscore", metric: "euclidean", radius: 0.5, landmarks: "maximin", seed: 3, nodeCount: 2, edgeCount: 1, colourBy: null };

describe("svgNumber and labelNumber", () => {
  it("writes two decimals, −0.001 as 0.00, and refuses NaN", () => {
    expect([svgNumber(1), svgNumber(-2.345), svgNumber(-0.001)]).toEqual(["1.00", "-2.35", "0.00"]); // toFixed(2), ECMA-262
    expect(() => svgNumber(NaN)).toThrow("invalid coordinate: NaN");
  });

  it("labels four significant digits: 1234.5678 as 1235, 0.000123456 as 0.0001235", () => {
    expect([labelNumber(1234.5678), labelNumber(0.000123456), labelNumber(80.1)]).toEqual(["1235", "0.0001235", "80.1"]); // toPrecision(4), ECMA-262
  });
});

describe("fitFrame", () => {
  it("one body of radius 10 in a 100 × 100 box with margin 10 zooms to the 1.6 cap, centred at (50, 50) (worked by hand: 80/20 = 4 > 1.6)", () => {
    expect(fitFrame([0], [0], [10], { left: 0, top: 0, width: 100, height: 100, margin: 10 })).toEqual({ k: 1.6, x: 50, y: 50 });
  });

  it("two bodies 200 apart fit the width: k = (100 − 20) / 220, worked by hand", () => {
    const frame = fitFrame([0, 200], [0, 0], [10, 10], { left: 0, top: 0, width: 100, height: 100, margin: 10 });
    assertClose(frame, { k: 80 / 220, x: 50 - (80 / 220) * 100, y: 50 });
  });

  it("no bodies give scale 1 at the box's centre", () => {
    expect(fitFrame([], [], [], { left: 10, top: 0, width: 100, height: 50, margin: 5 })).toEqual({ k: 1, x: 60, y: 25 });
  });
});

describe("captionLines", () => {
  it("names file, features, scaling, metric, radius, landmark rule, seed, counts and colour column (the JSDoc example)", () => {
    expect(captionLines(facts, 80)).toEqual([
      "file: a.csv",
      "features (1): x",
      "scaling: zscore; metric: euclidean; radius: 0.5; landmarks: maximin, seed 3",
      "nodes: 2; edges: 1; colour: none",
    ]);
  });

  it("wraps a long feature list between items with two-space indents, and writes 12345 nodes as 12,345", () => {
    const lines = captionLines({ ...facts, features: ["alpha", "beta", "gamma", "delta"], nodeCount: 12345, colourBy: "x" }, 30);
    expect(lines.slice(1, 3)).toEqual(["features (4): alpha, beta,", "  gamma, delta"]);
    expect(lines.slice(-2)).toEqual(["nodes: 12,345; edges: 1;", "  colour: x"]);
  });
});

describe("small picture helpers", () => {
  it("wrapWords breaks at spaces, keeping a long word whole", () => {
    expect(wrapWords("one two three averyverylongword", 9)).toEqual(["one two", "three", "averyverylongword"]);
  });

  it("nodeRadius: 25 rows of a largest 100 give 13 px (26 · √0.25), one row never below 3 px", () => {
    expect(nodeRadius(25, 100)).toBe(13);
    expect(nodeRadius(1, 1_000_000)).toBe(3);
  });

  it("nodeColorScale spans the finite values [2, 4]; one value v gets [v − 0.5, v + 0.5]; no value gives null", () => {
    expect(nodeColorScale(Float64Array.of(2, NaN, 4))!.domain()).toEqual([2, 4]);
    expect(nodeColorScale(Float64Array.of(3))!.domain()).toEqual([2.5, 3.5]);
    expect(nodeColorScale(Float64Array.of(NaN))).toBeNull();
  });

  it("columnFill: a numeric column by node means, a categorical one by majority level; unknown columns throw", () => {
    const table = parseCsvText("v,kind\n1,a\n3,b\n5,b\n");
    const members = { offsets: Uint32Array.of(0, 2, 3), items: Uint32Array.of(0, 1, 2) };
    const numeric = columnFill(table, members, "v");
    expect(numeric.kind === "sequential" && Array.from(numeric.values)).toEqual([2, 5]); // (1 + 3)/2 and 5, by hand
    const categorical = columnFill(table, members, "kind");
    expect(categorical.kind === "categorical" && [Array.from(categorical.level), categorical.levels]).toEqual([[0, 1], ["a", "b"]]); // tie a/b goes to a, seen first
    expect(() => columnFill(table, members, "nope")).toThrow("unknown column: nope");
  });
});
