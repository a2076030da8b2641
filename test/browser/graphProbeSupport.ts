import type { GraphProbe } from "../../src/ui/graph/graphProbe.ts";
import type { LaunchedBrowser } from "./harness.ts";

// Reading the page's graph probe, window.shoalGraph (installed when the page is opened with
// ?probe; src/ui/graph/graphProbe.ts), from the browser tests.

type Page = LaunchedBrowser["page"];

/** Runs `read` on the page's probe and returns its result (the function is sent as text). */
export const probe = <T>(page: Page, read: (graph: GraphProbe) => T): Promise<T> =>
  page.evaluate(`(${read.toString()})(window.shoalGraph)`) as Promise<T>;

/** Node centres, in CSS pixels of the canvas, once the layout has stopped moving (two reads 600 ms apart agree). */
export async function settledNodes(page: Page): Promise<{ node: number; x: number; y: number }[]> {
  let previous = "";
  for (let attempt = 0; attempt < 60; ++attempt) {
    await page.waitForTimeout(600);
    const nodes = await probe(page, (g) => (g?.nodes() ?? []).map(({ node, x, y }) => ({ node, x, y })));
    const text = JSON.stringify(nodes);
    if (nodes.length > 0 && text === previous) return nodes;
    previous = text;
  }
  throw new Error("the layout did not settle");
}
