// Vitest global setup of the Node project: rebuilds cli-build/shoal.mjs from the current sources
// with the script npm ci runs (scripts/buildCli.mjs), so that the tests that spawn bin/shoal.mjs
// run what a user runs, and never a bundle older than the code under test.
import { execFileSync } from "node:child_process";
import { fileURLToPath } from "node:url";

export default function freshBundle(): void {
  execFileSync(process.execPath, [fileURLToPath(new URL("../../scripts/buildCli.mjs", import.meta.url))], { stdio: ["ignore", "ignore", "inherit"] });
}
