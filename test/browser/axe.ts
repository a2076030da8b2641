/**
 * axe-core (Deque, the open-source accessibility rules engine) in a page of the built app.
 *
 *   await expectNoAxeViolations(page, "demo graph"); // fails listing each violation: rule, impact, help, elements
 *
 * The page's Content-Security-Policy (script-src 'self') refuses an injected <script> with inline
 * content, so axe's source is evaluated through the DevTools protocol (page.evaluate), which the
 * policy does not govern; the page itself is not loosened. All of axe's default rules run (WCAG 2.0,
 * 2.1 and 2.2 A and AA, and its best practices).
 */
import axe from "axe-core";
import { expect } from "vitest";
import type { Page } from "playwright-core";

/** One violation as printed on failure: the rule, its impact, what it asks, and up to five offending elements. */
export interface AxeFinding {
  readonly rule: string;
  readonly impact: string | null;
  readonly help: string;
  readonly elements: readonly string[];
}

/** Runs axe on the page as it is now and returns its violations. */
export async function axeViolations(page: Page): Promise<AxeFinding[]> {
  if (!(await page.evaluate(() => "axe" in window))) await page.evaluate(axe.source);
  return page.evaluate(async () => {
    const engine = (window as unknown as { axe: typeof axe }).axe;
    const results = await engine.run(document, { resultTypes: ["violations"] });
    return results.violations.map((v) => ({
      rule: v.id,
      impact: v.impact ?? null,
      help: v.help,
      elements: v.nodes.slice(0, 5).map((n) => `${n.target.join(" ")}: ${n.failureSummary ?? ""}`.replace(/\s+/g, " ")),
    }));
  });
}

/** Fails, printing every violation, when axe finds any in the page's current state; `label` names the state. */
export async function expectNoAxeViolations(page: Page, label: string): Promise<void> {
  expect(await axeViolations(page), `axe violations in ${label}`).toEqual([]);
}
