import { expect, it } from "vitest";
import { recordPageErrors, recordRequests, saveScreenshot, useBrowserSession } from "./harness.ts";

const session = useBrowserSession();

it("the built app opens with a title containing Shoal, throws nothing and requests only 127.0.0.1", async () => {
  const { page } = session.browser();
  const requests = recordRequests(page);
  const errors = recordPageErrors(page);
  await page.goto(session.preview().url);
  await page.waitForFunction(() => document.title.includes("Shoal"));
  await page.waitForLoadState("networkidle");
  await saveScreenshot(page, "smoke");
  expect(requests.external()).toEqual([]);
  expect(errors).toEqual([]);
});
