import { readFile } from "node:fs/promises";
import { strFromU8, unzipSync } from "fflate";
import { expect, it } from "vitest";
import { buildCover, coverExports, parseCsvText, type CoverParams } from "../../src/core/index.ts";
import { recordPageErrors, recordRequests, saveScreenshot, useBrowserSession, type LaunchedBrowser } from "./harness.ts";

// End to end as a person would use it: open the workbench (demo table by default), wait for the
// worker's graph, click a node on the canvas, read its pane, export, and check the exported files
// against the core's own result for the same parameters.

const session = useBrowserSession();

/** CSS-pixel position of an opaque node pixel on the canvas, once the layout has settled. */
async function settledNodePoint(page: LaunchedBrowser["page"]): Promise<{ x: number; y: number }> {
  let previous = "";
  for (let attempt = 0; attempt < 40; ++attempt) {
    await page.waitForTimeout(500);
    const probe = await page.evaluate(() => {
      const canvas = document.querySelector<HTMLCanvasElement>("[data-testid=graph-canvas]")!;
      const context = canvas.getContext("2d")!;
      const { data, width, height } = context.getImageData(0, 0, canvas.width, canvas.height);
      let hash = 0;
      let found: { x: number; y: number } | null = null;
      for (let i = 0; i < data.length; i += 4 * 7) hash = (hash * 31 + data[i]! + data[i + 3]!) | 0;
      // a node interior: opaque and not the pale stroke colour; search from the centre outwards by rows
      for (let y = Math.floor(height / 2); y < height && !found; y += 3) {
        for (let x = 0; x < width; x += 3) {
          const p = (y * width + x) * 4;
          const [r, g, b, a] = [data[p]!, data[p + 1]!, data[p + 2]!, data[p + 3]!];
          if (a === 255 && !(r > 235 && g > 235 && b > 225)) {
            // require the pixel 2 px to the right and below to be opaque too, so it is inside a disc
            const q = ((y + 2) * width + x + 2) * 4;
            if (data[q + 3] === 255) {
              found = { x: (x + 2) / (canvas.width / canvas.clientWidth), y: (y + 2) / (canvas.height / canvas.clientHeight) };
              break;
            }
          }
        }
      }
      return { hash: String(hash), found };
    });
    if (probe.found && probe.hash === previous) return probe.found;
    previous = probe.hash;
  }
  throw new Error("the graph did not settle with a visible node");
}

it("demo: builds in the worker, a clicked node opens its pane, and the export equals the core's own result", async () => {
  const { page } = session.browser();
  const requests = recordRequests(page);
  const errors = recordPageErrors(page);
  await page.goto(session.preview().url);
  await page.getByText("invented demo data").waitFor();
  await page.getByTestId("node-count").waitFor();
  const nodeCount = Number((await page.getByTestId("node-count").textContent())!.replaceAll(",", ""));
  expect(nodeCount).toBeGreaterThanOrEqual(30); // the default-radius rule aims at 30–150 nodes on the demo
  expect(nodeCount).toBeLessThanOrEqual(150);

  const built = await page.getByText(/^Built in \d+ ms\.$/).textContent();
  console.log(`demo build in the worker at the default radius (request to answer): ${built}`);

  const point = await settledNodePoint(page);
  await page.getByTestId("graph-canvas").click({ position: point });
  const pane = page.getByTestId("node-pane");
  await pane.waitFor();
  const title = await pane.getByRole("heading").textContent();
  const openedNode = Number(title!.replace("Node ", ""));
  const paneSize = Number((await pane.getByTestId("node-size").textContent())!.replaceAll(",", ""));
  await saveScreenshot(page, "workbench-demo");

  const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("button", { name: "Export tables (.zip)" }).click()]);
  expect(download.suggestedFilename()).toMatch(/^pump-fleet-cover-r[0-9.]+\.zip$/);
  const files = unzipSync(new Uint8Array(await readFile((await download.path())!)));
  const text = (name: string): string => strFromU8(files[name]!);
  const summary = JSON.parse(text("summary.json"));
  expect(summary.nodes).toBe(nodeCount);

  // The same build in Node from the shipped demo file and the parameters the export reports.
  const csv = await readFile(new URL("../../public/demo/pump-fleet.csv", import.meta.url), "utf8");
  const table = parseCsvText(csv);
  const { idColumn, outcomes, ...params } = summary.params as CoverParams & { idColumn: string; outcomes: string[] };
  const expected = coverExports(table, buildCover(table, params), {
    fileName: "pump-fleet.csv",
    fileSize: Buffer.byteLength(csv),
    idColumn,
    outcomes,
  });
  expect(text("nodes.csv")).toBe(expected["nodes.csv"]);
  expect(text("members.csv")).toBe(expected["members.csv"]);
  expect(text("edges.csv")).toBe(expected["edges.csv"]);
  expect(summary).toEqual(JSON.parse(expected["summary.json"]));
  expect(idColumn).toBe("pump_id");

  // The pane's member count is the opened node's size in nodes.csv.
  const nodeLine = text("nodes.csv").split("\n").find((line) => line.startsWith(`${openedNode},`))!;
  expect(Number(nodeLine.split(",")[2])).toBe(paneSize);

  expect(requests.external()).toEqual([]);
  expect(errors).toEqual([]);
});
