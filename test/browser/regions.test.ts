import { expect, it } from "vitest";
import { pointsInPolygon, type Point } from "../../src/ui/graph/pointInPolygon.ts";
import { probe, settledNodes } from "./graphProbeSupport.ts";
import { recordPageErrors, saveScreenshot, useBrowserSession, type LaunchedBrowser } from "./harness.ts";

// Regions as a person makes them on the demo: lasso nodes on the canvas (in lasso mode: a plain drag
// on empty space pans the view otherwise; shift-drag lassos in either mode), keep them, find a row,
// rebuild at another radius. Node centres come from the page's read-only probe, window.shoalGraph (opened with ?probe)
// (src/ui/graph/graphProbe.ts), in CSS pixels of the canvas.

const session = useBrowserSession();
type Page = LaunchedBrowser["page"];

/** Drags a closed polygon (canvas CSS pixels) with the mouse, through each vertex and back to the first. */
async function dragLasso(page: Page, polygon: readonly Point[], shift = false): Promise<void> {
  const box = (await page.getByTestId("graph-canvas").boundingBox())!;
  if (shift) await page.keyboard.down("Shift");
  await page.mouse.move(box.x + polygon[0]!.x, box.y + polygon[0]!.y);
  await page.mouse.down();
  for (const p of [...polygon.slice(1), polygon[0]!]) await page.mouse.move(box.x + p.x, box.y + p.y, { steps: 12 });
  await page.mouse.up();
  if (shift) await page.keyboard.up("Shift");
}

it("demo: a lasso selects the nodes whose centres lie inside it, shift-lasso adds, and two kept regions survive a rebuild at another radius with the same rows", async () => {
  const { page } = session.browser();
  const errors = recordPageErrors(page);
  await page.goto(`${session.preview().url}?probe`); // the graph probe is installed only with ?probe
  await page.getByTestId("node-count").waitFor();
  const nodes = await settledNodes(page);
  await page.getByRole("button", { name: "Lasso", exact: true }).click(); // a plain drag on empty space now lassos instead of panning
  let canvas = (await page.getByTestId("graph-canvas").boundingBox())!;
  // a concave "L" over the left half, starting in the top-left corner (inside the fit's 16 px margin: no node there)
  let w = canvas.width;
  let h = canvas.height;
  const left: Point[] = [{ x: 4, y: 4 }, { x: w / 2, y: 4 }, { x: w / 2, y: h / 2 }, { x: w / 4, y: h / 2 }, { x: w / 4, y: h - 4 }, { x: 4, y: h - 4 }];
  await dragLasso(page, left);
  const expectedLeft = pointsInPolygon(nodes.map((n) => ({ index: n.node, x: n.x, y: n.y })), left);
  expect(expectedLeft.length).toBeGreaterThan(0);
  expect(await probe(page, (g) => g.selection())).toEqual(expectedLeft);
  await page.getByRole("button", { name: /Keep as region/ }).click();

  // the region list now stands above the graph, so the canvas is shorter: read the centres again
  const afterKeep = await settledNodes(page);
  canvas = (await page.getByTestId("graph-canvas").boundingBox())!;
  [w, h] = [canvas.width, canvas.height];
  const right: Point[] = [{ x: w - 4, y: 4 }, { x: w - 4, y: h - 4 }, { x: (3 * w) / 4, y: h - 4 }, { x: (3 * w) / 4, y: 4 }];
  await dragLasso(page, right);
  const expectedRight = pointsInPolygon(afterKeep.map((n) => ({ index: n.node, x: n.x, y: n.y })), right);
  expect(await probe(page, (g) => g.selection())).toEqual(expectedRight);
  await page.keyboard.press("k");
  const afterSecond = await settledNodes(page);
  canvas = (await page.getByTestId("graph-canvas").boundingBox())!;
  [w, h] = [canvas.width, canvas.height];
  const middle: Point[] = [{ x: w / 2 - 60, y: 4 }, { x: w / 2 + 60, y: 4 }, { x: w / 2 + 60, y: h - 4 }, { x: w / 2 - 60, y: h - 4 }];
  await dragLasso(page, middle, true);
  const expectedBoth = [...new Set([...expectedRight, ...pointsInPolygon(afterSecond.map((n) => ({ index: n.node, x: n.x, y: n.y })), middle)])].sort((a, b) => a - b);
  expect(await probe(page, (g) => g.selection())).toEqual(expectedBoth);
  await page.waitForTimeout(200);
  const shot = await saveScreenshot(page, "regions-two-and-lasso");
  console.log(`two regions and a lasso selection: ${shot}`);

  const kept = await probe(page, (g) => g.regions());
  expect(kept.map((r) => r.name)).toEqual(["Region A", "Region B"]);
  const radius = Number(await page.locator("#radius-number").inputValue());
  const before = await page.getByTestId("node-count").textContent();
  await page.locator("#radius-number").fill(String(radius * 1.5));
  await page.locator("#radius-number").press("Enter");
  await page.waitForFunction((old) => document.querySelector("[data-testid=node-count]")?.textContent !== old, before);
  expect(await probe(page, (g) => g.regions())).toEqual(kept);
  expect(await probe(page, (g) => g.selection())).toEqual([]); // the selection belongs to a build; regions do not
  await expect(page.getByTestId("region-rows").allTextContents()).resolves.toEqual(kept.map((r) => `${r.rows.length.toLocaleString("en-US")} rows`));
  expect(errors).toEqual([]);
});

it("demo: finding record 1 marks the nodes holding it and centres the view on their centroid", async () => {
  const { page } = session.browser();
  const errors = recordPageErrors(page);
  await page.goto(`${session.preview().url}?probe`); // the graph probe is installed only with ?probe
  await page.getByTestId("node-count").waitFor();
  await settledNodes(page);
  expect(await probe(page, (g) => g.offset())).toEqual({ x: 0, y: 0 }); // a fresh fit
  await page.getByRole("searchbox", { name: "row to find" }).fill("1");
  await page.getByRole("button", { name: "Find" }).click();
  const text = (await page.getByTestId("find-row-result").textContent())!;
  const found = /^record 1 is in \d+ nodes?: ([\d, ]+)$/.exec(text);
  expect(found, text).not.toBeNull();
  const nodes = found![1]!.split(", ").map((k) => Number(k) - 1);
  await page.waitForTimeout(300);
  const positions = await probe(page, (g) => g.nodes());
  const box = (await page.getByTestId("graph-canvas").boundingBox())!;
  const chosen = positions.filter((p) => nodes.includes(p.node));
  const cx = chosen.reduce((s, p) => s + p.x, 0) / chosen.length;
  const cy = chosen.reduce((s, p) => s + p.y, 0) / chosen.length;
  expect(Math.abs(cx - box.width / 2)).toBeLessThan(0.5); // the centroid sits at the canvas centre (half a pixel: rounding of the box)
  expect(Math.abs(cy - box.height / 2)).toBeLessThan(0.5);
  const offset = await probe(page, (g) => g.offset());
  expect(await page.getByTestId("graph-canvas").getAttribute("data-offset")).toBe(`${offset.x},${offset.y}`);
  expect(offset).not.toEqual({ x: 0, y: 0 });
  await saveScreenshot(page, "regions-find-row");
  await page.getByRole("searchbox", { name: "row to find" }).fill("");
  await page.getByRole("button", { name: "Find" }).click();
  await expect(probe(page, (g) => g.offset())).resolves.toEqual({ x: 0, y: 0 }); // the search ended: back to the fitted view
  expect(errors).toEqual([]);
});
