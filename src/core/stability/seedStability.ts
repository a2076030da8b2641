import type { CoverParams } from "../params.ts";
import { randomSource } from "../random.ts";
import { quantileSorted } from "../stats/quantileSorted.ts";
import type { ParsedTable } from "../table/types.ts";
import { checkStop, type RunControl } from "../control.ts";
import { coverFromBalls } from "../sweep/coverFromBalls.ts";
import { netWithBalls, type Balls } from "../landmark/netWithBalls.ts";
import { prepareRows } from "../search/prepareRows.ts";
import { coMemberPairs, sharedBalls, type RowPairs } from "./coMemberPairs.ts";
import { matchRegion } from "./matchRegion.ts";
import { selectionMask } from "./selectionMask.ts";

export const defaultSeedCount = 10; // issue 6
export const defaultPairSample = 20_000; // pairs per build: a share's standard error is at most 0.5/√20000 ≈ 0.0035

export interface SeedStabilityOptions extends RunControl {
  /** Number of builds k, seeds seed, seed + 1, …, seed + k − 1 (default 10, at least 2). */
  readonly seeds?: number;
  /** Parsed-table rows whose matched region is tracked per row (matchRegion's rule). */
  readonly selection?: ArrayLike<number>;
  /** Pairs per build for the agreement when the balls hold more pairs than this (default 20,000). */
  readonly pairSample?: number;
}

/** Smallest, median (Hyndman–Fan type 7) and largest value over the builds. */
export interface Spread {
  readonly min: number;
  readonly median: number;
  readonly max: number;
}

export interface SeedStability {
  readonly radius: number;
  /** Seed of each build. */
  readonly seeds: Float64Array;
  readonly nodes: Uint32Array;
  readonly edges: Uint32Array;
  readonly b0: Uint32Array;
  readonly b1: Uint32Array;
  readonly spread: { readonly nodes: Spread; readonly edges: Spread; readonly b0: Spread; readonly b1: Spread };
  /** Mean over ordered pairs of builds A ≠ B of the share of A's co-member row pairs that share a node in B; NaN when no build has such a pair. */
  readonly agreement: number;
  /** Whether the pairs were sampled, and how many pairs per build at most (all of them when not sampled). */
  readonly pairs: { readonly sampled: boolean; readonly perBuild: number };
  /** Per parsed-table row: share of the builds in which it lies in the selection's matched region; NaN for rows not used; null without a selection. */
  readonly regionShare: Float64Array | null;
}

/**
 * Seed stability at one radius: k builds with the "greedy-shuffled" landmark rule and seeds seed, seed + 1,
 * …, each equal to buildCover's with that seed (rows scaled and indexed once); the spread of nodes,
 * edges, b0 and b1; co-membership agreement
 *   A(X, Y) = |{pairs of X sharing a node that also share a node in Y}| / |{pairs of X sharing a node}|,
 * averaged over the k(k − 1) ordered pairs of builds, with every pair listed when few, else
 * `pairSample` pairs per build drawn uniformly (coMemberPairs.ts) by the generator seeded with
 * seed + k (the first seed no build uses); and, given a selection, each row's share of builds in
 * which it lands in the matched region. The agreement is the pair-counting idea of W. M. Rand,
 * J. Am. Stat. Assoc. 66(336):846–850, 1971, for overlapping groups.
 * Cost: k builds, plus O(k² · P · c) for P pairs per build.
 * @example seedStability(three clusters of diameter < r more than 2r apart, { …, radius: r }).agreement // => 1
 */
export function seedStability(parsed: ParsedTable, params: CoverParams, options: SeedStabilityOptions = {}): SeedStability {
  const { seeds: count = defaultSeedCount, pairSample = defaultPairSample, selection } = options;
  if (!Number.isInteger(count) || count < 2) throw new Error(`invalid seed count: ${count}`);
  if (!Number.isInteger(pairSample) || pairSample < 1) throw new Error(`invalid pair sample: ${pairSample}`);
  if (!(params.radius > 0) || !Number.isFinite(params.radius)) throw new Error(`invalid radius: ${params.radius}`);
  const prepared = prepareRows(parsed, { ...params, landmarks: "greedy-shuffled" }, options, "the seed stability run");
  const selected = selection ? selectionMask(selection, prepared.usedRows, parsed.rows) : null;
  const seeds = Float64Array.from({ length: count }, (_, s) => params.seed + s);
  const builds: Balls[] = [];
  const figures = { nodes: new Uint32Array(count), edges: new Uint32Array(count), b0: new Uint32Array(count), b1: new Uint32Array(count) };
  const inRegion = selected ? new Uint32Array(prepared.table.rows) : null;
  for (let s = 0; s < count; ++s) {
    checkStop(options, "the seed stability run");
    const part: RunControl = { ...(options.shouldStop ? { shouldStop: options.shouldStop } : {}), onProgress: (f) => options.onProgress?.((0.8 * (s + f)) / count) };
    const balls = netWithBalls(prepared.index, params.radius, "greedy-shuffled", seeds[s]!, { ...part, what: "the seed stability run" });
    const cover = coverFromBalls(prepared, params.radius, balls, part);
    builds.push(balls);
    figures.nodes[s] = balls.landmarks.length;
    figures.edges[s] = cover.edges.source.length;
    figures.b0[s] = cover.betti.b0;
    figures.b1[s] = cover.betti.b1;
    if (selected && inRegion) for (const i of matchRegion(balls.members, balls.rowNodes, cover.edges, selected).rows) inRegion[i]!++;
  }
  const random = randomSource(params.seed + count);
  const pairs: RowPairs[] = builds.map((b) => coMemberPairs(b.members, b.rowNodes, pairSample, random));
  let sum = 0;
  let terms = 0;
  for (let a = 0; a < count; ++a) {
    checkStop(options, "the seed stability run");
    options.onProgress?.(0.8 + (0.2 * a) / count);
    const { first, second } = pairs[a]!;
    if (first.length === 0) continue;
    for (let b = 0; b < count; ++b) {
      if (b === a) continue;
      let together = 0;
      for (let p = 0; p < first.length; ++p) if (sharedBalls(builds[b]!.rowNodes, first[p]!, second[p]!) > 0) together++;
      sum += together / first.length;
      terms++;
    }
  }
  let regionShare: Float64Array | null = null;
  if (inRegion) {
    regionShare = new Float64Array(parsed.rows).fill(NaN);
    prepared.usedRows.forEach((row, i) => (regionShare![row] = inRegion[i]! / count));
  }
  options.onProgress?.(1);
  const spread = (values: Uint32Array): Spread => {
    const sorted = Float64Array.from(values).sort();
    return { min: sorted[0]!, median: quantileSorted(sorted, 0.5), max: sorted[count - 1]! };
  };
  return {
    radius: params.radius,
    seeds,
    ...figures,
    spread: { nodes: spread(figures.nodes), edges: spread(figures.edges), b0: spread(figures.b0), b1: spread(figures.b1) },
    agreement: terms === 0 ? NaN : sum / terms,
    pairs: { sampled: pairs.some((p) => p.sampled), perBuild: Math.max(...pairs.map((p) => p.first.length)) },
    regionShare,
  };
}
