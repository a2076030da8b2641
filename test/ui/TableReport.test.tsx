import "./support/dom.ts";
import { act, render, screen, within } from "@testing-library/react";
import { expect, it } from "vitest";
import { actions } from "../../src/state/actions.ts";
import { TableReport } from "../../src/ui/panels/TableReport.tsx";
import { loadSmallTable } from "./support/smallTable.ts";

const roleCell = (column: string): string => {
  const row = screen.getByRole("rowheader", { name: column }).closest("tr")!;
  return within(row).getAllByRole("cell")[1]!.textContent ?? ""; // type, then role
};

it("the report names roles as the Columns panel does: 'row label', 'feature', 'outcome', 'not used', never the keys id or ignore", async () => {
  render(<TableReport />);
  await loadSmallTable();
  // smallTable.ts loads id as the row label, score as the outcome; x, y are numeric features and site is left out
  expect(["id", "x", "y", "score", "site"].map(roleCell)).toEqual(["row label", "feature", "feature", "outcome", "not used"]);
});

it("a categorical column chosen as a feature shows as 'feature (one-hot)' in the report", async () => {
  render(<TableReport />);
  await loadSmallTable();
  await act(async () => {
    await actions().setRole("site", "feature");
  });
  expect(roleCell("site")).toBe("feature (one-hot)");
});

it("the delimiter choices read ', (comma)', '; (semicolon)', 'tab' and '| (pipe)', and the detected one is named the same way", async () => {
  render(<TableReport />);
  await loadSmallTable();
  const delimiter = screen.getByRole("combobox", { name: "Delimiter" });
  expect(Array.from((delimiter as HTMLSelectElement).options, (o) => o.textContent)).toEqual([
    "detected: , (comma)",
    ", (comma)",
    "; (semicolon)",
    "tab",
    "| (pipe)",
  ]);
});
