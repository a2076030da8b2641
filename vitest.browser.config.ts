import { defineConfig } from "vitest/config";

// Drives the built app (dist/) in Debian's Chromium through playwright-core.
export default defineConfig({
  test: {
    include: ["test/browser/**/*.test.ts"],
    environment: "node",
    testTimeout: 120_000,
    hookTimeout: 120_000,
    fileParallelism: false,
  },
});
