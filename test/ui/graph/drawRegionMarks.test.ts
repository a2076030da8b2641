import { schemeDark2 } from "d3-scale-chromatic";
import { describe, expect, it } from "vitest";
import { selectionRing } from "../../../src/ui/graph/drawGraph.ts";
import { drawRegionMarks, outlineStyle } from "../../../src/ui/graph/drawRegionMarks.ts";
import type { Layout, LayoutNode } from "../../../src/ui/graph/useForceLayout.ts";

interface Arc { readonly colour: string; readonly radius: number; readonly start: number; readonly end: number; readonly dash: readonly number[] }

/** A stand-in 2D context that records stroked arcs and line segments. */
function recordingContext() {
  const arcs: Arc[] = [];
  let pending: Omit<Arc, "colour" | "dash">[] = [];
  let segments = 0;
  let pendingSegments = 0;
  let dash: readonly number[] = [];
  const context = {
    strokeStyle: "", lineWidth: 1, fillStyle: "",
    beginPath() { pending = []; pendingSegments = 0; },
    moveTo() {}, lineTo() { pendingSegments++; }, closePath() {}, fill() {},
    setLineDash(d: number[]) { dash = [...d]; },
    arc(_x: number, _y: number, radius: number, start: number, end: number) { pending.push({ radius, start, end }); },
    stroke() { for (const a of pending) arcs.push({ ...a, colour: String(context.strokeStyle), dash }); segments += pendingSegments; },
  };
  return { context: context as unknown as CanvasRenderingContext2D, arcs, segments: () => segments };
}

const nodes: LayoutNode[] = [{ index: 0, radius: 10, x: 0, y: 0 }, { index: 1, radius: 5, x: 40, y: 0 }];
const layout: Layout = { nodes, links: [] };

describe("outlineStyle", () => {
  it("the first eight regions take the eight Dark2 colours with a solid line; the ninth repeats the first colour with a dash", () => {
    expect(Array.from({ length: 8 }, (_, k) => outlineStyle(k).colour)).toEqual([...schemeDark2]);
    expect(outlineStyle(0).dash).toEqual([]);
    expect(outlineStyle(8)).toEqual({ colour: schemeDark2[0], dash: [7, 3] }); // the second dash pattern, as set in drawRegionMarks.ts
  });
  it("no outline colour is the selection ring's ink or paper", () => {
    for (let k = 0; k < 8; ++k) expect([selectionRing.light, selectionRing.dark]).not.toContain(outlineStyle(k).colour);
  });
});

describe("drawRegionMarks", () => {
  it("a share of 0.25 draws a quarter arc from twelve o'clock (−π/2 to 0), and a share of 0 draws none", () => {
    const { context, arcs } = recordingContext();
    drawRegionMarks(context, layout, { k: 1, x: 0, y: 0 }, { share: { values: Float64Array.of(0.25, 0), style: 1 } });
    expect(arcs).toHaveLength(1);
    expect(arcs[0]).toMatchObject({ colour: outlineStyle(1).colour, start: -Math.PI / 2, end: 0 }); // −π/2 + 2π·0.25 = 0, worked by hand
  });
  it("two regions outline node 1 with two rings of their own colours, 8 and 11 px beyond its edge", () => {
    const { context, arcs } = recordingContext();
    drawRegionMarks(context, layout, { k: 1, x: 0, y: 0 }, { outlines: [{ style: 0, nodes: [1] }, { style: 1, nodes: [1] }] });
    expect(arcs.map((a) => [a.colour, a.radius])).toEqual([[outlineStyle(0).colour, 13], [outlineStyle(1).colour, 16]]); // 5 + 8 and 5 + 11: gaps 8 + 3·style px
  });
  it("the row looked for puts four ticks on each node holding it: 8 segments for two nodes", () => {
    const { context, segments } = recordingContext();
    drawRegionMarks(context, layout, { k: 1, x: 0, y: 0 }, { found: [0, 1] });
    expect(segments()).toBe(8);
  });
});
