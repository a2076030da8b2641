import { expect, it } from "vitest";
import { assertClose } from "../assertClose.ts";
import { probe, settledNodes } from "./graphProbeSupport.ts";
import { recordPageErrors, saveScreenshot, useBrowserSession, type LaunchedBrowser } from "./harness.ts";

// Moving through the demo's graph: wheel zoom about the pointer, pan by dragging empty space, Fit,
// and keyboard focus moving to neighbours. Node centres, the view and the edges come from the
// page's read-only probe, window.shoalGraph (opened with ?probe), in CSS pixels of the canvas.

const session = useBrowserSession();
type Page = LaunchedBrowser["page"];
type NodePoint = { node: number; x: number; y: number };

async function openDemo(page: Page): Promise<NodePoint[]> {
  await page.goto(`${session.preview().url}?probe`); // the graph probe is installed only with ?probe
  await page.getByTestId("node-count").waitFor();
  return settledNodes(page);
}

/** The graph's neighbours by the rule the arrow keys follow, worked out here independently: smallest angle on screen strictly below 90°, ties to the lower node. */
function expectedNeighbour(from: NodePoint, nodes: readonly NodePoint[], edges: readonly [number, number][], arrowAngle: number): number | null {
  const neighbours = edges.flatMap(([a, b]) => (a === from.node ? [b] : b === from.node ? [a] : []));
  let best: { node: number; difference: number } | null = null;
  for (const node of [...new Set(neighbours)].sort((a, b) => a - b)) {
    const p = nodes.find((n) => n.node === node)!;
    if (p.x === from.x && p.y === from.y) continue;
    let difference = Math.abs(Math.atan2(p.y - from.y, p.x - from.x) - arrowAngle);
    if (difference > Math.PI) difference = 2 * Math.PI - difference;
    if (difference >= Math.PI / 2 - 1e-9) continue; // exactly 90° is out (the margin only guards float noise; the demo's angles are far from it)
    if (!best || difference < best.difference - 1e-12) best = { node, difference };
  }
  return best?.node ?? null;
}

it("demo: the wheel zooms about the pointer (k × 2^0.6 for 300 px, the node under the pointer stays under it), a drag on empty space pans every node by the drag, and Fit brings every node back into view", async () => {
  const { page } = session.browser();
  const errors = recordPageErrors(page);
  const nodes = await openDemo(page);
  const box = (await page.getByTestId("graph-canvas").boundingBox())!;
  const before = (await probe(page, (g) => g.view()))!;
  expect(await probe(page, (g) => g.fitted())).toBe(true);
  // the pointer on a whole page pixel near the middle node (so the event's position is exact)
  const target = nodes.reduce((a, b) => (Math.hypot(b.x - box.width / 2, b.y - box.height / 2) < Math.hypot(a.x - box.width / 2, a.y - box.height / 2) ? b : a));
  const mouse = { x: Math.round(box.x + target.x), y: Math.round(box.y + target.y) };
  const pointer = { x: mouse.x - box.x, y: mouse.y - box.y };
  await page.mouse.move(mouse.x, mouse.y);
  await page.mouse.wheel(0, -300);
  await expect.poll(() => probe(page, (g) => g.view()!.k)).not.toBe(before.k);
  const zoomed = (await probe(page, (g) => g.view()))!;
  assertClose(zoomed.k / before.k, 2 ** 0.6, { relative: 1e-9 }); // 2^(300 · 0.002), d3-zoom's default wheel delta, worked by hand
  const afterZoom = await probe(page, (g) => g.nodes());
  const moved = afterZoom.find((n) => n.node === target.node)!;
  // the world point under the pointer stays there, so the node's centre moves straight away from the pointer by the zoom ratio
  const ratio = zoomed.k / before.k;
  assertClose({ x: moved.x, y: moved.y }, { x: pointer.x + ratio * (target.x - pointer.x), y: pointer.y + ratio * (target.y - pointer.y) }, { absolute: 1e-6 });
  expect(Math.hypot(moved.x - pointer.x, moved.y - pointer.y)).toBeLessThan(Math.hypot(box.width, box.height) / 20); // still under the pointer
  expect(await probe(page, (g) => g.fitted())).toBe(false);

  // pan: drag from the top-left corner, inside the fit's margin (no node there), by (120, 80)
  const start = { x: Math.round(box.x) + 4, y: Math.round(box.y) + 4 };
  const hit = await probe(page, (g) => g.nodes());
  await page.mouse.move(start.x, start.y);
  await page.mouse.down();
  await page.mouse.move(start.x + 120, start.y + 80, { steps: 10 });
  await page.mouse.up();
  await page.waitForTimeout(100);
  const panned = await probe(page, (g) => g.nodes());
  assertClose(panned.map((n) => [n.x, n.y]), hit.map((n) => [n.x + 120, n.y + 80]), { absolute: 1e-6 });
  expect(await probe(page, (g) => g.selection())).toEqual([]); // a pan is not a lasso
  await saveScreenshot(page, "graph-nav-zoomed-panned");

  // zoom far in, so most nodes leave the canvas, then Fit (button) brings them all back inside
  for (let k = 0; k < 4; ++k) await page.mouse.wheel(0, -500);
  await page.waitForTimeout(100);
  const inside = (n: { x: number; y: number }): boolean => n.x >= 0 && n.y >= 0 && n.x <= box.width && n.y <= box.height;
  expect((await probe(page, (g) => g.nodes())).every(inside)).toBe(false);
  await page.getByRole("button", { name: /^Fit/ }).click();
  await page.waitForTimeout(100);
  expect(await probe(page, (g) => g.fitted())).toBe(true);
  const fitted = await probe(page, (g) => g.nodes());
  expect(fitted.every(inside)).toBe(true);
  assertClose((await probe(page, (g) => g.view()))!, before, { absolute: 1e-9 }); // the same fit as at the start: the layout has not moved
  expect(errors).toEqual([]);
});

