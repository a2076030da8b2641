/**
 * Helpers for browser tests: they drive the built app (dist/, from `npm run build`) in Debian's
 * Chromium through playwright-core. Nothing here builds; `npm test` builds before it runs these.
 *
 *   const preview = await startPreview();          // { url, stop } — vite preview on a free port
 *   const browser = await launchBrowser();         // { context, page, close } — fresh profile
 *   const requests = recordRequests(browser.page); // before page.goto, so nothing is missed
 *   const errors = recordPageErrors(browser.page); // uncaught exceptions and console.error text
 *   await browser.page.goto(preview.url);
 *   expect(requests.external()).toEqual([]);       // every request stayed on 127.0.0.1
 *   await saveScreenshot(browser.page, "name");    // test-results/name.png — open it and look
 *   await browser.close(); await preview.stop();   // in afterAll; both are safe to call twice
 *
 * Downloads are accepted: `const download = await Promise.all([page.waitForEvent("download"),
 * page.click(...)])` then `download.path()`. Environment: SHOAL_CHROMIUM overrides
 * /usr/bin/chromium; SHOAL_DIST serves another built directory instead of dist/.
 */
import { spawn } from "node:child_process";
import { existsSync } from "node:fs";
import { mkdir, mkdtemp, rm } from "node:fs/promises";
import { createServer } from "node:net";
import { tmpdir } from "node:os";
import { join, resolve } from "node:path";
import { fileURLToPath } from "node:url";
import { chromium } from "playwright-core";
import { afterAll, beforeAll } from "vitest";
import type { BrowserContext, Page } from "playwright-core";

const root = fileURLToPath(new URL("../..", import.meta.url));
const host = "127.0.0.1";

export interface Preview {
  url: string; // ends with "/"
  stop(): Promise<void>;
}

export interface StartPreviewOptions {
  outDir?: string; // built app to serve; default $SHOAL_DIST or dist/
  timeoutMs?: number;
}

/** Serves a built app with `vite preview` (vite.config.ts headers apply) on a free local port. */
export async function startPreview(options: StartPreviewOptions = {}): Promise<Preview> {
  const outDir = resolve(root, options.outDir ?? process.env.SHOAL_DIST ?? "dist");
  const timeoutMs = options.timeoutMs ?? 30_000;
  if (!existsSync(join(outDir, "index.html"))) {
    throw new Error(`no built app at ${outDir}: run \`npm run build\` first`);
  }
  // Another process may take the free port before vite binds it; --strictPort then fails fast.
  let lastError: unknown;
  for (let attempt = 0; attempt < 3; ++attempt) {
    try {
      return await servePreview(outDir, await freePort(), timeoutMs);
    } catch (error) {
      lastError = error;
    }
  }
  throw lastError;
}

async function servePreview(outDir: string, port: number, timeoutMs: number): Promise<Preview> {
  const vite = join(root, "node_modules/.bin/vite");
  const args = ["preview", "--port", String(port), "--strictPort", "--host", host, "--outDir", outDir];
  const child = spawn(vite, args, { cwd: root, stdio: ["ignore", "pipe", "pipe"] });
  let output = "";
  child.stdout.on("data", (chunk: Buffer) => (output += chunk.toString()));
  child.stderr.on("data", (chunk: Buffer) => (output += chunk.toString()));
  const exited = new Promise<void>((resolveExit) => child.once("exit", () => resolveExit()));
  // A crashed test run must not leave the server holding its port.
  const killOnExit = () => child.kill("SIGKILL");
  process.once("exit", killOnExit);

  const stop = async () => {
    process.off("exit", killOnExit);
    if (child.exitCode !== null || child.signalCode !== null) return;
    child.kill("SIGTERM");
    const timer = setTimeout(() => child.kill("SIGKILL"), 5_000);
    await exited;
    clearTimeout(timer);
  };

  const url = `http://${host}:${port}/`;
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) {
      await stop();
      throw new Error(`vite preview exited with ${child.exitCode} on port ${port}:\n${output}`);
    }
    if (await answers(url)) return { url, stop };
    await new Promise((r) => setTimeout(r, 100));
  }
  await stop();
  throw new Error(`vite preview did not answer at ${url} within ${timeoutMs} ms:\n${output}`);
}

async function answers(url: string): Promise<boolean> {
  try {
    const response = await fetch(url, { signal: AbortSignal.timeout(1_000) });
    await response.body?.cancel();
    return response.ok;
  } catch {
    return false;
  }
}

