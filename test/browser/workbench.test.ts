import { readFile } from "node:fs/promises";
import { strFromU8, unzipSync } from "fflate";
import { expect, it } from "vitest";
import { buildCover, coverExports, parseCsvText, type CoverParams } from "../../src/core/index.ts";
import { recordPageErrors, recordRequests, saveScreenshot, settledNodePoint, useBrowserSession } from "./harness.ts";

// End to end as a person would use it: open the workbench (demo table by default), wait for the
// worker's graph, click a node on the canvas, read its pane, export, and check the exported files
// against the core's own result for the same parameters.

const session = useBrowserSession();

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
    reading: { format: "delimited", delimiter: "comma", decimal: ".", ragged: "reject" }, // the demo file: commas and decimal points, detected
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
