import { partOf, type RunControl } from "../control.ts";
import { buildCover, type CoverResult } from "../cover/buildCover.ts";
import type { LandmarkRule } from "../params.ts";
import type { ParsedTable } from "../table/types.ts";
import { hotspotDefaults } from "./hotspotDefaults.ts";
import { jaccardRows } from "./jaccardRows.ts";
import { scanOnce } from "./scanOnce.ts";
import type { Hotspot, HotspotOptions } from "./types.ts";

/** The landmark rule of the seed runs: the build's own when it takes a seed, else greedy-shuffled (greedy in file order has no seed). */
export function stabilityRule(rule: LandmarkRule): LandmarkRule {
  return rule === "greedy-file-order" ? "greedy-shuffled" : rule;
}

/**
 * Seed stability of hotspots: rebuild the graph with landmark seeds seed + 1 … seed + k (rule:
 * stabilityRule), scan each with 99 replicates, and give each hotspot the share of seeds at which
 * a reported hotspot with p ≤ 0.05 has Jaccard index ≥ 0.5 to it by rows. A resampling check of
 * our own (no published source for this exact rule): it measures how much a hotspot owes to where
 * the landmarks fell, not a p-value. O(k · (build + scan with 99 replicates)).
 * @example hotspotSeedStability(parsed, result, [hotspot], options with 10 seeds) // => Float64Array [share]
 */
export function hotspotSeedStability(parsed: ParsedTable, result: CoverResult, hotspots: readonly Hotspot[], options: HotspotOptions & { readonly seeds: number }, control: RunControl = {}): Float64Array {
  const found = new Float64Array(hotspots.length);
  const params = { ...result.params, landmarks: stabilityRule(result.params.landmarks) };
  for (let s = 1; s <= options.seeds; ++s) {
    const part = partOf(control, (s - 1) / options.seeds, 1 / options.seeds);
    const build = buildCover(parsed, { ...params, seed: result.params.seed + s }, { loops: false, ...(control.shouldStop ? { shouldStop: control.shouldStop } : {}) });
    const scan = scanOnce(parsed, build, { ...options, replicates: hotspotDefaults.stabilityReplicates, stabilitySeeds: 0, ...part });
    const significant = scan.hotspots.filter((h) => h.p <= hotspotDefaults.stabilityAlpha);
    hotspots.forEach((hotspot, k) => {
      if (significant.some((other) => jaccardRows(hotspot.rows, other.rows) >= hotspotDefaults.stabilityJaccard)) found[k]!++;
    });
  }
  return found.map((count) => count / options.seeds);
}