function freePort(): Promise<number> {
  return new Promise((resolvePort, reject) => {
    const server = createServer();
    server.once("error", reject);
    server.listen(0, host, () => {
      const address = server.address();
      server.close(() => {
        if (typeof address === "object" && address) resolvePort(address.port);
        else reject(new Error(`unexpected server address: ${String(address)}`));
      });
    });
  });
}

export interface LaunchedBrowser {
  context: BrowserContext;
  page: Page; // the context's first tab; open more with context.newPage()
  close(): Promise<void>;
}

// The machines have no network and run as root; these keep Chromium from phoning home.
export const chromiumArgs = [
  "--headless",
  "--no-sandbox",
  "--disable-gpu",
  "--disable-quic",
  "--disable-background-networking",
  "--disable-component-update",
  "--disable-sync",
  "--no-first-run",
] as const;

/** Debian's Chromium with a fresh temporary profile (removed on close) and downloads accepted. */
export async function launchBrowser(): Promise<LaunchedBrowser> {
  const executablePath = process.env.SHOAL_CHROMIUM || "/usr/bin/chromium";
  if (!existsSync(executablePath)) {
    throw new Error(`no chromium at ${executablePath}: install the Debian package chromium or set SHOAL_CHROMIUM`);
  }
  const userDataDir = await mkdtemp(join(tmpdir(), "shoal-chromium-"));
  let context: BrowserContext;
  try {
    context = await chromium.launchPersistentContext(userDataDir, {
      executablePath,
      headless: true,
      args: [...chromiumArgs],
      acceptDownloads: true,
      viewport: { width: 1280, height: 800 },
    });
  } catch (error) {
    await rm(userDataDir, { recursive: true, force: true });
    throw error;
  }
  const page = context.pages()[0] ?? (await context.newPage());
  let closed = false;
  const close = async () => {
    if (closed) return;
    closed = true;
    await context.close();
    await rm(userDataDir, { recursive: true, force: true });
  };
  return { context, page, close };
}

export interface RequestLog {
  urls: string[]; // every request URL in order, including ignored schemes
  external(): string[]; // those that left 127.0.0.1
}

const localSchemes = new Set(["data:", "blob:", "about:"]); // never touch the network

/** Records every request of the page's context (its tabs and their workers) from now on. */
export function recordRequests(page: Page): RequestLog {
  const urls: string[] = [];
  page.context().on("request", (request) => urls.push(request.url()));
  return { urls, external: () => urls.filter(isExternal) };
}

function isExternal(url: string): boolean {
  let parsed: URL;
  try {
    parsed = new URL(url);
  } catch {
    return true; // unparseable: report it rather than let it pass
  }
  if (localSchemes.has(parsed.protocol)) return false;
  return parsed.hostname !== host;
}

/** Collects uncaught page exceptions and console.error messages from now on. */
export function recordPageErrors(page: Page): string[] {
  const errors: string[] = [];
  page.on("pageerror", (error) => errors.push(`uncaught: ${error.message}`));
  page.on("console", (message) => {
    if (message.type() !== "error") return;
    const where = message.location().url;
    // Chromium asks for /favicon.ico on its own when the page names no icon; its 404 is no app error.
    if (new URL(where || "about:blank").pathname === "/favicon.ico") return;
    errors.push(`console.error: ${message.text()}${where ? ` (${where})` : ""}`);
  });
  return errors;
}

/** Writes test-results/NAME.png (full page) and returns its path. */
export async function saveScreenshot(page: Page, name: string): Promise<string> {
  if (!/^[\w.-]+$/.test(name)) throw new Error(`invalid screenshot name: ${name}`);
  const directory = join(root, "test-results");
  await mkdir(directory, { recursive: true });
  const path = join(directory, `${name}.png`);
  await page.screenshot({ path, fullPage: true });
  return path;
}

/**
 * One preview server and one browser for a test file: registers beforeAll/afterAll and returns
 * getters for use inside the tests.
 */
export function useBrowserSession(): { readonly preview: () => Preview; readonly browser: () => LaunchedBrowser } {
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
  return { preview: () => preview!, browser: () => browser! };
}

/** CSS-pixel position of an opaque node pixel on the canvas, once the layout has settled. */
export async function settledNodePoint(page: Page): Promise<{ x: number; y: number }> {
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
