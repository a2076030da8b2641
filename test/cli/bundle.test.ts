// The command runs from a bundle (cli-build/shoal.mjs, scripts/buildCli.mjs), never through a
// TypeScript loader, and bin/shoal.mjs rebuilds that bundle when it is older than a source file.
import { execFileSync } from "node:child_process";
import { copyFileSync, mkdtempSync, readFileSync, rmSync, statSync, utimesSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { pathToFileURL } from "node:url";
import { describe, expect, it } from "vitest";
import { repoRoot, runShoal } from "./runShoal.ts";

const bundle = `${repoRoot}cli-build/shoal.mjs`;

describe("the command's bundle", () => {
  it("bin/shoal.mjs imports the bundle and no TypeScript loader (tsx)", () => {
    const bin = readFileSync(`${repoRoot}bin/shoal.mjs`, "utf8");
    expect(bin).toContain("cli-build/shoal.mjs");
    expect(bin).not.toMatch(/from "tsx|import\("tsx/);
  });

  it("a copy of the bundle in a folder without package.json still prints package.json's version (inlined when bundled)", () => {
    const { version } = JSON.parse(readFileSync(`${repoRoot}package.json`, "utf8")) as { version: string };
    const folder = mkdtempSync(join(tmpdir(), "shoal-bundle-"));
    const copy = join(folder, "shoal.mjs");
    copyFileSync(bundle, copy);
    const out = execFileSync(process.execPath, ["--input-type=module", "-e", `const { main } = await import(${JSON.stringify(pathToFileURL(copy).href)}); process.exitCode = await main(["--version"]);`], { encoding: "utf8" });
    rmSync(folder, { recursive: true, force: true });
    expect(out).toBe(`shoal ${version}\n`);
  });

  it("a bundle older than its sources is rebuilt before it runs: its time is later than the sources' afterwards", async () => {
    const past = new Date("2000-01-01T00:00:00Z");
    utimesSync(bundle, past, past);
    const run = await runShoal(["--version"]);
    expect(run.code).toBe(0);
    expect(statSync(bundle).mtimeMs).toBeGreaterThan(statSync(`${repoRoot}src/cli/main.ts`).mtimeMs);
  });
});
