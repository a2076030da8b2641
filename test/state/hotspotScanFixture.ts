import type { Hotspot, HotspotScan } from "../../src/core/index.ts";

/**
 * A fabricated hotspot scan (not computed: the figures are invented to exercise the workbench
 * code, which only passes them on). Hotspot 1 holds nodes 0 and 2 (rows 0, 1, 2), hotspot 2 node 1.
 */
export function fabricatedScan(patch: Partial<HotspotScan> = {}, hotspots?: readonly Partial<Hotspot>[]): HotspotScan {
  const base: Hotspot[] = [
    {
      rank: 1, nodes: Uint32Array.of(0, 2), rows: Uint32Array.of(0, 1, 2), nInside: 3, nOutside: 4,
      inside: 0.75, outside: 0.125, difference: 0.625, ciLow: 0.25, ciHigh: 0.875, score: 4.5, p: 0.001, seedShare: null, search: "flexible",
    },
    {
      rank: 2, nodes: Uint32Array.of(1), rows: Uint32Array.of(3, 4), nInside: 2, nOutside: 5,
      inside: 0.5, outside: 0.25, difference: 0.25, ciLow: -0.125, ciHigh: 0.5, score: 0.75, p: 0.4, seedShare: null, search: "flexible",
    },
  ];
  return {
    outcome: "flag", direction: "high", maxNodes: 8, replicates: 999, score: "bernoulli", scanSeed: 1, stabilitySeeds: 0, search: "flexible",
    candidateSets: 6, rowsScanned: 7, rowsMissingOutcome: 1, timingsMs: {},
    hotspots: hotspots ? hotspots.map((h, k) => ({ ...base[k % base.length]!, ...h })) : base,
    ...patch,
  };
}
