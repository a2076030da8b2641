import type { HotspotScan, ParsedTable } from "../core/index.ts";
import { hotspotRowsCsv, hotspotsCsv } from "./hotspotFiles.ts";
import type { HotspotCommand } from "./parseHotspotArgs.ts";
import type { FileText } from "./writeTextFile.ts";

interface RunFacts {
  readonly command: HotspotCommand;
  readonly fileName: string;
  readonly radius: number;
  readonly buildMs: number;
  readonly scanMs: number;
}

/** The three hotspot files: hotspots.csv, hotspot-rows.csv and hotspots.json (every parameter, the candidate count, rows left out, timings). */
export function hotspotFileTexts(scan: HotspotScan, parsed: ParsedTable, facts: RunFacts): Record<string, FileText> {
  const { command } = facts;
  const json = {
    file: facts.fileName,
    scan: scan.outcome,
    score: scan.score,
    scoreChosen: command.score === null ? "from the values: 0/1 → bernoulli, otherwise normal" : "--score",
    direction: scan.direction,
    maxNodes: scan.maxNodes,
    replicates: scan.replicates,
    scanSeed: scan.scanSeed,
    stabilitySeeds: scan.stabilitySeeds,
    ...(scan.stabilityRule ? { stabilityLandmarks: scan.stabilityRule } : {}),
    search: scan.search,
    candidateSets: scan.candidateSets,
    regionsScored: scan.regionsScored,
    rowCap: scan.rowCap,
    rows: { scanned: scan.rowsScanned, missingOutcome: scan.rowsMissingOutcome },
    build: { radius: facts.radius, landmarks: command.params.landmarks, seed: command.params.seed, scale: command.params.scale, metric: command.params.metric, idColumn: command.idColumn },
    hotspots: scan.hotspots.length,
    ...(scan.notice ? { notice: scan.notice } : {}),
    pValue: "accounts for the search over all candidate regions at this radius, metric and scaling; not for the choice of those, nor for scanning several outcomes; secondary hotspots are compared with the same maximum distribution, which is conservative for them",
    interval: "percentile bootstrap 95% of inside − outside; optimistic, since the region was chosen as the maximum",
    timingsMs: { build: facts.buildMs, ...scan.timingsMs, scan: facts.scanMs },
  };
  return {
    "hotspots.csv": hotspotsCsv(scan),
    "hotspot-rows.csv": hotspotRowsCsv(scan, parsed, command.idColumn),
    "hotspots.json": `${JSON.stringify(json, null, 2)}\n`,
  };
}
