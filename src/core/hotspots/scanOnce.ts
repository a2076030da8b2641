import { Cancelled, lapClock, partOf } from "../control.ts";
import type { CoverResult } from "../cover/buildCover.ts";
import { randomSource } from "../random.ts";
import type { ParsedTable } from "../table/types.ts";
import { bootstrapDifference } from "./bootstrapDifference.ts";
import { coverGeometry } from "./coverGeometry.ts";
import { disjointBest } from "./disjointBest.ts";
import { countGroups, familyMaximum, familyMaximumByCount, nodeSums } from "./familyMaximum.ts";
import { flexibleFamily, type FamilyGraph } from "./flexibleFamily.ts";
import { withinCap } from "./withinCap.ts";
import { adjacencySets } from "./adjacencySets.ts";
import { greedyGrowth } from "./greedyGrowth.ts";
import { hotspotDefaults } from "./hotspotDefaults.ts";
import { landmarkNeighbours } from "./landmarkNeighbours.ts";
import { nearestLandmarkNodes } from "./nearestLandmarkNodes.ts";
import { monteCarloP, permutationMaxima } from "./permutationMaxima.ts";
import { regionScorer } from "./regionScorer.ts";
import type { Hotspot, HotspotOptions, HotspotScan, HotspotScore } from "./types.ts";

/**
 * One hotspot scan without seed stability (scanHotspots adds it): rows to their nearest
 * landmark's node, the flexible family (or greedy growth past the budget), the observed scores,
 * R permutation maxima, up to 10 disjoint hotspots with p-values against the one maximum
 * distribution, and each hotspot's bootstrap interval. Cost: the family's enumeration, then
 * O(R·(N + total region size)), then O(10·2000·N) for the intervals.
 */
