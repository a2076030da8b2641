import "./support/dom.ts";
import { render, screen } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { expect, it } from "vitest";
import { nodeMeans } from "../../src/core/index.ts";
import { workbenchStore } from "../../src/state/store.ts";
import { ColorLegend } from "../../src/ui/graph/ColorLegend.tsx";
import { formatNumber } from "../../src/ui/format.ts";
import { loadSmallTable } from "./support/smallTable.ts";

/** Smallest and largest node mean of a column, from core's nodeMeans over the current result. */
function nodeMeanRange(column: string): [number, number] {
  const { table, result } = workbenchStore.getState();
  const means = Array.from(nodeMeans(table!.columns.find((c) => c.name === column)!.numbers, result!.members));
  return [Math.min(...means), Math.max(...means)];
}

it("choosing x shows the legend from 2 to 12, the smallest and largest node mean of x", async () => {
  const user = userEvent.setup();
  render(<ColorLegend />);
  await loadSmallTable();
  await user.selectOptions(screen.getByRole("combobox", { name: "Colour by" }), "x");
  expect(workbenchStore.getState().colorBy).toBe("x");
  const [lo, hi] = nodeMeanRange("x");
  expect([lo, hi]).toEqual([2, 12]); // by hand: node 1 mean of 1, 2, 3; node 3 mean of 11, 12, 13
  expect(screen.getByTestId("legend-min").textContent).toBe(formatNumber(lo));
  expect(screen.getByTestId("legend-max").textContent).toBe(formatNumber(hi));
  expect(screen.getByText("node mean of x")).toBeTruthy();
});

it("choosing score shows the legend from 20 to 60, the smallest and largest node mean of score", async () => {
  const user = userEvent.setup();
  render(<ColorLegend />);
  await loadSmallTable();
  await user.selectOptions(screen.getByRole("combobox", { name: "Colour by" }), "x");
  await user.selectOptions(screen.getByRole("combobox", { name: "Colour by" }), "score");
  const [lo, hi] = nodeMeanRange("score");
  expect([lo, hi]).toEqual([20, 60]); // by hand: node 1 mean of 10, 20, 30; node 3 mean of 50, 60, 70
  expect(screen.getByTestId("legend-min").textContent).toBe(formatNumber(lo));
  expect(screen.getByTestId("legend-max").textContent).toBe(formatNumber(hi));
});

it("choosing 'nothing (plain)' hides the scale", async () => {
  const user = userEvent.setup();
  render(<ColorLegend />);
  await loadSmallTable();
  expect(screen.getByTestId("legend-min")).toBeTruthy(); // the score outcome colours by default
  await user.selectOptions(screen.getByRole("combobox", { name: "Colour by" }), "nothing (plain)");
  expect(workbenchStore.getState().colorBy).toBeNull();
  expect(screen.queryByTestId("legend-min")).toBeNull();
  expect(screen.queryByTestId("legend-max")).toBeNull();
  expect(screen.queryByText(/node mean of/)).toBeNull();
});
