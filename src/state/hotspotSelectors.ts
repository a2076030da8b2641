import type { HotspotScan, ParsedTable } from "../core/index.ts";
import { memoizeLast } from "./memoizeLast.ts";
import { selectOutcomeNames } from "./selectors.ts";
import type { WorkbenchState } from "./store.ts";

/**
 * Rates for the expected time of a scan: estimates, measured once from the engine's own timings of
 * `shoal hotspots` on the demo table (K = 8, Node 20 on a shared 2-core machine): with 19,999
 * replicates, 992 candidate sets × 20,000 scorings took 2,357 ms (warm; 999 replicates run at
 * about half that speed while the code warms up); the intervals, 10 hotspots × 2,000 resamples ×
 * 2,349 rows, took 471 ms. Another machine, table or K may run faster or slower.
 */
export const setsScoredPerMs = 8_400; // 992 × 20,000 / 2,357 ≈ 8,418, rounded down (measured once, see above)
export const bootstrapDrawsPerMs = 100_000; // 10 × 2,000 × 2,349 / 471 ≈ 99,700, rounded (measured once, see above)
const bootstrapResamples = 2_000; // the engine's percentile bootstrap (README)
const reportedHotspots = 10; // at most this many hotspots get an interval (README)
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
 * Expected wall time of a scan, in milliseconds: an estimate. Every candidate set is scored once
 * for the data and once per replicate, and, with k stability seeds, once per replicate of each
 * seed's run (99 each; the seed rebuilds are left out); the intervals draw every scanned row
 * 2,000 times for each of at most 10 hotspots:
 *   sets × (replicates + 1 + k × (99 + 1)) / setsScoredPerMs + rows × 2,000 × 10 / bootstrapDrawsPerMs
 * @example expectedScanMs({ candidateSets: 8400, replicates: 999, stabilitySeeds: 0, rows: 0 }) // => 1000
 */
export function expectedScanMs({ candidateSets, replicates, stabilitySeeds, rows }: { candidateSets: number; replicates: number; stabilitySeeds: number; rows: number }): number {
  const scorings = candidateSets * (replicates + 1 + stabilitySeeds * (stabilityReplicates + 1));
  return scorings / setsScoredPerMs + (rows * bootstrapResamples * reportedHotspots) / bootstrapDrawsPerMs;
}

/** The expected time of the scan the settings describe on the build on screen (its used rows stand for the scanned ones), or null while the count is unknown. */
export function selectExpectedScanMs(s: WorkbenchState): number | null {
  const candidateSets = selectCandidateSets(s);
  if (candidateSets === null || !s.result) return null;
  return expectedScanMs({ candidateSets, replicates: s.hotspotReplicates, stabilitySeeds: s.hotspotStabilitySeeds, rows: s.result.usedRows.length });
}

/**
 * True when the scan had nothing to find: every score is 0 (no cases or only cases for a 0/1
 * outcome, or one value throughout), so every p is 1.
 */
export const isFlatScan = (scan: HotspotScan): boolean => scan.hotspots.every((h) => h.score === 0);
