import { readFile } from "node:fs/promises";
import { strFromU8, unzipSync } from "fflate";
import { expect, it } from "vitest";
import { recordPageErrors, recordRequests, saveScreenshot, settledNodePoint, useBrowserSession } from "./harness.ts";

// End to end in Chromium: on the demo, select two nodes (shift-click one on the canvas, add another
// from its pane), keep them as a region, read the region pane, export the region rows, and check
// them against members.csv of the export zip: the CSV's rows are the union of the two nodes' members,
// each once, with the cells exactly as in the demo file.

const session = useBrowserSession();

/** Splits simple CSV lines (the demo has no quoted cells). */
const rowsOf = (csv: string): string[][] => csv.trimEnd().split("\n").map((line) => line.split(","));

it("demo: two selected nodes kept as a region; its exported rows are the union of their members in members.csv, cells as in the file", async () => {
  const { page } = session.browser();
  const requests = recordRequests(page);
  const errors = recordPageErrors(page);
  await page.goto(session.preview().url);
  await page.getByTestId("node-count").waitFor();
  const nodeCount = Number((await page.getByTestId("node-count").textContent())!.replaceAll(",", ""));

  const point = await settledNodePoint(page);
  await page.getByTestId("graph-canvas").click({ position: point, modifiers: ["Shift"] });
  const pane = page.getByTestId("node-pane");
  await pane.waitFor();
  const first = Number((await pane.getByRole("heading").textContent())!.replace("Node ", ""));
  const second = (first % nodeCount) + 1; // the next node (1-based), opened from the list and added from its pane
  await page.getByRole("listbox", { name: "nodes" }).selectOption(String(second - 1));
  await pane.getByRole("heading", { name: `Node ${second}` }).waitFor();
  await pane.getByRole("button", { name: "Add to region" }).click();

  await page.getByRole("tab", { name: "Region" }).click();
  const regionPane = page.getByTestId("region-pane");
  await regionPane.getByRole("heading", { name: "selection" }).waitFor();
  await regionPane.getByRole("button", { name: "Keep as region" }).click();
  await regionPane.getByRole("heading", { name: "Region A" }).waitFor();
  await regionPane.getByTestId("region-caution").waitFor();
  await regionPane.getByTestId("region-numeric").waitFor();
  expect(await regionPane.getByRole("columnheader", { name: "d vs rest" }).count()).toBe(1);
  await saveScreenshot(page, "region-pane");

  const [rowsDownload] = await Promise.all([page.waitForEvent("download"), regionPane.getByRole("button", { name: "Export region rows (.csv)" }).click()]);
  expect(rowsDownload.suggestedFilename()).toBe("pump-fleet-region-rows.csv");
  const regionRows = rowsOf(await readFile((await rowsDownload.path())!, "utf8"));

  const [zipDownload] = await Promise.all([page.waitForEvent("download"), page.getByRole("button", { name: "Export tables (.zip)" }).click()]);
  const files = unzipSync(new Uint8Array(await readFile((await zipDownload.path())!)));
  const members = rowsOf(strFromU8(files["members.csv"]!)).slice(1);
  const union = [...new Set(members.filter(([node]) => Number(node) === first || Number(node) === second).map(([, row]) => Number(row)))].sort((a, b) => a - b);

  const demo = rowsOf(await readFile(new URL("../../public/demo/pump-fleet.csv", import.meta.url), "utf8"));
  expect(regionRows[0]).toEqual(["region", "row", ...demo[0]!]);
  expect(regionRows.slice(1).map(([, row]) => Number(row))).toEqual(union);
  for (const line of regionRows.slice(1)) {
    expect(line[0]).toBe("Region A");
    expect(line.slice(2)).toEqual(demo[Number(line[1])]); // record k is line k + 1 of the file
  }
  const summary = JSON.parse(strFromU8(files["summary.json"]!));
  expect(summary.regions).toEqual([{ name: "Region A", rowCount: union.length, records: union }]);

  // colour the graph by the region's share, then the 0/1 outcome as categories
  const colour = page.getByRole("combobox", { name: "Colour by" });
  await colour.selectOption({ label: "share of rows in Region A" });
  await page.getByText("node share of rows in Region A").waitFor();
  await colour.selectOption({ label: "failed_within_90d (as categories)" });
  await page.getByRole("list", { name: "most common failed_within_90d in the node" }).waitFor();
  await saveScreenshot(page, "region-colouring");

  expect(requests.external()).toEqual([]);
  expect(errors).toEqual([]);
});
