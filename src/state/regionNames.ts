import type { NamedRegion } from "./slices/selectionSlice.ts";

/** Bijective base-26 letters: 0 → A, 25 → Z, 26 → AA. */
export function regionLetters(index: number): string {
  let name = "";
  for (let k = index + 1; k > 0; k = Math.floor((k - 1) / 26)) name = String.fromCharCode(65 + ((k - 1) % 26)) + name;
  return name;
}

/** The first "Region X" (A, B, … Z, AA …) that no region is named, so a deleted region's name is reused and none repeats. */
export function firstFreeRegionName(regions: readonly NamedRegion[]): string {
  const taken = new Set(regions.map((r) => r.name));
  for (let k = 0; ; k++) {
    const name = `Region ${regionLetters(k)}`;
    if (!taken.has(name)) return name;
  }
}

/**
 * Why region `id` may not take `name` (already trimmed), or null when it may: region-rows.csv
 * and summary.json identify regions by name alone, so two regions never share one.
 */
export function renameRefusal(regions: readonly NamedRegion[], id: number, name: string): string | null {
  if (name === "") return "a region needs a name";
  return regions.some((r) => r.id !== id && r.name === name) ? `another region is named ${name}` : null;
}
