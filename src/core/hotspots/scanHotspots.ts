import { partOf } from "../control.ts";
import type { CoverResult } from "../cover/buildCover.ts";
import type { ParsedTable } from "../table/types.ts";
import { hotspotSeedStability, stabilityRule } from "./hotspotSeedStability.ts";
import { scanOnce } from "./scanOnce.ts";
import type { HotspotOptions, HotspotScan } from "./types.ts";

/**
 * Outcome hotspots on a cover graph, with p-values that account for the search over all
 * candidate regions: the flexibly shaped scan (Tango and Takahashi, Int J Health Geogr 4:11,
 * 2005) with a Bernoulli, normal or rank score, Monte Carlo permutation inference (Kulldorff,
 * Commun Stat Theory Methods 26:1481, 1997), up to 10 disjoint hotspots all against the one
 * maximum distribution (conservative for the secondary ones), bootstrap intervals of the
 * difference inside − outside (optimistic: the region was chosen as the maximum), and, when
 * `stabilitySeeds` > 0, the seed stability of each hotspot. See scanOnce for the costs.
 * Throws Cancelled when `shouldStop` says so.
 */
export function scanHotspots(parsed: ParsedTable, result: CoverResult, options: HotspotOptions): HotspotScan {
  const seeds = options.stabilitySeeds ?? 0;
  if (!Number.isInteger(seeds) || seeds < 0) throw new Error(`invalid stability seeds: ${seeds}`);
  const share = seeds > 0 ? 1 / (1 + seeds) : 1;
  const scan = scanOnce(parsed, result, { ...options, ...partOf(options, 0, share) });
  if (seeds === 0 || scan.hotspots.length === 0) return { ...scan, stabilitySeeds: seeds };
  const now = options.now ?? Date.now;
  const started = now();
  const shares = hotspotSeedStability(parsed, result, scan.hotspots, { ...options, seeds }, partOf(options, share, 1 - share));
  return {
    ...scan,
    stabilitySeeds: seeds,
    stabilityRule: stabilityRule(result.params.landmarks),
    hotspots: scan.hotspots.map((hotspot, k) => ({ ...hotspot, seedShare: shares[k]! })),
    timingsMs: { ...scan.timingsMs, stability: now() - started },
  };
}
