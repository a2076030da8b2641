import type { RunControl } from "../control.ts";

/** Which side of the outcome a hotspot is about: high values (or rates), low, or either. */
export type HotspotDirection = "high" | "low" | "both";
/** The scan score: Bernoulli (0/1 outcome), normal, or rank-based (skewed outcomes). */
export type HotspotScore = "bernoulli" | "normal" | "rank";
/** How the candidate regions were searched: the full flexibly shaped family, or the stated heuristic when the family passes the budget. */
export type HotspotSearch = "flexible" | "heuristic";

export interface HotspotOptions extends RunControl {
  /** The outcome column scanned (numeric). */
  readonly outcome: string;
  /** Default "high". */
  readonly direction?: HotspotDirection;
  /** K: each candidate lies within a node and its K − 1 nearest nodes. Default 8, at most 15. */
  readonly maxNodes?: number;
  /** Monte Carlo replicates. Default 999. */
  readonly replicates?: number;
  /** Default: bernoulli for an outcome whose values are all 0 or 1, otherwise normal. */
  readonly score?: HotspotScore;
  /** Seed of the permutations and the bootstrap (independent of the landmark seed). Default 1. */
  readonly scanSeed?: number;
  /** k landmark seeds for the opt-in seed stability (99 replicates per run); 0 or absent for none. */
  readonly stabilitySeeds?: number;
  /** At most this many candidate sets before the heuristic takes over. Default 2,000,000 (hotspotDefaults). */
  readonly budget?: number;
  /** Clock for the timings (milliseconds); default Date.now. */
  readonly now?: () => number;
}

export interface Hotspot {
  /** 1-based, best first. */
  readonly rank: number;
  /** 0-based nodes of the build, ascending. */
  readonly nodes: Uint32Array;
  /** 0-based parsed-table rows assigned to those nodes (nearest landmark), ascending. */
  readonly rows: Uint32Array;
  readonly nInside: number;
  readonly nOutside: number;
  /** Mean (or rate) inside and outside, and inside − outside with its percentile bootstrap 95% interval. */
  readonly inside: number;
  readonly outside: number;
  readonly difference: number;
  readonly ciLow: number;
  readonly ciHigh: number;
  /** The log-likelihood ratio (or rank score) of the region. */
  readonly score: number;
  /** (1 + replicates whose maximum ≥ score) / (1 + replicates). */
  readonly p: number;
  /** Share of the stability seeds at which a hotspot with Jaccard ≥ 0.5 (by rows) is again found with p ≤ 0.05; null when not run. */
  readonly seedShare: number | null;
  readonly search: HotspotSearch;
}

export interface HotspotScan {
  readonly outcome: string;
  readonly direction: HotspotDirection;
  readonly maxNodes: number;
  readonly replicates: number;
  readonly score: HotspotScore;
  readonly scanSeed: number;
  readonly stabilitySeeds: number;
  readonly search: HotspotSearch;
  /** Candidate sets counted exactly before scanning (of the flexible family, even when the heuristic ran). */
  readonly candidateSets: number;
  /** Used rows with an outcome value (scanned), and used rows left out for a missing outcome. */
  readonly rowsScanned: number;
  readonly rowsMissingOutcome: number;
  /** Up to 10, best first, no two sharing a node. */
  readonly hotspots: readonly Hotspot[];
  readonly timingsMs: Readonly<Record<string, number>>;
  /** Candidate regions actually scored: the flexible ones within the row cap, or the heuristic's regions in the observed data. */
  readonly regionsScored?: number;
  /** A region holds at most this many rows: half of the scanned rows, rounded down. */
  readonly rowCap?: number;
  /** One sentence when every score is 0 and p = 1 (no cases, only cases, a constant outcome, fewer than two rows). */
  readonly notice?: string;
  /** How the seed-stability runs placed their landmarks (the build's rule when it takes a seed, else greedy-shuffled); absent when not run. */
  readonly stabilityRule?: string;
}
