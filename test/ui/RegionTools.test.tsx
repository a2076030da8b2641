import "./support/dom.ts";
import { act, fireEvent, render, screen } from "@testing-library/react";
import { expect, it } from "vitest";
import { actions } from "../../src/state/actions.ts";
import { workbenchStore } from "../../src/state/store.ts";
import { FindRow } from "../../src/ui/panels/FindRow.tsx";
import { NodeList } from "../../src/ui/panels/NodeList.tsx";
import { RegionList } from "../../src/ui/panels/RegionList.tsx";
import { SelectionBar } from "../../src/ui/panels/SelectionBar.tsx";
import { loadSmallTable } from "./support/smallTable.ts";

// The small table at radius 1.4 (worked by hand in support/smallTable.ts): node 1 = {p1, p2, p3},
// node 2 = {p3, p4, p6, p7}, node 3 = {p6, p7, p8}; edges 1–2 and 2–3; p5 is left out (no x).

const press = (key: string, init: KeyboardEventInit = {}) => act(() => void fireEvent.keyDown(document.body, { key, ...init }));

it("keys G, C and Escape grow node 1 to nodes 1–2, take the component 1–3, and clear it (worked by hand)", async () => {
  render(<SelectionBar />);
  await loadSmallTable();
  act(() => actions().selectNodes([0]));
  await press("g");
  expect(workbenchStore.getState().selection).toEqual([0, 1]);
  await press("c");
  expect(workbenchStore.getState().selection).toEqual([0, 1, 2]);
  expect(screen.getByTestId("selection-count").textContent).toBe("3 nodes selected");
  await press("Escape");
  expect(workbenchStore.getState().selection).toEqual([]);
});

it("the selection bar shows each command's key: C, G, K and Esc", async () => {
  render(<SelectionBar />);
  await loadSmallTable();
  expect(screen.getAllByRole("button").map((b) => b.getAttribute("aria-keyshortcuts"))).toEqual(["c", "g", "k", "Escape"]);
});

it("K keeps nodes 1 and 3 as 'Region A' of 6 rows (p1–p3, p6–p8); a second region of node 2 shares 3 rows with it (p3, p6, p7)", async () => {
  render(<><SelectionBar /><RegionList /></>);
  await loadSmallTable();
  act(() => actions().selectNodes([0, 2]));
  await press("k");
  expect(screen.getByRole("textbox", { name: "region name" })).toHaveProperty("value", "Region A");
  expect(screen.getByTestId("region-rows").textContent).toBe("6 rows"); // worked by hand
  act(() => actions().selectNodes([1]));
  await press("k");
  expect(screen.getByText("Region A and Region B share 3 rows")).toBeTruthy(); // p3, p6, p7: worked by hand
});

it("a region renamed in its field keeps the new name; 'Select its nodes' selects the nodes most of whose rows are in it", async () => {
  render(<RegionList />);
  await loadSmallTable();
  act(() => actions().selectNodes([0]));
  act(() => void actions().keepSelectionAsRegion());
  const name = screen.getByRole("textbox", { name: "region name" });
  fireEvent.change(name, { target: { value: "North end" } });
  fireEvent.blur(name);
  expect(workbenchStore.getState().regions[0]!.name).toBe("North end");
  act(() => actions().clearRegion());
  fireEvent.click(screen.getByRole("button", { name: "Select its nodes" }));
  expect(workbenchStore.getState().selection).toEqual([0]); // node 2 has 1 of 4 rows (p3) in it: not most
});

it("record 4 is found in node 2 only; record 5 is not in the build for its missing value; label p8 is in node 3", async () => {
  render(<FindRow />);
  await loadSmallTable();
  const find = (mode: string, text: string) => {
    fireEvent.change(screen.getByRole("combobox", { name: "find by" }), { target: { value: mode } });
    fireEvent.change(screen.getByRole("searchbox", { name: "row to find" }), { target: { value: text } });
    fireEvent.click(screen.getByRole("button", { name: "Find" }));
    return screen.getByTestId("find-row-result").textContent;
  };
  expect(find("record", "4")).toBe("record 4 is in 1 node: 2"); // p4 lies only in node 2, worked by hand
  expect(find("record", "5")).toBe("record 5 is not in the build: a feature column has a missing value in this row");
  expect(find("label", "p8")).toBe("record 8 is in 1 node: 3"); // worked by hand
  expect(find("record", "9")).toBe("no record 9: the table has records 1 to 8");
});

it("shift+Enter in the node list adds the focused node to the selection, and a second time takes it out", async () => {
  render(<NodeList />);
  await loadSmallTable();
  const list = await screen.findByRole("listbox", { name: "nodes" });
  fireEvent.change(list, { target: { value: "1" } });
  fireEvent.keyDown(list, { key: "Enter", shiftKey: true });
  expect(workbenchStore.getState().selection).toEqual([1]);
  fireEvent.keyDown(list, { key: "Enter", shiftKey: true });
  expect(workbenchStore.getState().selection).toEqual([]);
});

it("renaming Region B to 'Region A' is refused: the field goes back to 'Region B' and says 'another region is named Region A'", async () => {
  render(<RegionList />);
  await loadSmallTable();
  act(() => actions().selectNodes([0]));
  act(() => void actions().keepSelectionAsRegion());
  act(() => void actions().keepSelectionAsRegion());
  const second = screen.getAllByRole("textbox", { name: "region name" })[1]!;
  fireEvent.change(second, { target: { value: "Region A" } });
  fireEvent.blur(second);
  expect(workbenchStore.getState().regions.map((r) => r.name)).toEqual(["Region A", "Region B"]);
  expect(second).toHaveProperty("value", "Region B");
  expect(screen.getByRole("status").textContent).toBe("another region is named Region A");
});
