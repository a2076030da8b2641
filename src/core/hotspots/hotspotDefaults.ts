import type { HotspotDirection } from "./types.ts";

/** Defaults of the hotspot scan, in one place for the engine, the command and the workbench. */
export const hotspotDefaults = {
  direction: "high" as HotspotDirection,
  maxNodes: 8, // K = 8: the default asked for by the product owner (Tango and Takahashi 2005 use K up to 15)
  maxNodesLimit: 15, // 2^14 subsets per node at most; Tango and Takahashi 2005 stop at K = 15 as well
  replicates: 999, // common practice in scan statistics (Kulldorff 1997 uses 999 and 9999)
  scanSeed: 1,
  // measured, no source: 440,736 sets (20,000 rows, 235 nodes, K = 12) took 7.7 s for 999 replicates in Node on a
  // 2-core machine, so 1,000,000 sets take about 20 s; packing them holds about 50 bytes a set, plus the lists while built
  budget: 1_000_000,
  bootstrapResamples: 2000, // common practice for percentile intervals, no source
  stabilityReplicates: 99, // per seed run, as asked by the product owner
  reported: 10, // at most this many hotspots
  stabilityJaccard: 0.5, // by rows, as asked by the product owner
  stabilityAlpha: 0.05,
} as const;
