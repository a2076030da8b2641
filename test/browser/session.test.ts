import { readFile } from "node:fs/promises";
import { strFromU8, unzipSync } from "fflate";
import { expect, it } from "vitest";
import { probe, settledNodes } from "./graphProbeSupport.ts";
import { recordPageErrors, recordRequests, saveScreenshot, useBrowserSession, type LaunchedBrowser } from "./harness.ts";

// The session kept in the page's IndexedDB: a reload brings back the same graph, colour, regions and
// selection; "Forget this session" brings back the demo with its defaults; undo and redo by button
// and key. The tests share one browser profile, so what the first keeps the second finds.

const session = useBrowserSession();
type Page = LaunchedBrowser["page"];

/** What a person would check after a reload: counts, colour, regions, selection, the exported tables. */
async function workbenchState(page: Page) {
  const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("button", { name: "Export tables (.zip)" }).click()]);
  const files = unzipSync(new Uint8Array(await readFile((await download.path())!)));
  return {
    nodes: await page.getByTestId("node-count").textContent(),
    edges: await page.getByTestId("edge-count").textContent(),
    radius: await page.locator("#radius-number").inputValue(),
    colour: await page.getByRole("combobox", { name: "Colour by" }).inputValue(),
    regions: await probe(page, (g) => g.regions()),
    selection: await probe(page, (g) => g.selection()),
    members: strFromU8(files["members.csv"]!),
    nodeTable: strFromU8(files["nodes.csv"]!),
  };
}

let defaults: Awaited<ReturnType<typeof workbenchState>> | null = null;

async function openWorkbench(page: Page): Promise<void> {
  await page.goto(`${session.preview().url}?probe`); // the graph probe is installed only with ?probe
  await page.getByTestId("node-count").waitFor();
  await expect.poll(() => page.getByTestId("session-restore").count(), { timeout: 60_000 }).toBe(0); // no restore under way
}

it("demo: after a new radius, colour, a named region and a selection, a reload brings back the same graph (members), colour, regions, selection and layout", async () => {
  const { page } = session.browser();
  const errors = recordPageErrors(page);
  const requests = recordRequests(page);
  await openWorkbench(page);
  await settledNodes(page);
  defaults = await workbenchState(page);

  const radius = Number(defaults.radius);
  await page.locator("#radius-number").fill(String(radius * 1.25));
  await page.locator("#radius-number").press("Enter");
  await page.waitForFunction((old) => document.querySelector("[data-testid=node-count]")?.textContent !== old, defaults.nodes);
  await page.getByRole("combobox", { name: "Colour by" }).selectOption("vibration_mm_s");
  const nodes = await settledNodes(page);
  // shift-click two nodes far apart (the first and the last in the probe's order) into the selection
  for (const n of [nodes[0]!, nodes[nodes.length - 1]!]) await page.getByTestId("graph-canvas").click({ position: { x: n.x, y: n.y }, modifiers: ["Shift"] });
  const chosen = await probe(page, (g) => g.selection());
  expect(chosen.length).toBeGreaterThan(0);
  await page.getByRole("button", { name: /Keep as region/ }).click();
  const name = page.getByRole("textbox", { name: "region name" });
  await name.fill("worn bearings");
  await name.press("Enter");
  await page.locator("body").click({ position: { x: 2, y: 2 } }); // leave the field
  await settledNodes(page);
  await page.waitForTimeout(1500); // the session is written 500 ms after the last change, and the layout on coming to rest
  const before = await workbenchState(page);
  const positionsBefore = await probe(page, (g) => g.nodes());
  expect(before.regions.map((r) => r.name)).toEqual(["worn bearings"]);
  expect(before.colour).toBe("vibration_mm_s");
  expect(before.nodes).not.toBe(defaults.nodes);

  await page.reload();
  await page.getByTestId("node-count").waitFor();
  await expect.poll(() => page.getByTestId("session-restore").count(), { timeout: 60_000 }).toBe(0);
  await expect.poll(() => probe(page, (g) => g?.selection() ?? []), { timeout: 60_000 }).toEqual(before.selection);
  await settledNodes(page);
  const after = await workbenchState(page);
  expect(after).toEqual(before);
  // the layout starts where it came to rest; the simulation's last steps may move a node by a little
  const positionsAfter = await probe(page, (g) => g.nodes());
  const drift = Math.max(...positionsAfter.map((p, k) => Math.hypot(p.x - positionsBefore[k]!.x, p.y - positionsBefore[k]!.y)));
  console.log(`largest node drift after the reload: ${drift.toFixed(2)} CSS px over ${positionsAfter.length} nodes`);
  expect(drift).toBeLessThan(3); // our tolerance: a node's smallest radius on screen, no source
  await saveScreenshot(page, "session-restored");
  expect(requests.external()).toEqual([]); // nothing is sent anywhere
  expect(errors).toEqual([]);
});

