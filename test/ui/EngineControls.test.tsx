import "./support/dom.ts";
import { render, screen, waitFor } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { expect, it } from "vitest";
import { workbenchStore } from "../../src/state/store.ts";
import { BuildSummary } from "../../src/ui/panels/BuildSummary.tsx";
import { ColumnRoles } from "../../src/ui/panels/ColumnRoles.tsx";
import { CoverControls } from "../../src/ui/panels/CoverControls.tsx";
import { ColorLegend } from "../../src/ui/graph/ColorLegend.tsx";
import { loadSmallTable } from "./support/smallTable.ts";

it("choosing the robust scaling rebuilds with scale robust and a newly suggested radius", async () => {
  const user = userEvent.setup();
  render(<CoverControls />);
  await loadSmallTable();
  await user.selectOptions(screen.getByRole("combobox", { name: "Scaling" }), "robust");
  await waitFor(() => expect(workbenchStore.getState().result?.params.scale).toBe("robust"));
  expect(workbenchStore.getState().radius).toBe(workbenchStore.getState().suggestedRadius); // the default rule re-applied
  expect(screen.getByText(/\(x − median\) \/ interquartile range/)).toBeTruthy();
});

it("filling missing values with the median keeps all 8 rows and reports 1 value filled for x", async () => {
  const user = userEvent.setup();
  render(
    <>
      <CoverControls />
      <BuildSummary />
    </>,
  );
  await loadSmallTable();
  await user.selectOptions(screen.getByRole("combobox", { name: "Missing value" }), "median");
  await waitFor(() => expect(workbenchStore.getState().result?.params.missing).toBe("median"));
  const result = workbenchStore.getState().result!;
  expect(result.usedRows.length).toBe(8); // p5's missing x is filled, so every row of smallTable.ts is used
  expect(result.imputed).toEqual({ x: 1, y: 0 }); // p5 lacks x only (smallTable.ts)
  expect(screen.getByText(/Filled in \(median\): x 1/)).toBeTruthy();
});

it("a feature weight of 0 typed in the column list rebuilds with that weight in the parameters", async () => {
  const user = userEvent.setup();
  render(<ColumnRoles />);
  await loadSmallTable();
  const weight = screen.getByRole("spinbutton", { name: "weight of y" });
  await user.clear(weight);
  await user.type(weight, "0{Enter}");
  await waitFor(() => expect(workbenchStore.getState().result?.params.weights).toEqual({ y: 0 }));
});

it("the summary shows cycle rank and b1 equal to the result's, and b0 once, as the count labelled 'components (b0)'", async () => {
  render(<BuildSummary />);
  await loadSmallTable();
  const result = workbenchStore.getState().result!;
  expect(screen.getByTestId("cycle-rank").textContent).toBe(String(result.cycleRank));
  expect(screen.getByTestId("b1").textContent).toBe(String(result.betti!.b1));
  expect(result.cycleRank).toBe(0); // 3 nodes in a path, 2 edges (smallTable.ts): 2 − 3 + 1
  const terms = screen.getAllByRole("term").map((t) => t.textContent);
  expect(terms.filter((t) => /b0|component/.test(t ?? ""))).toEqual(["components (b0)"]); // one count, not two
  expect(screen.getByTestId("component-count").textContent).toBe(String(result.betti!.b0));
  expect(screen.getByText(/three balls overlapping in pairs/)).toBeTruthy();
});

it("the loops note defines a ball where it first uses the word", async () => {
  render(<BuildSummary />);
  await loadSmallTable();
  const note = document.querySelector(".loops-note")!.textContent!.replace(/\s+/g, " ");
  expect(note.indexOf("A ball is the set of rows within the radius of one landmark")).toBe(0);
});

it("a categorical column set to 'feature (one-hot)' rebuilds with it in the one-hot parameters", async () => {
  const user = userEvent.setup();
  render(<ColumnRoles />);
  await loadSmallTable();
  const role = screen.getByRole("combobox", { name: "role of site" });
  expect(Array.from((role as HTMLSelectElement).options, (o) => o.textContent)).toEqual(["feature (one-hot)", "row label", "not used"]);
  await user.selectOptions(role, "feature");
  await waitFor(() => expect(workbenchStore.getState().result?.params.oneHot).toEqual(["site"]));
  expect(workbenchStore.getState().result?.params.features).toEqual(["x", "y"]); // numeric features unchanged (smallTable.ts)
});

it("colouring by a categorical column shows each node's most common level with one swatch per level, in file order", async () => {
  const user = userEvent.setup();
  render(<ColorLegend />);
  await loadSmallTable();
  await user.selectOptions(screen.getByRole("combobox", { name: "Colour by" }), "site");
  const levels = await screen.findByRole("list", { name: "most common site in the node" });
  expect(Array.from(levels.querySelectorAll("li"), (li) => li.textContent?.trim())).toEqual(["north", "middle", "south"]); // first appearance in smallTable.ts
});
