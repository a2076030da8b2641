import { afterAll, beforeAll, expect, it } from "vitest";
import { launchBrowser, recordPageErrors, recordRequests, saveScreenshot, startPreview } from "./harness.ts";
import type { LaunchedBrowser, Preview } from "./harness.ts";

let preview: Preview | undefined;
let browser: LaunchedBrowser | undefined;

beforeAll(async () => {
  preview = await startPreview();
  browser = await launchBrowser();
});

afterAll(async () => {
  await browser?.close();
  await preview?.stop();
});

it("the built app opens with a title containing Shoal, throws nothing and requests only 127.0.0.1", async () => {
  const { page } = browser!;
  const requests = recordRequests(page);
  const errors = recordPageErrors(page);
  await page.goto(preview!.url);
  await page.waitForFunction(() => document.title.includes("Shoal"));
  await page.waitForLoadState("networkidle");
  await saveScreenshot(page, "smoke");
  expect(requests.external()).toEqual([]);
  expect(errors).toEqual([]);
});
