import { strToU8, zipSync, type Zippable } from "fflate";

/**
 * Packs the export files (name → text: the four tables, graph.graphml, …), then any `more` beside
 * them (recipe.json), into one zip (fflate, deflate level 6) with a fixed timestamp, so equal
 * inputs give equal bytes.
 */
export function zipExports<Files extends { readonly [Name in keyof Files]: string }>(files: Files, more: Readonly<Record<string, string>> = {}): Uint8Array {
  const mtime = new Date(Date.UTC(2000, 0, 1));
  const entries: Zippable = {};
  for (const [name, text] of [...Object.entries<string>(files), ...Object.entries(more)]) entries[name] = [strToU8(text), { mtime }];
  return zipSync(entries, { level: 6 });
}
