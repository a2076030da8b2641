import { mkdtemp, readFile, rm, writeFile } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { strFromU8, unzipSync } from "fflate";
import { afterAll, expect, it } from "vitest";
import { demoPath, runShoal } from "../cli/runShoal.ts";
import { recordPageErrors, saveScreenshot, settledNodePoint, useBrowserSession } from "./harness.ts";

// The round trip: in Chromium, load the demo, change the metric and the radius, keep and name a
// region, save the recipe and export the zip; then run the headless command with that recipe on
// the demo file and compare the tables byte for byte (summary.json apart from the command's timings).

const session = useBrowserSession();
let scratch = "";
afterAll(async () => {
  if (scratch) await rm(scratch, { recursive: true, force: true });
});

it("demo → workbench recipe → shoal build --recipe gives the workbench's nodes.csv, members.csv, edges.csv and summary.json", async () => {
  scratch = await mkdtemp(join(tmpdir(), "shoal-recipe-browser-"));
  const { page } = session.browser();
  const errors = recordPageErrors(page);
  await page.goto(session.preview().url);
  await page.getByTestId("node-count").waitFor();

  await page.getByLabel("Metric").selectOption("manhattan");
  await page.waitForFunction(() => (document.querySelector("#radius-number") as HTMLInputElement).value !== "0.417"); // the default rule's radius under manhattan replaces the demo's
  await page.locator("#radius-number").fill("1.9");
  await page.locator("#radius-number").press("Enter");
  await page.waitForFunction(() => !document.querySelector("[data-testid=build-progress]"));
  await page.waitForTimeout(300);

  const point = await settledNodePoint(page);
  await page.getByTestId("graph-canvas").click({ position: point, modifiers: ["Shift"] });
  await page.getByTestId("node-pane").waitFor();
  await page.getByRole("button", { name: /Keep as region/ }).first().click();
  const name = page.getByLabel("region name");
  await name.fill("east wing");
  await name.press("Enter");
  await page.waitForTimeout(200);

  const [recipeDownload] = await Promise.all([page.waitForEvent("download"), page.getByRole("button", { name: "Save recipe" }).click()]);
  expect(recipeDownload.suggestedFilename()).toBe("pump-fleet.recipe.json");
  const recipeText = await readFile((await recipeDownload.path())!, "utf8");
  const recipe = JSON.parse(recipeText);
  expect(recipe).toMatchObject({ metric: "manhattan", radius: 1.9, input: { name: "pump-fleet.csv" } });
  expect(recipe.regions.map((r: { name: string }) => r.name)).toEqual(["east wing"]);

  const [zipDownload] = await Promise.all([page.waitForEvent("download"), page.getByRole("button", { name: /Export tables/ }).click()]);
  const zip = unzipSync(new Uint8Array(await readFile((await zipDownload.path())!)));
  expect(strFromU8(zip["recipe.json"]!)).toBe(recipeText);
  await saveScreenshot(page, "recipe-saved");

  const recipePath = join(scratch, "recipe.json");
  await writeFile(recipePath, recipeText);
  const outDir = join(scratch, "out");
  const run = await runShoal(["build", demoPath, "--recipe", recipePath, "--out", outDir]);
  expect(run.stderr).toBe("");
  expect(run.code).toBe(0);
  for (const file of ["nodes.csv", "members.csv", "edges.csv"]) expect(await readFile(join(outDir, file), "utf8")).toBe(strFromU8(zip[file]!));
  const { timingsMs: _timings, ...headless } = JSON.parse(await readFile(join(outDir, "summary.json"), "utf8"));
  expect(headless).toEqual(JSON.parse(strFromU8(zip["summary.json"]!)));
  expect(errors).toEqual([]);
});

it("Open recipe… applies a recipe to the demo; one made on other bytes waits for Apply anyway", async () => {
  const { page } = session.browser();
  await page.goto(session.preview().url);
  await page.getByTestId("node-count").waitFor();
  const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("button", { name: "Save recipe" }).click()]);
  const recipe = JSON.parse(await readFile((await download.path())!, "utf8"));

  const changed = join(scratch, "changed.json");
  await writeFile(changed, JSON.stringify({ ...recipe, metric: "chebyshev", radius: 0.8 }));
  await page.getByTestId("recipe-input").setInputFiles(changed);
  await page.getByTestId("recipe-status").waitFor();
  expect(await page.locator("#radius-number").inputValue()).toBe("0.8");
  expect(await page.getByLabel("Metric").inputValue()).toBe("chebyshev");

  const other = join(scratch, "other.json");
  await writeFile(other, JSON.stringify({ ...recipe, radius: 0.6, input: { ...recipe.input, sha256: "0".repeat(64) } }));
  await page.getByTestId("recipe-input").setInputFiles(other);
  const warning = page.getByTestId("recipe-other-file");
  await warning.waitFor();
  expect(await warning.textContent()).toContain(`sha256 ${"0".repeat(64)}`);
  expect(await warning.textContent()).toContain(`sha256 ${recipe.input.sha256}`);
  await saveScreenshot(page, "recipe-other-file");
  expect(await page.locator("#radius-number").inputValue()).toBe("0.8");
  await page.getByRole("button", { name: "Apply anyway" }).click();
  await page.getByTestId("recipe-status").waitFor();
  expect(await page.locator("#radius-number").inputValue()).toBe("0.6");
});
