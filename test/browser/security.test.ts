import { spawn } from "node:child_process";
import { readFile } from "node:fs/promises";
import { createServer } from "node:net";
import { expect, it } from "vitest";
import { contentSecurityPolicy } from "../../vite.config.ts";
import { dictionaryEncoded } from "../core/table/parquet/parquetVariants.ts";
import { recordPageErrors, recordRequests, saveScreenshot, settledNodePoint, useBrowserSession, type LaunchedBrowser } from "./harness.ts";

// The content security policy of the built page: present in dist/index.html and in the preview
// server's headers, refusing requests to any other origin, and quiet while the demo is used.

const session = useBrowserSession();

interface Violation {
  blockedURI: string;
  effectiveDirective: string;
  policy: "header" | "meta"; // only the header's policy has frame-ancestors
}

/** Records every securitypolicyviolation event of the page from its first script on. */
async function recordViolations(page: LaunchedBrowser["page"]): Promise<() => Promise<Violation[]>> {
  await page.addInitScript(() => {
    const seen: object[] = [];
    (window as unknown as { shoalViolations: object[] }).shoalViolations = seen;
    document.addEventListener("securitypolicyviolation", (event) =>
      seen.push({ blockedURI: event.blockedURI, effectiveDirective: event.effectiveDirective, policy: event.originalPolicy.includes("frame-ancestors") ? "header" : "meta" }),
    );
  });
  return () => page.evaluate(() => (window as unknown as { shoalViolations: Violation[] }).shoalViolations);
}

it("dist/index.html carries the policy in a meta tag before any script", async () => {
  const html = await readFile(new URL("../../dist/index.html", import.meta.url), "utf8");
  const meta = `<meta http-equiv="Content-Security-Policy" content="${contentSecurityPolicy}" />`;
  expect(html).toContain(meta);
  expect(html.indexOf(meta)).toBeLessThan(html.indexOf("<script"));
  expect(contentSecurityPolicy).toContain("connect-src 'self'");
});

it("the preview server sends the policy with frame-ancestors 'none', keeps the isolation headers, and the README gives that header", async () => {
  const response = await fetch(session.preview().url);
  await response.body?.cancel();
  expect(response.headers.get("content-security-policy")).toBe(`${contentSecurityPolicy}; frame-ancestors 'none'`);
  expect(response.headers.get("cross-origin-opener-policy")).toBe("same-origin");
  expect(response.headers.get("cross-origin-embedder-policy")).toBe("require-corp");
  const readme = await readFile(new URL("../../README.md", import.meta.url), "utf8");
  expect(readme).toContain(`Content-Security-Policy: ${response.headers.get("content-security-policy")}\n`); // the hosting section gives the same header
});

it("npm start's server (scripts/serve.mjs) sends the same policy header", async () => {
  const port = await new Promise<number>((resolve) => {
    const probe = createServer().listen(0, "127.0.0.1", () => {
      const address = probe.address();
      probe.close(() => resolve(typeof address === "object" && address ? address.port : 0));
    });
  });
  const child = spawn(process.execPath, ["scripts/serve.mjs"], { cwd: new URL("../..", import.meta.url), env: { ...process.env, PORT: String(port) }, stdio: ["ignore", "pipe", "pipe"] });
  try {
    const url = await new Promise<string>((resolve, reject) => {
      child.stdout.on("data", (chunk: Buffer) => {
        const found = /http:\/\/127\.0\.0\.1:\d+\//.exec(chunk.toString());
        if (found) resolve(found[0]);
      });
      child.once("exit", (code) => reject(new Error(`serve.mjs exited with ${code}`)));
    });
    const response = await fetch(url);
    await response.body?.cancel();
    expect(response.headers.get("content-security-policy")).toBe(`${contentSecurityPolicy}; frame-ancestors 'none'`);
  } finally {
    child.kill("SIGTERM");
  }
});

