// Bundles the headless command (src/cli/main.ts and the core it uses, npm packages included) into
// one ES module, cli-build/shoal.mjs (and its build helper thread into cli-build/coverThread.mjs), so that `npx shoal` starts without compiling TypeScript.
// Run by `npm ci` / `npm install` (the `prepare` script), by `npm run build:cli`, by the unit tests'
// global setup, and by bin/shoal.mjs itself when a source file is newer than the bundle.
// The folder is not dist/: `vite build` empties dist/.
import { mkdir, readFile, rename, rm, writeFile } from "node:fs/promises";
import { join, relative } from "node:path";
import { fileURLToPath } from "node:url";

export const repoRoot = fileURLToPath(new URL("../", import.meta.url));
export const cliBuildDir = join(repoRoot, "cli-build");
export const bundlePath = join(cliBuildDir, "shoal.mjs");
/** The build's helper thread (src/cli/coverThread.ts), which src/cli/nodePartRunner.ts starts from beside the bundle. */
export const threadBundlePath = join(cliBuildDir, "coverThread.mjs");
/** The bundle's source files (repository-relative), which bin/shoal.mjs compares with the bundle's time. */
export const inputsPath = join(cliBuildDir, "inputs.json");

/**
 * Builds cli-build/shoal.mjs and cli-build/inputs.json from the current sources. Both are written
 * beside their target and renamed into place, so a command starting meanwhile reads the old
 * bundle or the new one, never half of one.
 */
export async function buildCli() {
  const { build } = await import("esbuild");
  const { version } = JSON.parse(await readFile(join(repoRoot, "package.json"), "utf8"));
  await mkdir(cliBuildDir, { recursive: true });
  const staging = `${bundlePath}.partial-${process.pid}`;
  const threadStaging = `${threadBundlePath}.partial-${process.pid}`;
  const options = {
    absWorkingDir: repoRoot,
    bundle: true,
    format: "esm",
    platform: "node",
    target: "node20",
    // npm packages are bundled too: one file to read and no module resolution at start-up
    packages: "bundle",
    define: { SHOAL_VERSION: JSON.stringify(version) },
    metafile: true,
    logLevel: "warning",
    legalComments: "none",
  };
  try {
    const [result, thread] = await Promise.all([
      build({ ...options, entryPoints: ["src/cli/main.ts"], outfile: staging }),
      build({ ...options, entryPoints: ["src/cli/coverThread.ts"], outfile: threadStaging }),
    ]);
    // paths relative to absWorkingDir; npm packages change only through npm, which runs this again
    const inputs = [...new Set([...Object.keys(result.metafile.inputs), ...Object.keys(thread.metafile.inputs)])].filter((path) => !path.startsWith("node_modules/"));
    await writeFile(`${inputsPath}.partial-${process.pid}`, `${JSON.stringify({ inputs: [...inputs, "package.json"] }, null, 1)}\n`);
    // inputs.json first: a bundle is only trusted with its own list beside it
    await rename(`${inputsPath}.partial-${process.pid}`, inputsPath);
    await rename(threadStaging, threadBundlePath);
    await rename(staging, bundlePath);
  } catch (error) {
    await rm(staging, { force: true });
    await rm(threadStaging, { force: true });
    await rm(`${inputsPath}.partial-${process.pid}`, { force: true });
    throw error;
  }
  return bundlePath;
}

if (process.argv[1] && fileURLToPath(import.meta.url) === process.argv[1]) {
  const started = performance.now();
  const path = await buildCli();
  console.log(`built ${relative(process.cwd(), path) || path} in ${Math.round(performance.now() - started)} ms`);
}
