import { mkdir, readFile, writeFile } from "node:fs/promises";
import { expect, it } from "vitest";
import { settledNodes } from "./graphProbeSupport.ts";
import { recordPageErrors, recordRequests, saveScreenshot, useBrowserSession, type LaunchedBrowser } from "./harness.ts";

// "Save picture" on the demo as a person uses it: open the form, save an SVG and a 2× PNG, and read
// them back. The SVG is parsed by the page's own DOMParser; node centres come from the read-only
// probe, window.shoalGraph (opened with ?probe, src/ui/graph/graphProbe.ts).

const session = useBrowserSession();
type Page = LaunchedBrowser["page"];

async function saveAs(page: Page, button: string): Promise<{ name: string; bytes: Buffer }> {
  const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("button", { name: button }).click()]);
  return { name: download.suggestedFilename(), bytes: await readFile((await download.path())!) };
}

interface ParsedPicture {
  readonly errors: number;
  readonly width: number;
  readonly height: number;
  readonly circles: { readonly x: number; readonly y: number }[];
  readonly caption: string[];
  readonly legend: string[];
}

it("demo: Save picture writes an SVG that parses, with one circle per node placed as on screen and the build's caption; a 2× PNG is twice its size", async () => {
  const { page } = session.browser();
  const requests = recordRequests(page);
  const errors = recordPageErrors(page);
  await page.goto(`${session.preview().url}?probe`);
  await page.getByTestId("node-count").waitFor();
  const nodeCount = Number((await page.getByTestId("node-count").textContent())!.replaceAll(",", ""));
  const onScreen = await settledNodes(page);

  await page.getByText("Save picture").click();
  await saveScreenshot(page, "picture-form");
  const svg = await saveAs(page, "Save SVG");
  expect(svg.name).toMatch(/^pump-fleet-graph-r[0-9.]+\.svg$/);
  const text = svg.bytes.toString("utf8");
  const parsed = (await page.evaluate((source: string) => {
    const document = new DOMParser().parseFromString(source, "image/svg+xml");
    const all = (selector: string): Element[] => Array.from(document.querySelectorAll(selector));
    return {
      errors: document.getElementsByTagName("parsererror").length,
      width: Number(document.documentElement.getAttribute("width")),
      height: Number(document.documentElement.getAttribute("height")),
      circles: all("g.nodes circle").map((c) => ({ x: Number(c.getAttribute("cx")), y: Number(c.getAttribute("cy")) })),
      caption: all("g.caption text").map((t) => t.textContent ?? ""),
      legend: all("g.legend text").map((t) => t.textContent ?? ""),
    };
  }, text)) as ParsedPicture;
  expect(parsed.errors).toBe(0);
  expect(parsed.circles.length).toBe(nodeCount);
  expect(parsed.caption[0]).toBe("file: pump-fleet.csv");
  expect(parsed.caption.join(" ")).toMatch(/features \(\d+\): age_years, /);
  expect(parsed.caption.join(" ")).toMatch(/scaling: zscore; metric: euclidean; radius: [\d.]+; landmarks: greedy-file-order, seed 1/);
  expect(parsed.caption.join(" ")).toContain(`nodes: ${nodeCount}; edges: `);
  expect(parsed.legend[0]).toMatch(/^Colour: /);

  // the picture is the view on screen, fitted to another frame: one scale and shift maps screen centres to the picture's (to its 0.01 px writing)
  const first = onScreen[0]!;
  const far = onScreen.reduce((best, n) => (Math.abs(n.x - first.x) > Math.abs(best.x - first.x) ? n : best));
  const scale = (parsed.circles[far.node]!.x - parsed.circles[first.node]!.x) / (far.x - first.x);
  for (const n of onScreen) {
    expect(Math.abs(parsed.circles[n.node]!.x - (parsed.circles[first.node]!.x + scale * (n.x - first.x)))).toBeLessThan(0.05); // our tolerance, no source: the SVG writes coordinates to 2 decimals (svgNumber), so each is off by up to 0.005, and the scale is taken from rounded ones
    expect(Math.abs(parsed.circles[n.node]!.y - (parsed.circles[first.node]!.y + scale * (n.y - first.y)))).toBeLessThan(0.05); // as above
  }

  await page.getByLabel("PNG").check();
  await page.getByLabel("pixel density").selectOption("2");
  await page.getByLabel("greyscale-safe").check();
  const png = await saveAs(page, "Save PNG");
  await mkdir("test-results", { recursive: true });
  await writeFile("test-results/picture-demo-grey@2x.png", png.bytes); // the saved picture itself, to look at
  expect(png.name).toMatch(/^pump-fleet-graph-r[0-9.]+-grey@2x\.png$/);
  expect(Array.from(png.bytes.subarray(0, 8))).toEqual([137, 80, 78, 71, 13, 10, 26, 10]); // the PNG signature, ISO/IEC 15948, 5.2
  expect([png.bytes.readUInt32BE(16), png.bytes.readUInt32BE(20)]).toEqual([2 * parsed.width, 2 * parsed.height]); // IHDR width and height, ISO/IEC 15948, 11.2.2
  expect(requests.external()).toEqual([]);
  expect(errors).toEqual([]);
});
