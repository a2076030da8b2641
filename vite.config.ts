import { defineConfig } from "vite";
import react from "@vitejs/plugin-react";

// Cross-origin isolation lets a later build share the table with several workers through
// SharedArrayBuffer; whoever hosts dist/ must send the same two headers (see README).
const isolationHeaders = {
  "Cross-Origin-Opener-Policy": "same-origin",
  "Cross-Origin-Embedder-Policy": "require-corp",
};

export default defineConfig({
  plugins: [react()],
  base: "./",
  server: { host: "127.0.0.1", headers: isolationHeaders },
  preview: { host: "127.0.0.1", headers: isolationHeaders },
  worker: { format: "es" },
  build: { target: "es2022", sourcemap: true },
});
