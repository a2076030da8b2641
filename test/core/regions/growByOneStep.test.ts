import { describe, expect, it } from "vitest";
import { growByOneStep } from "../../../src/core/regions/growByOneStep.ts";

// A small graph by hand: path 0 – 1 – 2 – 3, and a separate edge 4 – 5; node 6 alone.
const graph = Object.freeze({
  edges: { source: Uint32Array.of(0, 1, 2, 4), target: Uint32Array.of(1, 2, 3, 5), shared: Uint32Array.of(1, 1, 1, 1) },
  component: Uint32Array.of(0, 0, 0, 0, 1, 1, 2),
});

describe("growByOneStep", () => {
  it("the JSDoc example: on the path 0 – 1 – 2, node 0 grows to {0, 1} (worked by hand)", () => {
    const path = { edges: { source: Uint32Array.of(0, 1), target: Uint32Array.of(1, 2), shared: Uint32Array.of(1, 1) }, component: Uint32Array.of(0, 0, 0) };
    expect(growByOneStep(path, [0])).toEqual([0, 1]);
  });
  it("node 1 grows to {0, 1, 2}, one edge each way (worked by hand)", () => {
    expect(growByOneStep(graph, [1])).toEqual([0, 1, 2]);
  });
  it("{0, 4} grows to {0, 1, 4, 5}; twice from 0 reaches {0, 1, 2} (worked by hand)", () => {
    expect(growByOneStep(graph, [0, 4])).toEqual([0, 1, 4, 5]);
    expect(growByOneStep(graph, growByOneStep(graph, [0]))).toEqual([0, 1, 2]);
  });
  it("an isolated node 6 stays {6}", () => {
    expect(growByOneStep(graph, [6])).toEqual([6]);
  });
});