it("undo and redo by button and by key: back to the earlier radius's graph and forward again", async () => {
  const { page } = session.browser();
  const errors = recordPageErrors(page);
  await openWorkbench(page);
  const start = await page.getByTestId("node-count").textContent();
  const radius = await page.locator("#radius-number").inputValue();
  await page.locator("#radius-number").fill(String(Number(radius) * 1.5));
  await page.locator("#radius-number").press("Enter");
  await page.waitForFunction((old) => document.querySelector("[data-testid=node-count]")?.textContent !== old, start);
  const changed = await page.getByTestId("node-count").textContent();
  await expect.poll(() => page.getByRole("button", { name: "Undo" }).isEnabled()).toBe(true);
  await expect(page.getByRole("button", { name: "Redo" }).isDisabled()).resolves.toBe(true);
  await page.getByRole("button", { name: "Undo" }).click();
  await expect.poll(() => page.locator("#radius-number").inputValue()).toBe(radius);
  await expect.poll(() => page.getByTestId("node-count").textContent()).toBe(start);
  await page.locator("body").click({ position: { x: 2, y: 2 } }); // outside any text field, where Ctrl+Y is ours
  await page.keyboard.press("Control+y");
  await expect.poll(() => page.getByTestId("node-count").textContent()).toBe(changed);
  await page.keyboard.press("Control+z");
  await expect.poll(() => page.getByTestId("node-count").textContent()).toBe(start);
  await page.keyboard.press("Control+Shift+z");
  await expect.poll(() => page.getByTestId("node-count").textContent()).toBe(changed);
  expect(errors).toEqual([]);
});

it("forget this session (confirmed), reload: the demo with its defaults", async () => {
  const { page } = session.browser();
  const errors = recordPageErrors(page);
  await openWorkbench(page);
  expect(defaults).not.toBeNull();
  await page.getByText("Kept in this browser").click();
  await expect(page.getByTestId("session-notice").textContent()).resolves.toContain("Nothing is sent anywhere");
  await page.getByRole("button", { name: "Forget this session…" }).click();
  await page.getByRole("button", { name: "Forget", exact: true }).click();
  await page.getByTestId("nothing-kept").waitFor();
  await saveScreenshot(page, "session-forgotten");
  await page.reload();
  await page.getByTestId("node-count").waitFor();
  await settledNodes(page);
  expect(await workbenchState(page)).toEqual(defaults);
  expect(errors).toEqual([]);
});

// Invented rows for the file case: two clusters of 40 in (a, b), with a class column.
const fileRows = Array.from({ length: 80 }, (_, i) => `${((i % 8) + (i < 40 ? 0 : 20)) * 0.5},${(i % 5) * 0.7 + (i < 40 ? 0 : 9)},${i % 3}`);
const fileCsv = `a,b,class\n${fileRows.join("\n")}\n`;
const otherCsv = fileCsv.replace("\n0,0,0\n", "\n0,0,2\n"); // one cell differs, so another fingerprint

it("a file's session: the reload asks for the file by name and fingerprint; the same file restores it, another one warns with both fingerprints and applies on request", async () => {
  const { page } = session.browser();
  const errors = recordPageErrors(page);
  await openWorkbench(page);
  await page.getByTestId("file-input").setInputFiles({ name: "plots.csv", mimeType: "text/csv", buffer: Buffer.from(fileCsv) });
  await page.getByText("plots.csv").first().waitFor();
  await page.getByTestId("node-count").waitFor();
  const radius = Number(await page.locator("#radius-number").inputValue());
  const before = await page.getByTestId("node-count").textContent();
  await page.locator("#radius-number").fill(String(radius * 0.6));
  await page.locator("#radius-number").press("Enter");
  await page.waitForFunction((old) => document.querySelector("[data-testid=node-count]")?.textContent !== old, before);
  const kept = { radius: await page.locator("#radius-number").inputValue(), nodes: await page.getByTestId("node-count").textContent() };
  await page.waitForTimeout(1500); // written 500 ms after the last change

  await page.reload();
  const prompt = page.getByTestId("session-restore");
  await expect.poll(() => prompt.textContent(), { timeout: 30_000 }).toMatch(new RegExp(`^Open plots\\.csv \\(${Buffer.byteLength(fileCsv)} bytes, sha256 [0-9a-f]{12}\\) to restore the session`)); // the file's size under 1,000 bytes is shown in bytes
  await saveScreenshot(page, "session-asks-for-file");
  await page.getByTestId("session-file-input").setInputFiles({ name: "plots.csv", mimeType: "text/csv", buffer: Buffer.from(fileCsv) });
  await expect.poll(() => prompt.count(), { timeout: 60_000 }).toBe(0);
  await expect.poll(() => page.locator("#radius-number").inputValue()).toBe(kept.radius);
  await expect.poll(() => page.getByTestId("node-count").textContent()).toBe(kept.nodes);

  await page.reload();
  await page.getByTestId("session-file-input").waitFor({ state: "attached" });
  await page.getByTestId("session-file-input").setInputFiles({ name: "plots.csv", mimeType: "text/csv", buffer: Buffer.from(otherCsv) });
  const warning = page.getByTestId("session-restore").getByRole("alert");
  await warning.waitFor();
  const fingerprints = (await warning.locator("code").allTextContents());
  expect(fingerprints).toHaveLength(2);
  expect(fingerprints[0]).not.toBe(fingerprints[1]);
  fingerprints.forEach((f) => expect(f).toMatch(/^[0-9a-f]{64}$/));
  await saveScreenshot(page, "session-other-file");
  await page.getByRole("button", { name: "Apply the session anyway" }).click();
  await expect.poll(() => page.getByTestId("session-restore").count(), { timeout: 60_000 }).toBe(0);
  await expect.poll(() => page.locator("#radius-number").inputValue()).toBe(kept.radius);
  expect(errors).toEqual([]);
});
