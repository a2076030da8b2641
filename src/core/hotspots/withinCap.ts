import type { CandidateFamily } from "./flexibleFamily.ts";

/** The family's regions holding between 1 and `cap` scanned rows, with their row counts (origins and masks kept). O(total region size). */
export function withinCap(family: CandidateFamily, nodeCounts: Uint32Array, cap: number): CandidateFamily & { readonly counts: Uint32Array } {
  const offsets: number[] = [0];
  const nodes: number[] = [];
  const counts: number[] = [];
  const origins: number[] = [];
  const masks: number[] = [];
  for (let k = 0; k + 1 < family.offsets.length; ++k) {
    let n = 0;
    for (let t = family.offsets[k]!; t < family.offsets[k + 1]!; ++t) n += nodeCounts[family.nodes[t]!]!;
    if (n < 1 || n > cap) continue;
    for (let t = family.offsets[k]!; t < family.offsets[k + 1]!; ++t) nodes.push(family.nodes[t]!);
    offsets.push(nodes.length);
    counts.push(n);
    if (family.origins && family.masks) {
      origins.push(family.origins[k]!);
      masks.push(family.masks[k]!);
    }
  }
  const located = family.origins && family.masks ? { origins: Uint32Array.from(origins), masks: Uint16Array.from(masks) } : {};
  return { offsets: Uint32Array.from(offsets), nodes: Uint32Array.from(nodes), counts: Uint32Array.from(counts), ...located };
}
