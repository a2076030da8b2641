import type { HotspotScan, ParsedTable } from "../core/index.ts";
import { memoizeLast } from "./memoizeLast.ts";
import { selectOutcomeNames } from "./selectors.ts";
import type { WorkbenchState } from "./store.ts";

/**
 * Candidate sets scored per millisecond before the session has timed a scan of its own.
 * An estimate, not a measurement of the engine: about 50 ns to score one set from per-node sums
 * (from memory of flat typed-array loops in V8). The first finished scan replaces it with the rate
 * it measured (`hotspotRate`).
 */
export const assumedSetsPerMs = 20_000;

const stabilityReplicates = 99; // replicates per seed run of the seed stability (the engine's method, README)

const memoNumericOutcomes = memoizeLast((table: ParsedTable | null, outcomes: readonly string[]) =>
  outcomes.filter((name) => table?.columns.find((c) => c.name === name)?.kind === "numeric"),
);

/** Outcome columns a scan can take: the numeric ones, in table order. */
export const selectHotspotColumns = (s: WorkbenchState): string[] => memoNumericOutcomes(s.table, selectOutcomeNames(s));

/** The column the next scan takes: the one chosen if it is still a numeric outcome, else the colour-by outcome, else the first; null when there is none. */
export function selectHotspotColumn(s: WorkbenchState): string | null {
  const columns = selectHotspotColumns(s);
  if (s.hotspotColumn !== null && columns.includes(s.hotspotColumn)) return s.hotspotColumn;
  if (s.colorBy !== null && columns.includes(s.colorBy)) return s.colorBy;
  return columns[0] ?? null;
}

/** The finished scan of the build on screen, or null (none yet, running, or of an older build). */
export const selectHotspotScan = (s: WorkbenchState): HotspotScan | null =>
  s.hotspotScan.state === "done" && s.result !== null && s.hotspotScan.result === s.result ? s.hotspotScan.scan : null;

/** The candidate-set count of the build on screen at the chosen K, or null while it is unknown. */
export const selectCandidateSets = (s: WorkbenchState): number | null =>
  s.result !== null && s.hotspotEstimate.result === s.result && s.hotspotEstimate.maxNodes === s.hotspotMaxNodes ? s.hotspotEstimate.candidateSets : null;

/**
 * Expected wall time of a scan, in milliseconds, an estimate: every candidate set is scored once
 * for the data and once per replicate, and, with k stability seeds, once per replicate of each seed's
 * run (99 each; the seed rebuilds themselves and the bootstrap are left out):
 *   sets × (replicates + 1 + k × (99 + 1)) / rate
 * @example expectedScanMs(1000, 999, 0, 20000) // => 50
 */
export function expectedScanMs(candidateSets: number, replicates: number, stabilitySeeds: number, setsPerMs: number): number {
  return (candidateSets * (replicates + 1 + stabilitySeeds * (stabilityReplicates + 1))) / setsPerMs;
}

/** The expected time of the scan the settings describe, or null while the count is unknown. */
export function selectExpectedScanMs(s: WorkbenchState): number | null {
  const sets = selectCandidateSets(s);
  return sets === null ? null : expectedScanMs(sets, s.hotspotReplicates, s.hotspotStabilitySeeds, s.hotspotRate ?? assumedSetsPerMs);
}

/**
 * True when the scan had nothing to find: every score is 0 (no cases or only cases for a 0/1
 * outcome, or one value throughout), so every p is 1.
 */
export const isFlatScan = (scan: HotspotScan): boolean => scan.hotspots.every((h) => h.score === 0);
