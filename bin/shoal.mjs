#!/usr/bin/env node
// Headless Shoal: runs src/cli/main.ts through tsx's loader, so the command and the workbench share one core.
import { register } from "tsx/esm/api";

register();
const { main } = await import("../src/cli/main.ts");
process.exitCode = await main(process.argv.slice(2));
