import { formatCount } from "../format.ts";

/** A size for people: "812 bytes", "2.4 MB" (decimal megabytes, 1 MB = 1,000,000 bytes, as file managers show). */
export function formatBytes(bytes: number): string {
  if (bytes < 1000) return `${formatCount(bytes)} ${bytes === 1 ? "byte" : "bytes"}`;
  if (bytes < 1e6) return `${(bytes / 1e3).toFixed(1)} kB`;
  if (bytes < 1e9) return `${(bytes / 1e6).toFixed(1)} MB`;
  return `${(bytes / 1e9).toFixed(2)} GB`;
}
