import { describe, expect, it } from "vitest";
import { componentNodes } from "../../../src/core/regions/componentNodes.ts";

// A small graph by hand: path 0 – 1 – 2 – 3, and a separate edge 4 – 5; node 6 alone.
const graph = Object.freeze({ component: Uint32Array.of(0, 0, 0, 0, 1, 1, 2) });

describe("componentNodes", () => {
  it("the JSDoc example: components 0, 0, 1, 0 from node 1 give nodes 0, 1, 3 (worked by hand)", () => {
    expect(componentNodes({ component: Uint32Array.of(0, 0, 1, 0) }, [1])).toEqual([0, 1, 3]);
  });
  it("node 2 lies in the component {0, 1, 2, 3} (worked by hand)", () => {
    expect(componentNodes(graph, [2])).toEqual([0, 1, 2, 3]);
  });
  it("nodes 5 and 6 give the union of their components {4, 5, 6} (worked by hand)", () => {
    expect(componentNodes(graph, [6, 5])).toEqual([4, 5, 6]);
  });
  it("no node gives no node", () => {
    expect(componentNodes(graph, [])).toEqual([]);
  });
});
