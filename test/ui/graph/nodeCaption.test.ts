import { expect, it } from "vitest";
import { colourOfNode, nodeCaption } from "../../../src/ui/graph/nodeCaption.ts";

it("node 11 (0-based) with 34 rows, a mean of 0.41 and 3 neighbours reads \"node 12, 34 rows, node mean of pressure 0.41, 3 neighbours\"", () => {
  const colour = colourOfNode({ kind: "sequential", values: Float64Array.of(...Array(11).fill(0), 0.41), caption: "node mean of pressure" }, 11);
  expect(nodeCaption({ node: 11, rows: 34, colour, neighbours: 3 })).toBe("node 12, 34 rows, node mean of pressure 0.41, 3 neighbours");
});

it("one row and one neighbour are singular, and no colouring leaves the colour out", () => {
  expect(nodeCaption({ node: 0, rows: 1, colour: null, neighbours: 1 })).toBe("node 1, 1 row, 1 neighbour");
});

it("a categorical fill names the node's level, or \"missing\"", () => {
  const fill = { kind: "categorical", level: Int32Array.of(1, -1), levels: ["north", "south"], caption: "most common site in the node" } as const;
  expect(colourOfNode(fill, 0)).toEqual({ caption: "most common site in the node", value: "south" });
  expect(colourOfNode(fill, 1)).toEqual({ caption: "most common site in the node", value: "missing" });
});

it("a node without a value (NaN) shows the dash the panels use", () => {
  expect(colourOfNode({ kind: "sequential", values: Float64Array.of(NaN), caption: "node mean of x" }, 0)?.value).toBe("–");
});
