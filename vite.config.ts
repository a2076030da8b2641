import { defineConfig, type Plugin } from "vite";
import react from "@vitejs/plugin-react";

// Cross-origin isolation lets a later build share the table with several workers through
// SharedArrayBuffer; whoever hosts dist/ must send the same two headers (see README).
const isolationHeaders = {
  "Cross-Origin-Opener-Policy": "same-origin",
  "Cross-Origin-Embedder-Policy": "require-corp",
};

// The table never leaves the machine: scripts, the worker, styles, fonts, images and connections
// come from the page's own origin only. data: is the empty favicon in index.html; downloads
// navigate to a blob: URL, which no fetch directive governs. React sets style attributes through the CSSOM, which
// style-src does not govern, so no 'unsafe-inline' is needed. The README's hosting section
// repeats this policy; keep the two in step.
export const contentSecurityPolicy = [
  "default-src 'self'",
  "script-src 'self'",
  "worker-src 'self'",
  "style-src 'self'",
  "font-src 'self'",
  "img-src 'self' data:",
  "connect-src 'self'",
  "object-src 'none'",
  "base-uri 'self'",
  "form-action 'none'",
].join("; ");

// frame-ancestors is ignored in a meta tag, so only the header carries it.
const securityHeaders = {
  ...isolationHeaders,
  "Content-Security-Policy": `${contentSecurityPolicy}; frame-ancestors 'none'`,
};

// The dev server injects an inline script and talks to its page over a websocket, so the meta tag
// goes into the built page only; `npm run dev` runs without a policy.
function contentSecurityPolicyMeta(): Plugin {
  return {
    name: "shoal-content-security-policy",
    apply: "build",
    transformIndexHtml(html) {
      const anchor = /<meta charset="UTF-8" \/>\n/;
      if (!anchor.test(html)) throw new Error("index.html lost its charset meta tag: the policy is placed right after it");
      return html.replace(anchor, (found) => `${found}    <meta http-equiv="Content-Security-Policy" content="${contentSecurityPolicy}" />\n`);
    },
  };
}

export default defineConfig({
  plugins: [react(), contentSecurityPolicyMeta()],
  base: "./",
  server: { host: "127.0.0.1", headers: isolationHeaders },
  preview: { host: "127.0.0.1", headers: securityHeaders },
  worker: { format: "es" },
  build: { target: "es2022", sourcemap: true },
});
