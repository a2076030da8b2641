import { strToU8, zipSync, type Zippable } from "fflate";

/** Packs the export files (name → text: the four tables, graph.graphml, …) into one zip (fflate, deflate level 6) with a fixed timestamp, so equal inputs give equal bytes. */
export function zipExports<Files extends { readonly [Name in keyof Files]: string }>(files: Files): Uint8Array {
  const mtime = new Date(Date.UTC(2000, 0, 1));
  const entries: Zippable = {};
  for (const [name, text] of Object.entries<string>(files)) entries[name] = [strToU8(text), { mtime }];
  return zipSync(entries, { level: 6 });
}
