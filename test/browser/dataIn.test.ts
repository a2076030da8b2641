import { readFile } from "node:fs/promises";
import { strFromU8, unzipSync } from "fflate";
import { expect, it } from "vitest";
import { buildCover, coverExports, readTableText, type CoverParams } from "../../src/core/index.ts";
import { recordPageErrors, recordRequests, saveScreenshot, useBrowserSession } from "./harness.ts";

// A person drops a semicolon-separated file with decimal commas and a byte-order mark, reads the
// column report, makes one column an outcome, builds, and exports; the export must equal the
// core's own result for the same text and parameters.

const session = useBrowserSession();

// Invented rows: two clusters of 30 in (depth, temperature), a score, a unique code and a site.
const rows = Array.from({ length: 60 }, (_, i) => {
  const cluster = i < 30 ? 0 : 1;
  const depth = (cluster * 8 + (i % 6) * 0.5).toFixed(1).replace(".", ",");
  const temp = (10 + cluster * 5 + (i % 5) * 0.25).toFixed(2).replace(".", ",");
  return `S-${String(i + 1).padStart(3, "0")};${depth};${temp};${i % 7};${cluster ? "east" : "west"}`;
});
const csv = `\uFEFFcode;depth_m;temp_c;score;site\n${rows.join("\n")}\n`;

it("dropping a ';' file with decimal commas and a BOM shows the report; making score an outcome rebuilds; the export equals the core's", async () => {
  const { page } = session.browser();
  const requests = recordRequests(page);
  const errors = recordPageErrors(page);
  await page.goto(session.preview().url);
  await page.getByTestId("node-count").waitFor(); // the demo is up first

  const transfer = await page.evaluateHandle((text) => {
    const data = new DataTransfer();
    data.items.add(new File([text], "wells.csv", { type: "text/csv" }));
    return data;
  }, csv);
  await page.dispatchEvent("body", "dragover", { dataTransfer: transfer });
  await page.dispatchEvent("body", "drop", { dataTransfer: transfer });
  await page.getByText("wells.csv").waitFor();

  await page.getByRole("button", { name: "Table report" }).click();
  const report = page.getByTestId("table-report");
  await report.waitFor();
  await expect.poll(() => report.getByRole("combobox", { name: "Decimal mark" }).textContent()).toContain("detected: comma");
  const depthRow = report.getByRole("row", { name: /^depth_m numeric/ });
  expect(await depthRow.count()).toBe(1);
  await saveScreenshot(page, "data-in-report");

  await page.getByRole("combobox", { name: "role of score" }).selectOption("outcome");
  await page.getByRole("button", { name: "Back to the graph" }).click();
  await expect.poll(async () => (await page.getByTestId("node-count").textContent()) ?? "").toMatch(/^\d+$/);

  const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("button", { name: "Export tables (.zip)" }).click()]);
  const files = unzipSync(new Uint8Array(await readFile((await download.path())!)));
  const text = (name: string): string => strFromU8(files[name]!);
  const summary = JSON.parse(text("summary.json"));
  expect(summary.params.features).toEqual(["depth_m", "temp_c"]); // score became an outcome; code and site are text
  expect(summary.params.outcomes).toEqual(["score"]);
  expect(summary.params.idColumn).toBe("code");

  const { table } = readTableText(csv.slice(1));
  const { idColumn, outcomes, ...params } = summary.params as CoverParams & { idColumn: string; outcomes: string[] };
  const expected = coverExports(table, buildCover(table, params), { fileName: "wells.csv", fileSize: Buffer.byteLength(csv), idColumn, outcomes });
  expect(text("nodes.csv")).toBe(expected["nodes.csv"]);
  expect(text("members.csv")).toBe(expected["members.csv"]);
  expect(text("edges.csv")).toBe(expected["edges.csv"]);
  expect(text("members.csv").split("\n")[1]).toMatch(/^1,1,S-001$/); // node 1's first member is data record 1
  await saveScreenshot(page, "data-in-graph");
  expect(requests.external()).toEqual([]);
  expect(errors).toEqual([]);
});
