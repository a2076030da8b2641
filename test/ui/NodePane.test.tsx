import "./support/dom.ts";
import { render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { expect, it } from "vitest";
import { workbenchStore } from "../../src/state/store.ts";
import { NodeList } from "../../src/ui/panels/NodeList.tsx";
import { NodePane } from "../../src/ui/panels/NodePane.tsx";
import { loadSmallTable } from "./support/smallTable.ts";

function Inspector() {
  return (
    <>
      <NodeList />
      <NodePane />
    </>
  );
}

/**
 * One column's cells in the open node's statistics table (the one headed "mean"), keyed by the
 * column headers, so the test reads the mean, sd, median and missing cells wherever they sit.
 */
function statsOf(pane: HTMLElement, column: RegExp, headedBy = "mean"): Record<string, string | null> {
  const table = within(pane).getAllByRole("table", { hidden: true }).find((t) => within(t).queryByRole("columnheader", { name: headedBy, hidden: true }))!;
  const headers = within(table).getAllByRole("columnheader", { hidden: true }).map((h) => h.textContent ?? "");
  const row = within(table).getByRole("rowheader", { name: column, hidden: true }).closest("tr")!;
  const cells = within(row).getAllByRole("cell", { hidden: true }).map((c) => c.textContent);
  return Object.fromEntries(headers.slice(1).map((h, i) => [h, cells[i] ?? null]));
}

// mean, sd and median from the main table; the missing count sits in the "Quartiles and range" table
const centre = (pane: HTMLElement, column: RegExp) => {
  const stats = statsOf(pane, column);
  return { mean: stats.mean, sd: stats.sd, median: stats.median, missing: statsOf(pane, column, "Q1").missing };
};

it("the nodes list box offers one option per node with its member count, and no node is chosen before one is opened", async () => {
  render(<Inspector />);
  await loadSmallTable();
  const list = screen.getByRole("listbox", { name: "nodes" }) as HTMLSelectElement;
  const options = within(list).getAllByRole("option");
  // sizes 3, 4, 3 worked by hand in smallTable.ts; node means of score 20, 45, 60
  expect(options.map((o) => o.textContent)).toEqual(["no node open", "Node 1 · 3 rows · score 20", "Node 2 · 4 rows · score 45", "Node 3 · 3 rows · score 60"]);
  expect(list.value).toBe("");
});

it("choosing Node 2 from the keyboard opens its pane: 4 members and per-column mean, sd and median worked by hand", async () => {
  const user = userEvent.setup();
  render(<Inspector />);
  await loadSmallTable();
  const list = screen.getByRole("listbox", { name: "nodes" });
  list.focus();
  await user.selectOptions(list, within(list).getByRole("option", { name: /^Node 2 ·/ }));
  expect(workbenchStore.getState().selectedNode).toBe(1);

  const pane = screen.getByTestId("node-pane");
  expect(within(pane).getByRole("heading", { name: "Node 2" })).toBeTruthy();
  const result = workbenchStore.getState().result!;
  expect(within(pane).getByTestId("node-size").textContent).toBe(String(result.members.offsets[2]! - result.members.offsets[1]!));
  expect(within(pane).getByTestId("node-size").textContent).toBe("4"); // members p3, p4, p6, p7 (smallTable.ts)
  expect(pane.textContent).toMatch(/landmark is row 4/); // p4 opened the second ball
  // Worked by hand over p3, p4, p6, p7 (sd divides by n − 1 = 3; median of 4 values = mean of the middle two):
  //   x = 3, 7, 11, 12: mean 33/4 = 8.25; deviations −5.25, −1.25, 2.75, 3.75, Σd² = 50.75, sd = √(50.75/3) = 4.1130; median (7 + 11)/2 = 9
  expect(centre(pane, /^x$/)).toEqual({ mean: "8.25", sd: "4.113", median: "9", missing: "0" });
  //   y = 3, 7, 12, 11: the same multiset as x, so the same mean, sd and median
  expect(centre(pane, /^y$/)).toEqual({ mean: "8.25", sd: "4.113", median: "9", missing: "0" });
  //   score = 30, 40, 50, 60: mean 45; Σd² = 225 + 25 + 25 + 225 = 500, sd = √(500/3) = 12.910; median (40 + 50)/2 = 45
  expect(centre(pane, /^score/)).toEqual({ mean: "45", sd: "12.91", median: "45", missing: "0" });
});

it("the close button clears the selection and closes the pane", async () => {
  const user = userEvent.setup();
  render(<Inspector />);
  await loadSmallTable();
  const list = screen.getByRole("listbox", { name: "nodes" });
  list.focus();
  await user.selectOptions(list, "0");
  expect(screen.getByRole("heading", { name: "Node 1" })).toBeTruthy();
  await user.click(screen.getByRole("button", { name: "close node" }));
  expect(workbenchStore.getState().selectedNode).toBeNull();
  expect(screen.queryByTestId("node-pane")).toBeNull();
  expect((list as HTMLSelectElement).value).toBe(""); // the list shows no node chosen once the pane is closed
});

it("under the statistics one line says bold marks |Δ| ≥ 1 and that bold is not statistical significance", async () => {
  const user = userEvent.setup();
  render(<Inspector />);
  await loadSmallTable();
  await user.selectOptions(screen.getByRole("listbox", { name: "nodes" }), "0");
  const note = screen.getByTestId("bold-note").textContent!.replace(/\s+/g, " ");
  expect(note).toContain("Bold where |Δ| ≥ 1");
  expect(note).toContain("bold is not statistical significance");
});
