import type { CoverResult, HotspotDirection, HotspotScan, HotspotScore } from "../../core/index.ts";

/** The last hotspot scan: what it was asked of (compared by identity), its progress, and its answer. */
export interface HotspotScanStatus {
  /** The build it scanned; a scan of another build is not shown. */
  readonly result: CoverResult | null;
  readonly state: "idle" | "running" | "done" | "failed";
  readonly fraction: number;
  readonly scan: HotspotScan | null;
  readonly error: string | null;
  /** Wall time from request to answer, in milliseconds. */
  readonly elapsedMs: number | null;
}

/** The exact count of candidate sets of one build at one K, asked before a scan. */
export interface HotspotEstimateStatus {
  readonly result: CoverResult | null;
  readonly maxNodes: number;
  readonly state: "idle" | "running" | "done" | "failed";
  readonly candidateSets: number | null;
}

export interface HotspotSlice {
  /** The outcome scanned; null follows the default (the colour-by outcome if it is one, else the first numeric outcome). */
  readonly hotspotColumn: string | null;
  readonly hotspotDirection: HotspotDirection;
  /** K: a candidate lies within a node and its K − 1 nearest nodes; 1 to 15. */
  readonly hotspotMaxNodes: number;
  readonly hotspotReplicates: number;
  /** "auto": Bernoulli for a 0/1 outcome, otherwise normal (the engine decides). */
  readonly hotspotScore: HotspotScore | "auto";
  readonly hotspotScanSeed: number;
  /** k landmark seeds for seed stability; 0 skips it. */
  readonly hotspotStabilitySeeds: number;
  readonly hotspotScan: HotspotScanStatus;
  readonly hotspotEstimate: HotspotEstimateStatus;
}

export const initialHotspot: HotspotSlice = {
  hotspotColumn: null,
  hotspotDirection: "high", // the scan's default (HotspotOptions)
  hotspotMaxNodes: 8, // the scan's default K (HotspotOptions); Tango & Takahashi's flexible scan
  hotspotReplicates: 999, // the scan's default (HotspotOptions); common practice in scan statistics, no source
  hotspotScore: "auto",
  hotspotScanSeed: 1, // the scan's default (HotspotOptions)
  hotspotStabilitySeeds: 0,
  hotspotScan: { result: null, state: "idle", fraction: 0, scan: null, error: null, elapsedMs: null },
  hotspotEstimate: { result: null, maxNodes: 0, state: "idle", candidateSets: null },
};
