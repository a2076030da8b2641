import "./support/dom.ts";
import { render, screen } from "@testing-library/react";
import { expect, it } from "vitest";
import { workbenchStore } from "../../src/state/store.ts";
import { BuildSummary } from "../../src/ui/panels/BuildSummary.tsx";
import { loadSmallTable } from "./support/smallTable.ts";

it("after a build shows 3 nodes, 2 edges and 1 component, the counts of the result", async () => {
  render(<BuildSummary />);
  await loadSmallTable();
  const result = workbenchStore.getState().result!;
  expect(result.landmarks.length).toBe(3); // worked by hand in smallTable.ts
  expect(result.edges.source.length).toBe(2); // worked by hand in smallTable.ts
  expect(result.componentCount).toBe(1); // worked by hand in smallTable.ts
  expect(screen.getByTestId("node-count").textContent).toBe(String(result.landmarks.length));
  expect(screen.getByTestId("edge-count").textContent).toBe(String(result.edges.source.length));
  expect(screen.getByTestId("component-count").textContent).toBe(String(result.componentCount));
  expect(screen.getByText("7 of 8")).toBeTruthy(); // rows used: all but p5
});

it("row 5, which has no x, is named 1-based in the 'left out' note", async () => {
  render(<BuildSummary />);
  await loadSmallTable();
  expect(Array.from(workbenchStore.getState().result!.droppedRows)).toEqual([4]); // p5 is parsed-table row 4 (0-based)
  const note = screen.getByTestId("dropped-note").textContent;
  expect(note).toMatch(/left out for a missing feature value/);
  expect(note).toMatch(/\(rows 5\)/);
});

it("shows no counts and no 'left out' note before a build", () => {
  render(<BuildSummary />);
  expect(screen.queryByTestId("graph-counts")).toBeNull();
  expect(screen.queryByTestId("dropped-note")).toBeNull();
});
