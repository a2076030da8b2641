import "./support/dom.ts";
import { act, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { expect, it } from "vitest";
import { actions } from "../../src/state/actions.ts";
import { workbenchStore } from "../../src/state/store.ts";
import { ColorLegend } from "../../src/ui/graph/ColorLegend.tsx";

// 13 rows: grade takes 3 values, serial 13 (one more than the limit of 12)
const csv = ["x,y,grade,serial", ...Array.from({ length: 13 }, (_, i) => `${i},${(i * 7) % 13},${i % 3},${100 + i}`), ""].join("\n");

async function loaded(): Promise<void> {
  await act(async () => {
    await actions().loadText(csv, { fileName: "codes.csv", fileSize: csv.length, isDemo: false }, {});
  });
}

it("a numeric column is offered as categories only with at most 12 distinct values (grade yes, serial no)", async () => {
  render(<ColorLegend />);
  await loaded();
  const options = within(screen.getByRole("combobox", { name: "Colour by" })).getAllByRole("option").map((o) => o.textContent);
  expect(options).toContain("grade (as categories)");
  expect(options).not.toContain("serial (as categories)");
});

it("grade as categories draws a level legend of 0, 1, 2 and offers each level's share", async () => {
  const user = userEvent.setup();
  render(<ColorLegend />);
  await loaded();
  await act(async () => {
    await actions().setRadius(1);
  });
  await user.selectOptions(screen.getByRole("combobox", { name: "Colour by" }), "grade (as categories)");
  expect(within(screen.getByRole("list", { name: "most common grade in the node" })).getAllByRole("listitem").map((li) => li.textContent?.trim())).toEqual(["0", "1", "2"]);
  await user.selectOptions(screen.getByRole("combobox", { name: "showing" }), "share of 2");
  expect(workbenchStore.getState().colorLevel).toBe("2");
  expect(screen.getByText("node share of grade = 2")).toBeTruthy();
});

it("each kept region is offered as 'share of rows in' it", async () => {
  render(<ColorLegend />);
  await loaded();
  await act(async () => {
    workbenchStore.setState({ regions: [{ id: 4, name: "Region A", rows: Uint32Array.of(0, 1) }] });
  });
  expect(screen.getByRole("option", { name: "share of rows in Region A" })).toBeTruthy();
});
