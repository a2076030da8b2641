import { expect, it } from "vitest";
import { axeViolations, expectNoAxeViolations } from "./axe.ts";
import { saveScreenshot, useBrowserSession, type LaunchedBrowser } from "./harness.ts";

// axe-core over the main states of the workbench on the demo table, one state per test, each from a
// fresh load. Another state is one more test: reach it, wait for what it shows, call expectNoAxeViolations.

const session = useBrowserSession();
type Page = LaunchedBrowser["page"];

async function openDemo(): Promise<Page> {
  const { page } = session.browser();
  await page.goto(session.preview().url);
  await page.getByTestId("node-count").waitFor();
  return page;
}

/** Opens node `node` (1-based) from the nodes list and waits for its member statistics. */
async function openNode(page: Page, node: number): Promise<void> {
  await page.getByRole("listbox", { name: "nodes" }).selectOption(String(node - 1));
  const pane = page.getByTestId("node-pane");
  await pane.getByRole("heading", { name: `Node ${node}` }).waitFor();
  await pane.getByRole("columnheader", { name: "mean" }).first().waitFor();
}

it("the demo graph has no axe violations", async () => {
  const page = await openDemo();
  await expectNoAxeViolations(page, "the demo graph");
});

it("the table report has no axe violations", async () => {
  const page = await openDemo();
  await page.getByRole("button", { name: "Table report" }).click();
  await page.getByTestId("table-report").waitFor();
  await expectNoAxeViolations(page, "the table report");
});

it("an open node (node 9, its statistics in) has no axe violations", async () => {
  const page = await openDemo();
  await openNode(page, 9);
  await expectNoAxeViolations(page, "an open node");
});

it("the region pane of a kept region (nodes 9 and 37) has no axe violations", async () => {
  const page = await openDemo();
  const pane = page.getByTestId("node-pane");
  for (const node of [9, 37]) {
    await openNode(page, node);
    await pane.getByRole("button", { name: "Add to region" }).click();
  }
  await page.getByRole("tab", { name: "Region" }).click();
  const regionPane = page.getByTestId("region-pane");
  await regionPane.getByRole("button", { name: "Keep as region" }).click();
  await regionPane.getByRole("heading", { name: "Region A" }).waitFor();
  await regionPane.getByTestId("region-numeric").waitFor();
  await expectNoAxeViolations(page, "the region pane");
});

it("the stability tab after a radius sweep and a seed run has no axe violations", async () => {
  const page = await openDemo();
  await page.getByRole("tab", { name: "Stability" }).click();
  await page.getByRole("button", { name: "Sweep radii" }).click();
  await page.locator(".sweep-chart").waitFor();
  await page.getByRole("button", { name: "Rebuild with other seeds" }).click();
  await page.getByTestId("seed-summary").waitFor({ timeout: 60_000 });
  await expectNoAxeViolations(page, "the stability tab");
});

it("the hotspot list after a scan (199 replicates) has no axe violations", async () => {
  const page = await openDemo();
  await page.getByRole("tab", { name: "Hotspots" }).click();
  await page.getByLabel("Replicates").fill("199");
  await expect.poll(async () => (await page.getByTestId("hotspot-estimate").textContent()) ?? "").toMatch(/candidate sets?/);
  await page.getByRole("button", { name: "Scan for hotspots" }).click();
  await page.getByTestId("hotspot-list").waitFor({ timeout: 60_000 });
  await expectNoAxeViolations(page, "the hotspot list");
});

it("the node table, sorted by size, has no axe violations", async () => {
  const page = await openDemo();
  await page.getByRole("button", { name: "Node table" }).click();
  await page.getByTestId("node-table").getByRole("button", { name: /^rows/ }).click();
  await expect.poll(() => page.getByRole("columnheader", { name: /^rows/ }).getAttribute("aria-sort")).toBe("descending");
  await saveScreenshot(page, "access-node-table");
  await expectNoAxeViolations(page, "the node table");
});

it("the How to read tab has no axe violations", async () => {
  const page = await openDemo();
  await page.getByRole("tab", { name: "How to read" }).click();
  await page.getByRole("heading", { name: "How to read this" }).waitFor();
  await saveScreenshot(page, "access-how-to-read");
  await expectNoAxeViolations(page, "the How to read tab");
});

it("the helper reports what it is shown: an image without a text alternative added to the page is an image-alt violation", async () => {
  const page = await openDemo();
  await page.evaluate(() => document.querySelector("main")!.append(Object.assign(document.createElement("img"), { src: "data:image/gif;base64,R0lGODlhAQABAAAAACw=" })));
  expect((await axeViolations(page)).map((v) => v.rule)).toContain("image-alt"); // axe-core's rule for img without alt
});
