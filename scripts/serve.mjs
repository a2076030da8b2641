// `npm start`: serves the already built dist/ on this machine only, with the headers from
// vite.config.ts (cross-origin isolation and the content security policy), until the process is stopped.
import { existsSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { preview } from "vite";

const root = fileURLToPath(new URL("..", import.meta.url));
const host = "127.0.0.1";
const defaultPort = 4173; // vite preview's own default

function maybePort(value) {
  if (value === undefined || value === "") return defaultPort;
  const port = Number(value);
  if (!Number.isInteger(port) || port < 1 || port > 65535) throw new Error(`invalid PORT: ${value}`);
  return port;
}

let port;
try {
  port = maybePort(process.env.PORT);
} catch (error) {
  console.error(error.message);
  process.exit(1);
}

if (!existsSync(new URL("../dist/index.html", import.meta.url))) {
  console.error("dist/index.html is missing: run `npm run build` first (npm start does)");
  process.exit(1);
}

// strictPort off: a busy port moves on to the next free one, and we print whichever was taken.
const server = await preview({
  root,
  logLevel: "warn",
  preview: { host, port, strictPort: false, open: false },
});
const address = server.httpServer.address();
const actualPort = typeof address === "object" && address ? address.port : port;
if (actualPort !== port) console.log(`port ${port} is busy; using ${actualPort} instead`);
console.log(
  `Shoal is running at http://${host}:${actualPort}/ (invented demo data opens by default; Ctrl+C stops it)`,
);

let closing = false;
async function shutdown() {
  if (closing) return;
  closing = true;
  await server.close();
  process.exit(0);
}
process.on("SIGINT", shutdown);
process.on("SIGTERM", shutdown);
