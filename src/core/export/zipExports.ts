import { strToU8, zipSync, type Zippable } from "fflate";
import type { CoverExports } from "./coverExports.ts";

/**
 * Packs the export files, then any `more` beside them (recipe.json), into one zip (fflate, deflate
 * level 6) with a fixed timestamp, so equal inputs give equal bytes.
 */
export function zipExports(files: CoverExports, more: Readonly<Record<string, string>> = {}): Uint8Array {
  const mtime = new Date(Date.UTC(2000, 0, 1));
  const entries: Zippable = {};
  for (const [name, text] of [...Object.entries(files), ...Object.entries(more)]) entries[name] = [strToU8(text), { mtime }];
  return zipSync(entries, { level: 6 });
}
