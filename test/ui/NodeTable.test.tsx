import "./support/dom.ts";
import { render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { nodeTableOrder } from "../../src/state/nodeTable.ts";
import { workbenchStore } from "../../src/state/store.ts";
import { DrawingOrTable } from "../../src/ui/panels/DrawingOrTable.tsx";
import { NodeTable } from "../../src/ui/panels/NodeTable.tsx";
import { loadSmallTable } from "./support/smallTable.ts";

// The small table's graph (support/smallTable.ts, worked by hand): node 1 = {p1, p2, p3},
// node 2 = {p3, p4, p6, p7}, node 3 = {p6, p7, p8}.
const rowOrder = (): string[] => screen.getAllByRole("rowheader").map((cell) => cell.textContent ?? "");
const heading = (name: RegExp): HTMLElement => screen.getByRole("columnheader", { name });

describe("NodeTable", () => {
  it("is a real table: one row per node headed by its number, column headings node, rows, then the means of x, y and score", async () => {
    await loadSmallTable();
    render(<NodeTable />);
    const table = screen.getByRole("table");
    expect(rowOrder()).toEqual(["Node 1", "Node 2", "Node 3"]);
    const headings = within(table).getAllByRole("columnheader").map((h) => h.textContent?.replace(/ [▲▼]$/, ""));
    expect(headings.slice(0, 2)).toEqual(["node", "rows"]);
    expect(headings.slice(-3)).toEqual(["mean x", "mean y", "mean score"]);
    for (const h of within(table).getAllByRole("columnheader")) expect(h.getAttribute("scope")).toBe("col");
    const second = screen.getByRole("rowheader", { name: "Node 2" }).closest("tr")!;
    const cells = within(second).getAllByRole("cell").map((c) => c.textContent);
    expect(cells[0]).toBe("4"); // node 2 holds p3, p4, p6, p7: worked by hand
    expect(cells.at(-1)).toBe("45"); // score (30 + 40 + 50 + 60) / 4: worked by hand
  });

  it("the rows button sorts by size, largest first (ties by node number: 2, 1, 3), and again smallest first (1, 3, 2), with aria-sort saying so", async () => {
    await loadSmallTable();
    render(<NodeTable />);
    const user = userEvent.setup();
    expect(heading(/^node/).getAttribute("aria-sort")).toBe("ascending");
    await user.click(within(heading(/^rows/)).getByRole("button"));
    expect(rowOrder()).toEqual(["Node 2", "Node 1", "Node 3"]); // sizes 3, 4, 3: worked by hand
    expect(heading(/^rows/).getAttribute("aria-sort")).toBe("descending");
    expect(heading(/^node/).getAttribute("aria-sort")).toBeNull();
    await user.click(within(heading(/^rows/)).getByRole("button"));
    expect(rowOrder()).toEqual(["Node 1", "Node 3", "Node 2"]);
    expect(heading(/^rows/).getAttribute("aria-sort")).toBe("ascending");
  });

  it("sorts by a column mean from the keyboard: Tab to the mean score button and Enter gives 3, 2, 1 (means 60, 45, 20)", async () => {
    await loadSmallTable();
    render(<NodeTable />);
    within(heading(/^mean score/)).getByRole("button").focus();
    await userEvent.setup().keyboard("{Enter}");
    expect(rowOrder()).toEqual(["Node 3", "Node 2", "Node 1"]); // score means 20, 45, 60: worked by hand
  });

  it("a row's button opens that node (selectedNode 1 for Node 2) and marks its row aria-current", async () => {
    await loadSmallTable();
    render(<NodeTable />);
    await userEvent.setup().click(screen.getByRole("button", { name: "Node 2" }));
    expect(workbenchStore.getState().selectedNode).toBe(1);
    expect(screen.getByRole("rowheader", { name: "Node 2" }).closest("tr")!.getAttribute("aria-current")).toBe("true");
  });

  it("the switch above the graph shows the node table instead of the drawing, which stays mounted but hidden", async () => {
    await loadSmallTable();
    render(<DrawingOrTable drawing={<p>the drawing</p>} />);
    const user = userEvent.setup();
    expect(screen.getByRole("button", { name: "Drawing" }).getAttribute("aria-pressed")).toBe("true");
    expect(screen.queryByRole("table")).toBeNull();
    await user.click(screen.getByRole("button", { name: "Node table" }));
    expect(screen.getByRole("button", { name: "Node table" }).getAttribute("aria-pressed")).toBe("true");
    expect(screen.getByRole("table")).toBeTruthy();
    expect(screen.getByText("the drawing").closest("[hidden]")).not.toBeNull();
  });
});

describe("nodeTableOrder", () => {
  it("the @example: 3, NaN, 1, 3 descending gives 0, 3, 2, 1 (ties by node, NaN last)", () => {
    expect(Array.from(nodeTableOrder(Float64Array.of(3, NaN, 1, 3), "descending"))).toEqual([0, 3, 2, 1]); // worked by hand
  });

  it("puts NaN last when ascending too: NaN, 2, 1 gives 2, 1, 0", () => {
    expect(Array.from(nodeTableOrder(Float64Array.of(NaN, 2, 1), "ascending"))).toEqual([2, 1, 0]); // worked by hand
  });
});
