// @vitest-environment jsdom
// jsdom for its strict XML parser (DOMParser with application/xml); the code under test is pure
import { describe, expect, it } from "vitest";
import { cieLightness } from "../../../src/core/picture/cieLightness.ts";
import { greyLevels } from "../../../src/core/picture/colourSchemes.ts";
import { greyscaleNote } from "../../../src/core/picture/legendSvg.ts";
import { pictureSvg } from "../../../src/core/picture/pictureSvg.ts";
import type { PictureInput } from "../../../src/core/picture/pictureTypes.ts";

const odd = `a<b&c"d`;

/** Three nodes in a row, two edges, a categorical colour column with an awkward name, one region: made by hand. */
const input: PictureInput = Object.freeze<PictureInput>({
  width: 800,
  height: 600,
  x: [0, 60, 120],
  y: [0, 10, 0],
  radius: [20, 10, 5],
  edges: { source: [0, 1], target: [1, 2], shared: [4, 1] },
  fill: { kind: "categorical", level: Int32Array.of(0, 1, -1), levels: [odd, "plain"], caption: `most common ${odd} in the node` },
  outlines: [{ name: `north & "east"`, nodes: [0, 1] }],
  greyscale: false,
  facts: { fileName: "pumps & <co>.csv", features: ["flow", odd], scale: "zscore", metric: "euclidean", radius: 0.417, landmarks: "greedy-file-order", seed: 1, nodeCount: 3, edgeCount: 2, colourBy: odd },
});

function parse(svg: string): Document {
  const document = new DOMParser().parseFromString(svg, "image/svg+xml");
  expect(document.getElementsByTagName("parsererror").length).toBe(0);
  return document;
}

const texts = (document: Document, selector: string): string[] => Array.from(document.querySelectorAll(selector), (t) => t.textContent ?? "");

describe("pictureSvg", () => {
  it("parses as XML with an svg root of the asked size", () => {
    const root = parse(pictureSvg(input)).documentElement;
    expect([root.tagName, root.getAttribute("width"), root.getAttribute("height"), root.getAttribute("viewBox")]).toEqual(["svg", "800", "600", "0 0 800 600"]);
  });

  it("draws one circle per node (3) and one line per edge (2)", () => {
    const document = parse(pictureSvg(input));
    expect(document.querySelectorAll("g.nodes circle").length).toBe(3);
    expect(document.querySelectorAll("g.edges line").length).toBe(2);
  });

  it("the caption is four real <text> lines naming file, features, scaling, metric, radius, landmarks, seed, counts and colour column; a<b&c\"d round-trips exactly", () => {
    expect(texts(parse(pictureSvg(input)), "g.caption text")).toEqual([
      "file: pumps & <co>.csv",
      `features (2): flow, ${odd}`,
      "scaling: zscore; metric: euclidean; radius: 0.417; landmarks: greedy-file-order, seed 1",
      `nodes: 3; edges: 2; colour: ${odd}`,
    ]);
  });

  it("the legend names the colour column, lists each level (a<b&c\"d exactly), the scheme, and the region by name", () => {
    const legend = texts(parse(pictureSvg(input)), "g.legend text");
    expect(legend[0]).toBe(`Colour: most common ${odd} in the`);
    expect(legend).toEqual(expect.arrayContaining([odd, "plain", "no level", `north & "east"`]));
    expect(legend.some((t) => t.startsWith("scheme: Okabe–Ito"))).toBe(true);
    expect(legend).not.toContain(greyscaleNote);
  });

  it("outlines the region with one path of two rings (one per node), its name kept exactly", () => {
    const path = parse(pictureSvg(input)).querySelector("path.region")!;
    expect(path.getAttribute("data-region")).toBe(`north & "east"`);
    expect(path.getAttribute("d")!.match(/M/g)!.length).toBe(2);
  });

  it("the same input gives the same bytes twice", () => {
    expect(pictureSvg(input)).toBe(pictureSvg(input));
  });

  it("greyscale: the legend says the lightness increases with value, levels become numbered greys of rising L*, numbers on the nodes", () => {
    const document = parse(pictureSvg({ ...input, greyscale: true }));
    const legend = texts(document, "g.legend text");
    expect(legend.some((t) => t.startsWith(greyscaleNote))).toBe(true);
    expect(legend).toEqual(expect.arrayContaining([`1  ${odd}`, "2  plain"]));
    const fills = Array.from(document.querySelectorAll("g.nodes circle"), (c) => c.getAttribute("fill"));
    expect(fills.slice(0, 2)).toEqual([greyLevels[0], greyLevels[1]]);
    expect(cieLightness(fills[1]!)).toBeGreaterThan(cieLightness(fills[0]!));
    expect(texts(document, "g.level-numbers text")).toEqual(["1", "2"]); // the third node has no level
  });

  it("a numeric fill draws a nine-stop gradient with the range's ends as labels, and greyscale adds the lightness note", () => {
    const numeric: PictureInput = { ...input, fill: { kind: "sequential", values: Float64Array.of(1, 2, NaN), caption: "node mean of flow" }, greyscale: true };
    const document = parse(pictureSvg(numeric));
    expect(document.querySelectorAll("linearGradient stop").length).toBe(9);
    const legend = texts(document, "g.legend text");
    expect(legend.slice(0, 3)).toEqual(["Colour: node mean of flow", "1", "2"]);
    expect(legend).toContain(greyscaleNote);
  });

  it("refuses a picture smaller than 480 × 320 or of fractional size", () => {
    expect(() => pictureSvg({ ...input, width: 479 })).toThrow("invalid picture size: 479x600 (at least 480x320 whole pixels)");
    expect(() => pictureSvg({ ...input, height: 600.5 })).toThrow("invalid picture size: 800x600.5");
  });
});
