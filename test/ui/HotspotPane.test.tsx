import "./support/dom.ts";
import { act, render, screen, within } from "@testing-library/react";
import userEvent from "@testing-library/user-event";
import { describe, expect, it } from "vitest";
import type { HotspotScan } from "../../src/core/index.ts";
import { workbenchStore } from "../../src/state/store.ts";
import { HotspotPane } from "../../src/ui/panels/HotspotPane.tsx";
import { fabricatedScan } from "../state/hotspotScanFixture.ts";
import { loadSmallTable } from "./support/smallTable.ts";

// The small table (support/smallTable.ts) builds 3 nodes; the scans here are fabricated (test/state/hotspotScanFixture.ts).

/** Loads and builds the small table, puts `scan` in the store as the finished scan of that build, and renders the pane. */
async function showScan(scan: HotspotScan | null, candidateSets: number | null = null): Promise<void> {
  await loadSmallTable();
  const { result } = workbenchStore.getState();
  act(() => {
    workbenchStore.setState({
      ...(scan ? { hotspotScan: { result, state: "done", fraction: 1, scan, error: null, elapsedMs: 300 } } : {}),
      ...(candidateSets === null ? {} : { hotspotEstimate: { result, maxNodes: 8, state: "done", candidateSets } }),
    });
  });
  render(<HotspotPane />);
}

const cells = (row: HTMLElement): string[] => within(row).getAllByRole("cell").map((c) => c.textContent ?? "");

describe("hotspot pane", () => {
  it("lists each hotspot: rank, rows, inside vs outside, the signed difference with its interval, p, and its 1-based nodes under it", async () => {
    await showScan(fabricatedScan());
    const [first, second] = screen.getAllByTestId("hotspot");
    // fabricated figures; p 0.001 and 0.4 as formatP writes them
    expect(cells(first!).slice(0, 5)).toEqual(["1", "3", "0.75 vs 0.125", "+0.625 (0.25 to 0.875)", "0.001"]);
    expect(cells(second!).slice(0, 5)).toEqual(["2", "2", "0.5 vs 0.25", "+0.25 (-0.125 to 0.5)", "0.4"]);
    expect(screen.getAllByTestId("hotspot-nodes").map((c) => c.textContent)).toEqual(["nodes 1 3", "nodes 2"]); // nodes 0, 2 and 1, 0-based
  });

  it("a p below 0.0001 reads '< 0.0001'", async () => {
    await showScan(fabricatedScan({}, [{ p: 0.00005 }]));
    expect(screen.getByTestId("hotspot-p").textContent).toBe("< 0.0001");
  });

  it("says beside the list what the p-value accounts for (the search at this radius, metric and scaling) and what it does not", async () => {
    await showScan(fabricatedScan());
    const text = screen.getByTestId("hotspot-accounting").textContent!;
    expect(text).toContain("accounts for the search over all candidate regions at this radius (1.4), metric (euclidean) and scaling (zscore)");
    expect(text).toContain("does not account for choosing those parameters, nor for looking at several outcomes");
  });

  it("says beside the intervals that each region was chosen as the maximum, so its interval is optimistic", async () => {
    await showScan(fabricatedScan());
    expect(screen.getByTestId("hotspot-interval-note").textContent).toContain("chosen because it scored highest, so its interval (percentile bootstrap, rows resampled inside and outside) is optimistic");
  });

  it("counts the rows scanned and the rows left out for a missing outcome (7 and 1, fabricated)", async () => {
    await showScan(fabricatedScan());
    expect(screen.getByTestId("hotspot-rows").textContent).toContain("7 rows scanned; 1 row left out for a missing flag.");
  });

  it("labels hotspots of a heuristic search 'heuristic' and says why it ran", async () => {
    await showScan(fabricatedScan({ search: "heuristic", candidateSets: 5_000_000 }, [{ search: "heuristic" }]));
    expect(cells(screen.getByTestId("hotspot"))[0]).toBe("1 heuristic");
    expect(screen.getByTestId("hotspot-rows").textContent).toContain("The 5,000,000 candidate sets passed the budget, so a heuristic search ran, the same one inside every permutation.");
    expect(screen.getByTestId("hotspot-accounting").textContent).toContain("the search over all candidate regions (the same heuristic search in every permutation) at this radius");
  });

  it("with no cases or only cases says every score is 0, p = 1", async () => {
    await showScan(fabricatedScan({}, [{ score: 0, p: 1, inside: 0, outside: 0, difference: 0, ciLow: 0, ciHigh: 0 }]));
    expect(screen.getByTestId("hotspot-flat").textContent).toBe("No cases or only cases among the scanned rows: every score is 0, p = 1.");
  });

  it("for a numeric outcome with one value throughout says every score is 0, p = 1", async () => {
    await showScan(fabricatedScan({ score: "normal", outcome: "score" }, [{ score: 0, p: 1 }]));
    expect(screen.getByTestId("hotspot-flat").textContent).toBe("score takes one value throughout the scanned rows: every score is 0, p = 1.");
  });

  it("says nothing about flat scores when the top hotspot scores above 0", async () => {
    await showScan(fabricatedScan());
    expect(screen.queryByTestId("hotspot-flat")).toBeNull();
  });

  it("shows seed stability only when it was run: a share of 0.8 of 10 seeds reads '80%' under 'Seed stability (of 10)'", async () => {
    await showScan(fabricatedScan({ stabilitySeeds: 10 }, [{ seedShare: 0.8 }]));
    expect(cells(screen.getByTestId("hotspot"))[5]).toBe("80%");
    expect(screen.getAllByRole("columnheader").map((h) => h.textContent)).toContain("Seed stability (of 10)");
  });

  it("without a seed-stability run there is no seed column", async () => {
    await showScan(fabricatedScan());
    expect(screen.getAllByRole("columnheader").map((h) => h.textContent)).toEqual(["Rank", "Rows", "Inside vs outside", "Difference (95% interval)", "p", "Region"]);
  });

  it("before a run shows the candidate count and the expected time: 40,000 sets × 1,000 scorings at 8,400 per ms and 7 rows' bootstrap is about 4.8 s (worked by hand)", async () => {
    await showScan(null, 40_000);
    // 40,000 × 1,000 / 8,400 = 4,761.9 ms, plus 7 × 2,000 × 10 / 100,000 = 1.4 ms: 4.76 s, two significant digits (worked by hand)
    expect(screen.getByTestId("hotspot-estimate").textContent).toBe(
      "40,000 candidate sets (K = 8), each scored for the data and 999 permutations: about 4.8 s expected (an estimate from rates measured once on the demo table).",
    );
  });

  it("choosing hotspot 1 keeps region 'hotspot 1' with its rows and selects its nodes", async () => {
    await showScan(fabricatedScan());
    await userEvent.setup().click(screen.getByRole("button", { name: "keep hotspot 1 as a region" }));
    const s = workbenchStore.getState();
    expect(s.regions.map((r) => [r.name, Array.from(r.rows)])).toEqual([["hotspot 1", [0, 1, 2]]]); // the fabricated hotspot's rows
    expect(s.selection).toEqual([0, 2]);
    expect(s.activeRegionId).toBe(s.regions[0]!.id);
  });
});
