// Makes sure a Chromium for the browser tests exists before vitest starts, so a missing
// browser fails once with a clear message instead of once per test.
// Chromium comes from Debian (package `chromium`), never from npm: nothing may download at run
// time except through the npm registry and Debian's packages.
import { accessSync, constants } from "node:fs";
import { spawnSync } from "node:child_process";

const debianPath = "/usr/bin/chromium";
const override = process.env.SHOAL_CHROMIUM;

function isExecutable(path) {
  try {
    accessSync(path, constants.X_OK);
    return true;
  } catch {
    return false;
  }
}

function fail(message) {
  console.error(`ensureChromium: ${message}`);
  process.exit(1);
}

function run(command, args) {
  console.log(`ensureChromium: ${command} ${args.join(" ")}`);
  const result = spawnSync(command, args, {
    stdio: "inherit",
    env: { ...process.env, DEBIAN_FRONTEND: "noninteractive" },
  });
  if (result.error) fail(`could not run ${command}: ${result.error.message}`);
  if (result.status !== 0) fail(`${command} ${args.join(" ")} exited with ${result.status ?? result.signal}`);
}

// An explicit override is taken at its word: installing Debian's package would not help it.
if (override && !isExecutable(override)) fail(`SHOAL_CHROMIUM is not an executable file: ${override}`);

if (!override && !isExecutable(debianPath)) {
  if (process.getuid?.() !== 0) {
    fail(
      `no chromium at ${debianPath}; install the Debian package \`chromium\` ` +
        "(sudo apt-get install -y chromium) or set SHOAL_CHROMIUM to a Chromium executable",
    );
  }
  run("apt-get", ["update"]);
  // Wait for a dpkg lock held by another apt run rather than failing at once.
  run("apt-get", ["install", "-y", "-o", "DPkg::Lock::Timeout=600", "chromium"]);
  if (!isExecutable(debianPath)) fail(`apt-get installed chromium but ${debianPath} is still missing`);
}

// Asking for the version proves the binary starts (missing shared libraries show up here).
const path = override || debianPath;
const version = spawnSync(path, ["--version"], { encoding: "utf8" });
if (version.status !== 0) fail(`${path} --version exited with ${version.status ?? version.signal}`);
console.log(`ensureChromium: using ${path} (${version.stdout.trim()})`);
