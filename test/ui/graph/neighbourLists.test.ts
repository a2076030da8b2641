import { expect, it } from "vitest";
import { neighbourLists, neighboursOf } from "../../../src/ui/graph/neighbourLists.ts";

it("the path 0–1–2 has neighbour lists [1], [0, 2], [1] (the JSDoc example; worked by hand)", () => {
  const lists = neighbourLists(3, [0, 1], [1, 2]);
  expect(Array.from(lists.neighbours)).toEqual([1, 0, 2, 1]);
  expect(Array.from(lists.offsets)).toEqual([0, 1, 3, 4]);
  expect(Array.from(neighboursOf(lists, 1))).toEqual([0, 2]);
});

it("each list is ascending whatever the edge order, and a node without edges has an empty list", () => {
  const lists = neighbourLists(5, [3, 0, 3, 2], [0, 1, 1, 3]);
  expect([0, 1, 2, 3, 4].map((k) => Array.from(neighboursOf(lists, k)))).toEqual([[1, 3], [0, 3], [3], [0, 1, 2], []]);
});

it("a self-loop is left out", () => {
  expect(Array.from(neighbourLists(2, [0, 0], [0, 1]).neighbours)).toEqual([1, 0]);
});
