// `shoal draw` in-process (drawSvg, runDraw) and once as a real process (support: runShoal.ts, parseXml.ts).
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { parseDrawArgs } from "../../src/cli/parseDrawArgs.ts";
import { drawSvg, runDraw } from "../../src/cli/runDraw.ts";
import { parseXml } from "./parseXml.ts";
import { demoPath, runShoal } from "./runShoal.ts";

const scratch = mkdtempSync(join(tmpdir(), "shoal-draw-test-"));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));
const roleArgs = ["--id", "pump_id", "--outcome", "failed_within_90d,downtime_h"];

function parse(svg: string): Document {
  const document = parseXml(svg);
  expect(document.getElementsByTagName("parsererror").length).toBe(0);
  return document;
}

/** Width and height of a PNG from its IHDR chunk: big-endian at bytes 16–19 and 20–23 (PNG specification, ISO/IEC 15948, 11.2.2). */
function pngSize(bytes: Uint8Array): [number, number] {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  expect(Array.from(bytes.subarray(0, 8))).toEqual([137, 80, 78, 71, 13, 10, 26, 10]); // the PNG signature, ISO/IEC 15948, 5.2
  return [view.getUint32(16), view.getUint32(20)];
}

describe("shoal draw", () => {
  it("the same command gives the same SVG byte for byte (seeded layout, fixed decimals)", async () => {
    const command = parseDrawArgs([demoPath, ...roleArgs, "--colour-by", "efficiency_pct", "--out", join(scratch, "same.svg"), "--region-nodes", "1,2"]);
    const first = await drawSvg(command);
    const second = await drawSvg(command);
    expect(second.svg).toBe(first.svg);
    expect(first.svg.length).toBeGreaterThan(1000);
  });

  it("the demo's picture has one circle per node, the caption with the build's facts, and the region in the legend", async () => {
    const out = join(scratch, "demo.svg");
    const line = await runDraw(parseDrawArgs([demoPath, ...roleArgs, "--colour-by", "district", "--out", out, "--region-nodes", "1,2", "--region-name", "north"]));
    const document = parse(readFileSync(out, "utf8"));
    const nodes = Number(/^(\d+) nodes/.exec(line)![1]);
    expect(document.querySelectorAll("g.nodes circle").length).toBe(nodes);
    const caption = Array.from(document.querySelectorAll("g.caption text"), (t) => t.textContent);
    expect(caption[0]).toBe("file: pump-fleet.csv");
    expect(caption.join(" ")).toMatch(/scaling: zscore; metric: euclidean; radius: [\d.]+; landmarks: greedy-file-order, seed 1/);
    expect(caption.join(" ")).toContain(`nodes: ${nodes}; edges: `);
    expect(caption.at(-1)).toMatch(/colour: district$/);
    expect(Array.from(document.querySelectorAll("g.legend text"), (t) => t.textContent)).toContain("north");
  });

  it('a column named a<b&c"d round-trips exactly through the SVG (caption and legend)', async () => {
    const input = join(scratch, "odd.csv");
    writeFileSync(input, 'x,y,"a<b&c""d"\n0,0,1\n0,1,2\n0,2,3\n5,5,4\n5,6,5\n');
    const out = join(scratch, "odd.svg");
    await runDraw(parseDrawArgs([input, "--columns", "x,y", "--scale", "none", "--radius", "1.5", "--colour-by", 'a<b&c"d', "--out", out]));
    const document = parse(readFileSync(out, "utf8"));
    const caption = Array.from(document.querySelectorAll("g.caption text"), (t) => t.textContent);
    expect(caption.at(-1)).toBe('nodes: 3; edges: 1; colour: a<b&c"d'); // by hand: greedy balls of radius 1.5 in file order around records 1 {1, 2}, 3 {2, 3} and 4 {4, 5}; only the first two share a row
    expect(Array.from(document.querySelectorAll("g.legend text"), (t) => t.textContent)[0]).toBe('Colour: node mean of a<b&c"d');
  });

  it.each([[1], [2], [3]])("a 600x400 PNG at density %i is 600·d × 400·d pixels (read from the PNG header)", async (density) => {
    const out = join(scratch, `d${density}.png`);
    await runDraw(parseDrawArgs([demoPath, ...roleArgs, "--colour-by", "efficiency_pct", "--size", "600x400", "--density", String(density), "--out", out]));
    expect(pngSize(readFileSync(out))).toEqual([600 * density, 400 * density]);
  });

  it("runs as a real process: shoal draw writes the SVG and prints one line; a .jpg is an error with exit 2", async () => {
    const out = join(scratch, "process.svg");
    const run = await runShoal(["draw", demoPath, ...roleArgs, "--colour-by", "efficiency_pct", "--out", out, "--greyscale"]);
    expect(run).toMatchObject({ code: 0, stderr: "" });
    expect(run.stdout).toMatch(/^\d+ nodes, \d+ edges at radius [\d.]+; wrote .*process\.svg\n$/);
    expect(readFileSync(out, "utf8")).toContain("lightness increases with value");
    expect(await runShoal(["draw", demoPath, "--colour-by", "x", "--out", "g.jpg"])).toEqual({ code: 2, stdout: "", stderr: "shoal: invalid --out: g.jpg (expected a name ending in .svg or .png)\n" });
  });
});
