import "./support/dom.ts";
import { act, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import { parseCsvText, regionSides, regionTable } from "../../src/core/index.ts";
import { actions } from "../../src/state/actions.ts";
import { workbenchStore } from "../../src/state/store.ts";
import { formatNumber } from "../../src/ui/format.ts";
import { formatP } from "../../src/ui/formatP.ts";
import { ecdfPath } from "../../src/ui/panels/ecdfPath.ts";
import { RegionPane } from "../../src/ui/panels/RegionPane.tsx";
import { ksPChoices } from "../../src/ui/panels/RegionTableView.tsx";
import { loadSmallTable, smallCsv } from "./support/smallTable.ts";

// The small table (worked in support/smallTable.ts): node 1 = {p1, p2, p3}, node 2 = {p3, p4, p6, p7},
// node 3 = {p6, p7, p8}; p5 has no x and is left out of the build.

async function select(...nodes: number[]): Promise<void> {
  await act(async () => {
    for (const node of nodes) await actions().selectNode(node, true);
  });
}

const numericColumns = (): string[] =>
  within(screen.getByTestId("region-numeric")).getAllByRole("rowheader").map((h) => h.textContent ?? "");

describe("region pane", () => {
  it("explains the selection, named 'selection', and offers to keep it as a region", async () => {
    render(<RegionPane />);
    await loadSmallTable();
    await select(0);
    expect(await screen.findByRole("heading", { name: "selection" })).toBeTruthy();
    await userEvent.setup().click(screen.getByRole("button", { name: "Keep as region" }));
    expect(await screen.findByRole("heading", { name: "Region A" })).toBeTruthy();
    expect(screen.queryByRole("button", { name: "Keep as region" })).toBeNull();
  });

  it("lines are sorted by D, largest first, as core's regionTable orders them, with formatted D and d vs rest", async () => {
    render(<RegionPane />);
    await loadSmallTable();
    await select(0);
    await screen.findByTestId("region-numeric");
    const { result } = workbenchStore.getState();
    const expected = regionTable(parseCsvText(smallCsv), regionSides(result!.rowsRead, result!.usedRows, Uint32Array.of(0, 1, 2)), { labelColumn: "id" });
    const lines = expected.lines.filter((l) => l.kind === "numeric");
    expect(numericColumns()).toEqual(lines.map((l) => l.column));
    const statistics = lines.map((l) => l.statistic);
    expect([...statistics].sort((a, b) => b - a)).toEqual(statistics);
    const first = screen.getByRole("rowheader", { name: lines[0]!.column }).closest("tr")!;
    const cells = within(first).getAllByRole("cell").map((c) => c.textContent);
    expect(cells.slice(1)).toEqual([formatNumber(lines[0]!.statistic), formatNumber(lines[0]!.d), formatP(lines[0]!.pAdjusted)]);
    expect(screen.getByRole("columnheader", { name: "d vs rest" })).toBeTruthy();
  });

  it("says the region was picked by looking at the same data, and counts the 1 row left out of the build (p5, worked by hand)", async () => {
    render(<RegionPane />);
    await loadSmallTable();
    await select(0);
    expect((await screen.findByTestId("region-caution")).textContent).toMatch(/picked by looking at the same data.*not confirmatory tests/);
    expect(screen.getByTestId("region-unused").textContent).toBe("1 row left out of the build, in neither side");
    expect(screen.getByTestId("region-counts").textContent).toContain("3 rows in the region, 4 rows in the rest"); // p1–p3 against p4, p6–p8 (worked by hand)
  });

  it("A vs B: node 1 against node 2 leaves p3, in both, out of both sides (1 row, worked by hand) and the column reads 'd vs Region B'", async () => {
    render(<RegionPane />);
    await loadSmallTable();
    await select(0);
    const a = actions().keepSelectionAsRegion()!;
    actions().clearRegion();
    await select(1);
    const b = actions().keepSelectionAsRegion()!;
    await act(async () => {
      actions().setActiveRegion(a.id);
    });
    await userEvent.setup().selectOptions(screen.getByRole("combobox", { name: "Compare with" }), String(b.id));
    expect((await screen.findByTestId("region-in-both")).textContent).toBe("1 row in both regions, left out of both sides");
    expect(screen.getByTestId("region-counts").textContent).toContain("2 rows in the region, 3 rows in Region B"); // p1, p2 against p4, p6, p7
    expect(screen.getByRole("columnheader", { name: "d vs Region B" })).toBeTruthy();
  });

  it("a categorical column shows each level's share on both sides: site north 100% inside, 0% in the rest (worked by hand)", async () => {
    render(<RegionPane />);
    await loadSmallTable();
    await act(async () => {
      await actions().setRole("site", "outcome");
    });
    await select(0);
    const levels = await screen.findByTestId("region-categorical");
    const north = within(levels).getByRole("rowheader", { name: "north" }).closest("tr")!;
    expect(within(north).getAllByRole("cell").map((c) => c.textContent)).toEqual(["100%", "0%"]);
    expect(within(levels).getByText(/expected counts are below 5/)).toBeTruthy(); // 7 rows over 3 levels: every expected count is below 5
  });

  it("the export button waits for a kept region", async () => {
    render(<RegionPane />);
    await loadSmallTable();
    expect((screen.getByRole("button", { name: "Export region rows (.csv)" }) as HTMLButtonElement).disabled).toBe(true);
    await select(0);
    await act(async () => {
      actions().keepSelectionAsRegion();
    });
    expect((screen.getByRole("button", { name: "Export region rows (.csv)" }) as HTMLButtonElement).disabled).toBe(false);
  });

  it("the region-rows export says it 'contains row-level data', as the main export does", async () => {
    render(<RegionPane />);
    await loadSmallTable();
    expect(screen.getByRole("button", { name: "Export region rows (.csv)" }).parentElement!.querySelector(".export-note")!.textContent).toBe(" contains row-level data");
  });

  it("the adjusted-p column's tooltip says the exact p ignores ties and Stephens' correction is not applied", async () => {
    render(<RegionPane />);
    await loadSmallTable();
    await select(0);
    const header = await screen.findByRole("columnheader", { name: "adjusted p" });
    expect(header.getAttribute("title")).toContain(ksPChoices);
    expect(ksPChoices).toContain("as if there were no ties");
    expect(ksPChoices).toContain("without Stephens' small-sample correction");
  });
});

describe("region pane formatting", () => {
  it("p-values below 0.0001 read '< 0.0001', 0.0001 and 0.00052 read with four decimals, 0.25 as formatNumber writes it", () => {
    expect([formatP(0.00009), formatP(1e-12), formatP(0.0001), formatP(0.00052), formatP(0.25), formatP(NaN)]).toEqual(["< 0.0001", "< 0.0001", "0.0001", "0.0005", "0.25", "–"]);
  });

  it("the ECDF path of 0 and 1 on a 10 × 10 box steps up by half at each value (worked by hand; the JSDoc example)", () => {
    expect(ecdfPath(Float64Array.of(0, 1), 0, 1, 10, 10)).toBe("M0,10H0V5H10V0");
    expect(ecdfPath(new Float64Array(0), 0, 1, 10, 10)).toBe("");
  });
});