it("demo: with the canvas focused, an arrow key moves focus to the neighbour closest in angle, the live region says so, and Enter opens it", async () => {
  const { page } = session.browser();
  const errors = recordPageErrors(page);
  const nodes = await openDemo(page);
  const edges = await probe(page, (g) => g.edges());
  const canvas = page.getByTestId("graph-canvas");
  await canvas.focus();
  await expect.poll(() => probe(page, (g) => g.focused())).not.toBeNull();
  let focused = (await probe(page, (g) => g.focused()))!;
  const live = page.getByTestId("graph-focus-announcement");
  await expect.poll(() => live.textContent()).toMatch(new RegExp(`^node ${focused + 1}, `));

  // walk: each step, the first arrow (right, down, left, up) that has a neighbour in its direction
  const arrows = [["ArrowRight", 0], ["ArrowDown", Math.PI / 2], ["ArrowLeft", Math.PI], ["ArrowUp", -Math.PI / 2]] as const;
  let steps = 0;
  for (let step = 0; step < 4; ++step) {
    const positions = await probe(page, (g) => g.nodes());
    const from = positions.find((n) => n.node === focused)!;
    const choice = arrows.map(([key, angle]) => ({ key, next: expectedNeighbour(from, positions, edges, angle) })).find((c) => c.next !== null);
    if (!choice) break; // a node without neighbours: nowhere to go
    const said = await live.textContent();
    await page.keyboard.press(choice.key);
    await expect.poll(() => probe(page, (g) => g.focused())).toBe(choice.next);
    await expect.poll(() => live.textContent()).toMatch(new RegExp(`^node ${choice.next! + 1}, \\d+ rows?, .*\\d+ neighbours?$`));
    if (choice.next !== focused) expect(await live.textContent()).not.toBe(said);
    focused = choice.next!;
    ++steps;
  }
  expect(steps).toBeGreaterThan(0); // the demo's graph has edges
  // an arrow with no neighbour in its direction leaves focus where it is
  const positions = await probe(page, (g) => g.nodes());
  const from = positions.find((n) => n.node === focused)!;
  const stuck = arrows.find(([, angle]) => expectedNeighbour(from, positions, edges, angle) === null);
  if (stuck) {
    await page.keyboard.press(stuck[0]);
    await page.waitForTimeout(100);
    expect(await probe(page, (g) => g.focused())).toBe(focused);
  }
  await saveScreenshot(page, "graph-nav-keyboard-focus");
  await page.keyboard.press("Enter");
  await expect.poll(() => page.locator("#node-title").textContent()).toBe(`Node ${focused + 1}`);
  expect(nodes.length).toBeGreaterThan(1);
  expect(errors).toEqual([]);
});

