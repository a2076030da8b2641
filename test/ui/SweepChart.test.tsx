import "./support/dom.ts";
import { act, render, screen } from "@testing-library/react";
import { expect, it } from "vitest";
import type { RadiusSweep } from "../../src/core/index.ts";
import { actions } from "../../src/state/actions.ts";
import { workbenchStore } from "../../src/state/store.ts";
import { SweepChart } from "../../src/ui/graph/SweepChart.tsx";
import { loadSmallTable, smallRadius } from "./support/smallTable.ts";

/** The small table's default-range sweep (24 radii; the range is widened to reach the working radius 1.4 of smallTable.ts). */
async function smallSweep(): Promise<RadiusSweep> {
  await loadSmallTable();
  await act(async () => {
    await actions().runSweep();
  });
  return workbenchStore.getState().sweep!;
}

const chart = (radius: number, sweep: RadiusSweep) =>
  render(<SweepChart sweep={sweep} region={null} radius={radius} onPick={() => undefined} />);
const mark = (): string => screen.getByTestId("current-radius").textContent ?? "";

it("the default range widened to the current radius 1.4 ends there, and a radius twice the last swept one is marked at the right edge with an arrow saying it lies above", async () => {
  const sweep = await smallSweep();
  const radii = sweep.figures.radius;
  expect(radii[radii.length - 1]).toBeGreaterThanOrEqual(smallRadius); // without widening the range ended at 0.443 on this table (printed by the sweep)
  const above = radii[radii.length - 1]! * 2;
  chart(above, sweep);
  expect(mark()).toBe(`current radius ${Number(above.toPrecision(4))} lies above the swept range →`); // formatNumber keeps 4 significant digits
  expect(screen.getByRole("img", { name: /lies above the swept range/ })).toBeTruthy();
});

it("a current radius below the first swept radius is marked at the left edge with an arrow saying it lies below", async () => {
  const sweep = await smallSweep();
  const below = sweep.figures.radius[0]! / 2;
  chart(below, sweep);
  expect(mark()).toBe(`← current radius ${Number(below.toPrecision(4))} lies below the swept range`); // formatNumber keeps 4 significant digits
  const line = screen.getByTestId("current-radius").querySelector("line")!;
  expect(line.getAttribute("x1")).toBe("104"); // the left edge of the strips (SweepChart's left margin)
});

it("a current radius among the swept radii is a line at that radius labelled 'current radius'", async () => {
  const sweep = await smallSweep();
  const inside = sweep.figures.radius[5]!;
  chart(inside, sweep);
  expect(mark()).toBe(`current radius ${Number(inside.toPrecision(4))}`);
  expect(mark()).not.toMatch(/lies/);
});

it("the strips say 'components (b0)', 'nodes per row' and 'largest component', never 'piece' or 'balls'", async () => {
  const sweep = await smallSweep();
  const { container } = chart(smallRadius, sweep);
  const labels = Array.from(container.querySelectorAll(".strip-label"), (t) => t.textContent);
  expect(labels).toEqual(["nodes", "edges", "components (b0)", "loops (b1)", "cycle rank", "nodes per row", "largest node", "largest component"]);
  expect(container.textContent).not.toMatch(/piece|ball/);
});
