import "./support/dom.ts";
import { act, render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { expect, it } from "vitest";
import { actions } from "../../src/state/actions.ts";
import { workbenchStore } from "../../src/state/store.ts";
import { maxDrawnNodes } from "../../src/ui/graph/drawLimits.ts";
import { ForceGraph } from "../../src/ui/graph/ForceGraph.tsx";
import { NodeList } from "../../src/ui/panels/NodeList.tsx";

it("a graph with more nodes than can be laid out shows a summary instead of the canvas, and nodes open by number", async () => {
  const rows = maxDrawnNodes + 10;
  const csv = `x\n${Array.from({ length: rows }, (_, i) => i).join("\n")}\n`;
  render(
    <>
      <ForceGraph />
      <NodeList />
    </>,
  );
  await act(async () => {
    await actions().loadText(csv, { fileName: "line.csv", fileSize: csv.length, isDemo: false });
    await actions().setRadius(1e-6); // z-scored spacing is about 3.5e-4, so every row is its own ball (worked by hand: sd of 0..n−1 ≈ n/√12)
  });
  expect(workbenchStore.getState().result?.landmarks.length).toBe(rows);
  expect(screen.getByTestId("graph-too-large").textContent).toMatch(/5,010 nodes/);
  expect(screen.queryByTestId("graph-canvas")).toBeNull();
  const number = screen.getByRole("spinbutton", { name: "node number" });
  await userEvent.setup().type(number, "42");
  expect(workbenchStore.getState().selectedNode).toBe(41);
});
