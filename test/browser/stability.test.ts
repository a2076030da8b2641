import { expect, it } from "vitest";
import { recordPageErrors, recordRequests, saveScreenshot, useBrowserSession } from "./harness.ts";

// The stability pane on the demo table: sweep the radii, pick one on the chart, and see the
// graph rebuilt there with the node count the sweep reported for that radius.

const session = useBrowserSession();

it("demo: a radius sweep runs in the worker, a click on the chart rebuilds at that radius, and seed stability reports an agreement", async () => {
  const { page } = session.browser();
  const requests = recordRequests(page);
  const errors = recordPageErrors(page);
  await page.goto(session.preview().url);
  await page.getByTestId("node-count").waitFor();

  await page.getByRole("tab", { name: "Stability" }).click();
  await page.getByRole("button", { name: "Sweep radii" }).click();
  const chart = page.locator(".sweep-chart");
  await chart.waitFor();
  const options = page.getByRole("combobox", { name: "Rebuild at a swept radius" }).locator("option");
  expect(await options.count()).toBe(25); // "choose…" and the 24 default radii

  // click the chart a quarter of the way along the radius axis: the nearest swept radius is chosen
  const box = (await chart.boundingBox())!;
  await chart.click({ position: { x: box.width * (104 + 0.25 * (340 - 8 - 104)) / 340, y: box.height / 2 } });
  const radius = Number(await page.locator("#radius-number").inputValue());
  const swept = await options.evaluateAll((list) => list.map((o) => [Number((o as HTMLOptionElement).value), o.textContent ?? ""] as const));
  const picked = swept.find(([value]) => value === radius);
  expect(picked).toBeDefined(); // the radius field holds one of the swept radii exactly
  const sweptNodes = Number(/· (\d+) nodes/.exec(picked![1])![1]);
  await expect.poll(async () => Number((await page.getByTestId("node-count").textContent())?.replaceAll(",", ""))).toBe(sweptNodes);

  await page.getByRole("button", { name: "Rebuild with other seeds" }).click();
  await page.getByTestId("seed-summary").waitFor();
  const agreement = Number(await page.getByTestId("agreement").textContent());
  expect(agreement).toBeGreaterThan(0);
  expect(agreement).toBeLessThanOrEqual(1);
  await saveScreenshot(page, "stability-pane");
  expect(requests.external()).toEqual([]);
  expect(errors).toEqual([]);
});
