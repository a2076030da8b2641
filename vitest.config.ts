import { defineConfig } from "vitest/config";
import react from "@vitejs/plugin-react";

// Unit, store and component tests: core/, worker/, state/ and cli/ run in Node; ui/ runs in jsdom.
// Browser tests have their own config (vitest.browser.config.ts) and run against the built app.
export default defineConfig({
  plugins: [react()],
  test: {
    testTimeout: 60_000,
    projects: [
      {
        extends: true,
        test: {
          name: "node",
          environment: "node",
          include: ["test/{core,worker,state,cli,architecture}/**/*.test.ts"],
          // the command's tests spawn bin/shoal.mjs, which runs the bundle: build it from these sources first
          globalSetup: ["test/cli/freshBundle.ts"],
        },
      },
      {
        extends: true,
        test: { name: "ui", environment: "jsdom", include: ["test/ui/**/*.test.{ts,tsx}"] },
      },
    ],
  },
});