export function scanOnce(parsed: ParsedTable, result: CoverResult, options: HotspotOptions): HotspotScan {
  const now = options.now ?? Date.now;
  const lap = lapClock(now);
  const direction = options.direction ?? hotspotDefaults.direction;
  if (direction !== "high" && direction !== "low" && direction !== "both") throw new Error(`invalid direction: ${direction}`);
  const maxNodes = options.maxNodes ?? hotspotDefaults.maxNodes;
  if (!Number.isInteger(maxNodes) || maxNodes < 1 || maxNodes > hotspotDefaults.maxNodesLimit) throw new Error(`invalid maximum nodes: ${maxNodes} (1 to ${hotspotDefaults.maxNodesLimit})`);
  const replicates = options.replicates ?? hotspotDefaults.replicates;
  if (!Number.isInteger(replicates) || replicates < 0) throw new Error(`invalid replicates: ${replicates}`);
  const scanSeed = options.scanSeed ?? hotspotDefaults.scanSeed;
  if (!Number.isInteger(scanSeed)) throw new Error(`invalid scan seed: ${scanSeed}`);
  const budget = options.budget ?? hotspotDefaults.budget;
  const column = parsed.columns.find((c) => c.name === options.outcome);
  if (!column) throw new Error(`unknown column: ${options.outcome}`);
  if (column.kind !== "numeric") throw new Error(`not a numeric column: ${options.outcome}`);
  const stop = (): void => {
    if (options.shouldStop?.()) throw new Cancelled("the hotspot scan");
  };

  const geometry = coverGeometry(parsed, result);
  const nodeOfPosition = nearestLandmarkNodes(geometry);
  const positions: number[] = [];
  for (let p = 0; p < nodeOfPosition.length; ++p) if (!Number.isNaN(column.numbers[result.usedRows[p]!]!)) positions.push(p);
  const total = positions.length;
  const rows = Uint32Array.from(positions, (p) => result.usedRows[p]!);
  const nodeOf = Uint32Array.from(positions, (p) => nodeOfPosition[p]!);
  const outcome = Float64Array.from(rows, (row) => column.numbers[row]!);
  const score: HotspotScore = options.score ?? (outcome.every((x) => x === 0 || x === 1) ? "bernoulli" : "normal");
  const scorer = regionScorer(score, outcome, direction);
  const nodeCount = result.landmarks.length;
  const graph: FamilyGraph = { neighbours: landmarkNeighbours(geometry, maxNodes), source: result.edges.source, target: result.edges.target };
  stop();
  // counted exactly in the same pass that packs the family, when it fits the budget
  const enumerated = flexibleFamily(graph, budget, (done) => done % 64 === 0 && stop());
  const candidateSets = enumerated.count;
  const search = enumerated.family ? "flexible" : "heuristic";
  const nodeCounts = new Uint32Array(nodeCount);
  for (let i = 0; i < total; ++i) nodeCounts[nodeOf[i]!]!++;
  const cap = Math.floor(total / 2);
  const family = enumerated.family ? withinCap(enumerated.family, nodeCounts, cap) : null;
  const familyTime = lap();
  options.onProgress?.(0.05);

  // the observed scores, and every region that could be reported
  const sums = nodeSums(scorer.values, nodeOf, new Float64Array(nodeCount));
  const regionNodes: Uint32Array[] = [];
  const adjacent = family ? [] : adjacencySets(graph);
  let scores: Float64Array;
  if (family) {
    scores = new Float64Array(family.counts.length);
    familyMaximum(family, family.counts, sums, scorer.score, scores);
  } else {
    const found: number[] = [];
    greedyGrowth({ graph, adjacent, nodeCounts, nodeSums: sums, cap, score: scorer.score }, (nodes, size, value) => {
      regionNodes.push(nodes.slice(0, size).sort());
      found.push(value);
    });
    scores = Float64Array.from(found);
  }
  const nodesOf = family ? (k: number): Uint32Array => family.nodes.subarray(family.offsets[k]!, family.offsets[k + 1]!) : (k: number): Uint32Array => regionNodes[k]!;
  const chosen = scorer.degenerate ? [] : disjointBest(nodesOf, scores, nodeCount, hotspotDefaults.reported);
  const observedTime = lap();

  const random = randomSource(scanSeed);
  const replicateSums = new Float64Array(nodeCount);
  const groups = family ? countGroups(family.counts, graph.neighbours) : null;
  const maximum = (permuted: Float64Array): number => {
    nodeSums(permuted, nodeOf, replicateSums);
    return family ? familyMaximumByCount(family, groups!, replicateSums, scorer.score) : greedyGrowth({ graph, adjacent, nodeCounts, nodeSums: replicateSums, cap, score: scorer.score });
  };
  // a degenerate outcome scores 0 in every order: p = 1 without replicates
  const maxima = chosen.length > 0 ? permutationMaxima(scorer.values, replicates, random, maximum, partOf(options, 0.05, 0.85)) : new Float64Array(0);
  const permutationTime = lap();

  const hotspots: Hotspot[] = chosen.map((k, index) => {
    stop();
    const nodes = Uint32Array.from(nodesOf(k)).sort();
    const inRegion = new Uint8Array(nodeCount);
    for (const node of nodes) inRegion[node] = 1;
    const inside: number[] = [];
    const outside: number[] = [];
    const hotspotRows: number[] = [];
    for (let i = 0; i < total; ++i) {
      if (inRegion[nodeOf[i]!]) {
        inside.push(outcome[i]!);
        hotspotRows.push(rows[i]!);
      } else outside.push(outcome[i]!);
    }
    const effect = bootstrapDifference(inside, outside, hotspotDefaults.bootstrapResamples, random, stop);
    options.onProgress?.(0.9 + (0.1 * (index + 1)) / chosen.length);
    return {
      rank: index + 1,
      nodes,
      rows: Uint32Array.from(hotspotRows).sort(),
      nInside: inside.length,
      nOutside: outside.length,
      inside: effect.inside,
      outside: effect.outside,
      difference: effect.difference,
      ciLow: effect.low,
      ciHigh: effect.high,
      score: scores[k]!,
      p: monteCarloP(scores[k]!, maxima),
      seedShare: null,
      search,
    };
  });
  const effectTime = lap();
  options.onProgress?.(1);
  const notice = scorer.degenerate ? degenerateNotice(score, total) : undefined;
  return {
    outcome: options.outcome,
    direction,
    maxNodes,
    replicates,
    score,
    scanSeed,
    stabilitySeeds: 0,
    search,
    candidateSets,
    rowsScanned: total,
    rowsMissingOutcome: result.usedRows.length - total,
    hotspots,
    timingsMs: { family: familyTime, observed: observedTime, permutations: permutationTime, effects: effectTime },
    regionsScored: scores.length,
    rowCap: cap,
    ...(notice ? { notice } : {}),
  };
}

function degenerateNotice(score: HotspotScore, total: number): string {
  if (total < 2) return `fewer than two rows have an outcome value (${total}): every score is 0 and p = 1`;
  if (score === "bernoulli") return "the outcome has no cases or only cases: every score is 0 and p = 1";
  return "the outcome is constant: every score is 0 and p = 1";
}
