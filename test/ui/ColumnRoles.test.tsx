import "./support/dom.ts";
import { render, screen, waitFor, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { expect, it } from "vitest";
import { workbenchStore } from "../../src/state/store.ts";
import { ColumnRoles } from "../../src/ui/panels/ColumnRoles.tsx";
import { loadSmallTable } from "./support/smallTable.ts";

const optionLabels = (select: HTMLElement): (string | null)[] => within(select).getAllByRole("option").map((o) => o.textContent);

it("lists all five columns of the table, each with a role select showing its default role", async () => {
  render(<ColumnRoles />);
  await loadSmallTable();
  const selects = screen.getAllByRole("combobox") as HTMLSelectElement[];
  expect(selects.map((s) => s.getAttribute("aria-label"))).toEqual(["role of id", "role of x", "role of y", "role of score", "role of site"]);
  // id and score are named by the load hints; x, y numeric → feature; site repeats values → not used
  expect(selects.map((s) => s.value)).toEqual(["id", "feature", "feature", "outcome", "ignore"]);
  expect(screen.getByText("(1 missing)")).toBeTruthy(); // p5 has no x
});

it("setting y to 'not used' rebuilds with features [x] only", async () => {
  const user = userEvent.setup();
  render(<ColumnRoles />);
  await loadSmallTable();
  expect(workbenchStore.getState().result?.params.features).toEqual(["x", "y"]);
  const before = workbenchStore.getState().result;
  await user.selectOptions(screen.getByRole("combobox", { name: "role of y" }), "not used");
  await waitFor(() => expect(workbenchStore.getState().result).not.toBe(before));
  expect(workbenchStore.getState().result?.params.features).toEqual(["x"]);
  expect((screen.getByRole("combobox", { name: "role of y" }) as HTMLSelectElement).value).toBe("ignore");
});

it("numeric columns offer feature, outcome, row label and not used; an identifier only row label and not used; a categorical column also one-hot", async () => {
  render(<ColumnRoles />);
  await loadSmallTable();
  expect(optionLabels(screen.getByRole("combobox", { name: "role of x" }))).toEqual(["feature", "outcome", "row label", "not used"]);
  expect(optionLabels(screen.getByRole("combobox", { name: "role of id" }))).toEqual(["row label", "not used"]);
  expect(optionLabels(screen.getByRole("combobox", { name: "role of site" }))).toEqual(["feature (one-hot)", "row label", "not used"]);
});
