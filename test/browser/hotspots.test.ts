import { expect, it } from "vitest";
import { probe } from "./graphProbeSupport.ts";
import { recordPageErrors, recordRequests, saveScreenshot, useBrowserSession } from "./harness.ts";

// Outcome hotspots on the demo table: scan failed_within_90d in the worker, see a top hotspot
// beyond chance, choose it, and find it kept as region "hotspot 1" with its nodes selected.

const session = useBrowserSession();

it("demo: a scan of failed_within_90d with 199 replicates finds a top hotspot with p ≤ 0.05, and choosing it keeps region 'hotspot 1' and selects its nodes", async () => {
  const { page } = session.browser();
  const requests = recordRequests(page);
  const errors = recordPageErrors(page);
  await page.goto(`${session.preview().url}?probe`); // the graph probe is installed only with ?probe
  await page.getByTestId("node-count").waitFor();

  await page.getByRole("tab", { name: "Hotspots" }).click();
  await page.getByRole("combobox", { name: "Outcome scanned" }).selectOption("failed_within_90d");
  await page.getByLabel("Replicates").fill("199");
  await expect.poll(async () => (await page.getByTestId("hotspot-estimate").textContent()) ?? "").toMatch(/candidate sets? \(K = 8\)/);
  await page.getByRole("button", { name: "Scan for hotspots" }).click();
  const list = page.getByTestId("hotspot-list");
  await list.waitFor({ timeout: 60_000 });

  const top = page.getByTestId("hotspot").first();
  const p = (await top.getByTestId("hotspot-p").textContent()) ?? "";
  expect(Number(p)).toBeGreaterThanOrEqual(1 / 200); // 1/(R + 1) at best with 199 replicates (the p-value rule)
  expect(Number(p)).toBeLessThanOrEqual(0.05); // the demo's failure flare is beyond chance (the acceptance test)
  const nodes = ((await page.getByTestId("hotspot-nodes").first().textContent()) ?? "").replace(/^nodes /, "").split(" ").map((k) => Number(k) - 1);
  expect(await page.getByTestId("hotspot-accounting").textContent()).toContain("does not account for choosing those parameters");
  await saveScreenshot(page, "hotspots-list");

  await page.getByRole("button", { name: "keep hotspot 1 as a region" }).click();
  await expect.poll(() => probe(page, (g) => g.regions().map((r) => r.name))).toEqual(["hotspot 1"]);
  expect(await probe(page, (g) => g.selection())).toEqual(nodes);
  expect(await page.getByRole("textbox", { name: "region name" }).inputValue()).toBe("hotspot 1");
  await saveScreenshot(page, "hotspots-kept");
  expect(requests.external()).toEqual([]);
  expect(errors).toEqual([]);
});