it("demo: dragging a node pins it where it was dropped; a colour change moves nothing; a new layout keeps it in place; Unpin all lets go", async () => {
  const { page } = session.browser();
  const errors = recordPageErrors(page);
  const nodes = await openDemo(page);
  const box = (await page.getByTestId("graph-canvas").boundingBox())!;
  const target = nodes.reduce((a, b) => (Math.hypot(b.x - box.width / 2, b.y - box.height / 2) < Math.hypot(a.x - box.width / 2, a.y - box.height / 2) ? b : a));
  const from = { x: Math.round(box.x + target.x), y: Math.round(box.y + target.y) };
  const to = { x: Math.round(box.x + 40), y: Math.round(box.y + 40) };
  await page.mouse.move(from.x, from.y);
  await page.mouse.down();
  await page.mouse.move(to.x, to.y, { steps: 15 });
  await page.mouse.up();
  const afterDrag = await settledNodes(page);
  const view = (await probe(page, (g) => g.view()))!;
  const pinned = await probe(page, (g) => g.nodes().filter((n) => n.pinned).map((n) => n.node));
  expect(pinned).toEqual([target.node]);
  const dropped = afterDrag.find((n) => n.node === target.node)!;
  assertClose(dropped, { node: target.node, x: to.x - box.x, y: to.y - box.y }, { absolute: 1e-6 }); // held under the pointer where it was let go
  await expect.poll(() => page.getByRole("button", { name: /^Unpin all/ }).textContent()).toBe("Unpin all (1)");

  // a colour change redraws, and neither restarts the layout nor moves a node
  await page.locator(".legend select").first().selectOption("age_years");
  await page.waitForTimeout(800);
  expect(await probe(page, (g) => g.nodes().map(({ node, x, y }) => ({ node, x, y })))).toEqual(afterDrag);
  expect(await probe(page, (g) => g.view())).toEqual(view);

  // a new layout starts from another spiral order; the pinned node keeps its place in the layout (its world point)
  const worldOf = (p: { x: number; y: number }, v: { k: number; x: number; y: number }): { x: number; y: number } => ({ x: (p.x - v.x) / v.k, y: (p.y - v.y) / v.k });
  await page.getByRole("button", { name: /^New layout/ }).click();
  const relaid = await settledNodes(page);
  const relaidView = (await probe(page, (g) => g.view()))!;
  assertClose(worldOf(relaid.find((n) => n.node === target.node)!, relaidView), worldOf(dropped, view), { absolute: 1e-6 });
  expect(relaid.map((n) => worldOf(n, relaidView))).not.toEqual(afterDrag.map((n) => worldOf(n, view)));
  expect(await probe(page, (g) => g.nodes().filter((n) => n.pinned).map((n) => n.node))).toEqual([target.node]);
  await saveScreenshot(page, "graph-nav-pinned-new-layout");

  await page.getByRole("button", { name: /^Unpin all/ }).click();
  expect(await probe(page, (g) => g.nodes().filter((n) => n.pinned).length)).toBe(0);
  expect(await page.getByRole("button", { name: /^Unpin all/ }).isDisabled()).toBe(true);
  expect(errors).toEqual([]);
});

it("demo: two touch pointers spreading from 100 px to 200 px apart double the scale and keep the world point under their midpoint", async () => {
  const { page } = session.browser();
  const errors = recordPageErrors(page);
  await openDemo(page);
  const before = (await probe(page, (g) => g.view()))!;
  const box = (await page.getByTestId("graph-canvas").boundingBox())!;
  // two fingers, scripted as pointer events on the canvas (the harness has no multi-touch input)
  await page.evaluate(`(() => {
    const canvas = document.querySelector("[data-testid=graph-canvas]");
    const rect = canvas.getBoundingClientRect();
    const at = (id, type, x, y) => canvas.dispatchEvent(new PointerEvent(type, {
      pointerId: id, pointerType: "touch", isPrimary: id === 1, buttons: type === "pointerup" ? 0 : 1, clientX: rect.left + x, clientY: rect.top + y, bubbles: true, cancelable: true,
    }));
    const cx = rect.width / 2;
    const cy = rect.height / 2;
    at(1, "pointerdown", cx - 50, cy);
    at(2, "pointerdown", cx + 50, cy);
    for (let step = 1; step <= 10; ++step) {
      at(1, "pointermove", cx - 50 - 5 * step, cy);
      at(2, "pointermove", cx + 50 + 5 * step, cy);
    }
    at(1, "pointerup", cx - 100, cy);
    at(2, "pointerup", cx + 100, cy);
  })()`);
  await page.waitForTimeout(100);
  const after = (await probe(page, (g) => g.view()))!;
  assertClose(after.k, 2 * before.k); // 200 px / 100 px, worked by hand
  const middle = { x: box.width / 2, y: box.height / 2 };
  assertClose({ x: (middle.x - after.x) / after.k, y: (middle.y - after.y) / after.k }, { x: (middle.x - before.x) / before.k, y: (middle.y - before.y) / before.k }, { absolute: 1e-9 });
  expect(await probe(page, (g) => g.selection())).toEqual([]);
  expect(errors).toEqual([]);
});
