#!/usr/bin/env node
// Headless Shoal: runs the bundled command, cli-build/shoal.mjs (src/cli/main.ts and the core it
// uses, built by scripts/buildCli.mjs when npm ci or npm install runs the `prepare` script).
// The bundle is rebuilt first when it is missing or older than one of its source files, so an
// edited or pulled source is never run from a stale bundle (the check stats about 150 files: ~2 ms).
import { readFileSync, statSync } from "node:fs";

const root = new URL("../", import.meta.url);
const bundle = new URL("cli-build/shoal.mjs", root);

function isFresh() {
  try {
    const built = statSync(bundle).mtimeMs;
    const { inputs } = JSON.parse(readFileSync(new URL("cli-build/inputs.json", root), "utf8"));
    return inputs.every((path) => statSync(new URL(path, root), { throwIfNoEntry: false })?.mtimeMs <= built);
  } catch {
    return false;
  }
}

if (!isFresh()) {
  try {
    const { buildCli } = await import("../scripts/buildCli.mjs");
    await buildCli();
  } catch (error) {
    console.error(`shoal: cannot build the command (npm run build:cli): ${error instanceof Error ? error.message : String(error)}`);
    process.exit(2);
  }
}
const { main } = await import(bundle.href);
process.exitCode = await main(process.argv.slice(2));
