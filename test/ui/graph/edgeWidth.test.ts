import { expect, it } from "vitest";
import { edgeWidth, edgeWidths } from "../../../src/ui/graph/edgeWidth.ts";

it("an edge sharing a quarter of the most-shared count is 4 px wide: 8 · √0.25 (the JSDoc example; worked by hand)", () => {
  expect(edgeWidth(25, 100)).toBe(4);
});

it("the edge sharing the most rows gets the widest stroke, 8 px", () => {
  expect(edgeWidth(100, 100)).toBe(edgeWidths.max);
});

it("a width is rounded to the nearest half pixel: 8 · √(10 / 100) = 2.53 → 2.5 (worked by hand)", () => {
  expect(edgeWidth(10, 100)).toBe(2.5);
});

it("a thin edge is clamped up to 0.75 px: 8 · √(1 / 10,000) = 0.08 (worked by hand)", () => {
  expect(edgeWidth(1, 10_000)).toBe(edgeWidths.min);
});

it("width grows with shared rows (never shrinks) from 1 to 400 shared of 400", () => {
  let previous = 0;
  for (let shared = 1; shared <= 400; ++shared) {
    const width = edgeWidth(shared, 400);
    expect(width).toBeGreaterThanOrEqual(previous);
    previous = width;
  }
});

it("no shared rows, or a most-shared count of 0, gives the thinnest stroke", () => {
  expect([edgeWidth(0, 10), edgeWidth(3, 0)]).toEqual([edgeWidths.min, edgeWidths.min]);
});