it("demo: loading, building, opening a node and exporting raise no policy violation and no request off 127.0.0.1", async () => {
  const { page } = session.browser();
  const violations = await recordViolations(page);
  const requests = recordRequests(page);
  const errors = recordPageErrors(page);
  await page.goto(session.preview().url);
  await page.getByTestId("node-count").waitFor();
  const point = await settledNodePoint(page);
  await page.getByTestId("graph-canvas").click({ position: point });
  await page.getByTestId("node-pane").waitFor();
  const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("button", { name: "Export tables (.zip)" }).click()]);
  expect((await download.path()) ?? "").not.toBe("");
  await saveScreenshot(page, "security-demo");
  expect(await violations()).toEqual([]);
  expect(requests.external()).toEqual([]);
  expect(errors).toEqual([]);
});

it("a fetch and an image to another origin are each refused by both the meta and the header policy", async () => {
  const { page } = session.browser();
  const violations = await recordViolations(page);
  await page.goto(session.preview().url);
  await page.getByTestId("node-count").waitFor();
  const outcome = await page.evaluate(async () => {
    const fetched = await fetch("http://127.0.0.2:9/table").then(
      () => "answered",
      (error: unknown) => `refused: ${String(error)}`,
    );
    const image = await new Promise<string>((resolve) => {
      const img = new Image();
      img.onload = () => resolve("loaded");
      img.onerror = () => resolve("refused");
      img.src = "http://127.0.0.2:9/pixel.png";
    });
    await new Promise((resolve) => setTimeout(resolve, 200)); // violation events are dispatched in a task of their own
    return { fetched, image };
  });
  expect(outcome.fetched).toMatch(/^refused: TypeError/);
  expect(outcome.image).toBe("refused");
  const order = (a: Violation, b: Violation): number => `${a.blockedURI} ${a.policy}`.localeCompare(`${b.blockedURI} ${b.policy}`);
  expect((await violations()).sort(order)).toEqual([
    { blockedURI: "http://127.0.0.2:9/pixel.png", effectiveDirective: "img-src", policy: "header" },
    { blockedURI: "http://127.0.0.2:9/pixel.png", effectiveDirective: "img-src", policy: "meta" },
    { blockedURI: "http://127.0.0.2:9/table", effectiveDirective: "connect-src", policy: "header" },
    { blockedURI: "http://127.0.0.2:9/table", effectiveDirective: "connect-src", policy: "meta" },
  ]);
});

it("in the worker under the policy, the Parquet fixture loads and a file with a 2^30-index run shows one error at once", async () => {
  const { page } = session.browser();
  const violations = await recordViolations(page);
  const errors = recordPageErrors(page);
  await page.goto(session.preview().url);
  await page.getByTestId("node-count").waitFor();
  const fixture = await readFile(new URL("../fixtures/mixed-columns.parquet", import.meta.url));
  await page.getByTestId("file-input").setInputFiles({ name: "mixed-columns.parquet", mimeType: "application/octet-stream", buffer: fixture });
  await page.getByText("mixed-columns.parquet").waitFor(); // a file with notices opens on its report
  await page.getByTestId("table-report").getByRole("rowheader", { name: "depth" }).waitFor();

  const hostile = dictionaryEncoded("GZIP", [0x80, 0x80, 0x80, 0x80, 0x08, 1]); // one RLE run header of 2^31: 2^30 copies
  const started = Date.now();
  await page.getByTestId("file-input").setInputFiles({ name: "hostile.parquet", mimeType: "application/octet-stream", buffer: Buffer.from(hostile) });
  const alert = page.getByRole("alert");
  await alert.waitFor();
  expect(Date.now() - started).toBeLessThan(5000); // one second in the reader, plus the browser's file and message round trip (our margin, no source)
  expect(await alert.textContent()).toMatch(/a run declares 1073741824 values where at most 4 fit/);
  await saveScreenshot(page, "security-hostile-parquet");
  expect(await violations()).toEqual([]);
  expect(errors).toEqual([]);
});
