import "./support/dom.ts";
import { render, screen, within } from "@testing-library/react";
import { expect, it } from "vitest";
import { SourceBar } from "../../src/ui/panels/SourceBar.tsx";
import { loadSmallTable, smallFileName } from "./support/smallTable.ts";

it("a demo-flagged source shows its file name, its 8 rows and the flag 'invented demo data'", async () => {
  render(<SourceBar />);
  await loadSmallTable({ isDemo: true });
  const bar = screen.getByRole("banner");
  expect(within(bar).getByText(smallFileName).tagName).toBe("STRONG");
  expect(within(bar).getByText(/· 8 rows/)).toBeTruthy(); // 8 data records in the small table
  expect(within(bar).getByText("invented demo data")).toBeTruthy();
});

it("a source that is not the demo shows no 'invented demo data' flag", async () => {
  render(<SourceBar />);
  await loadSmallTable({ isDemo: false });
  expect(screen.getByText(smallFileName)).toBeTruthy();
  expect(screen.queryByText("invented demo data")).toBeNull();
});

it("'Export tables (.zip)' is disabled before a build and enabled once a graph is built", async () => {
  render(<SourceBar />);
  const exportButton = screen.getByRole("button", { name: "Export tables (.zip) contains row-level data" }) as HTMLButtonElement;
  expect(exportButton.disabled).toBe(true);
  await loadSmallTable();
  expect(exportButton.disabled).toBe(false);
});
