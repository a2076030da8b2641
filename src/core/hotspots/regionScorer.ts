import { bernoulliScore } from "./bernoulliScore.ts";
import { normalScore } from "./normalScore.ts";
import { midranks, rankScore } from "./rankScore.ts";
import type { HotspotDirection, HotspotScore } from "./types.ts";

/** What a score reads: the values that are summed per region (the outcome, or its midranks) and the score of a region from its row count and sum. */
export interface RegionScorer {
  /** Summed per region and permuted over the rows: the outcome for bernoulli and normal, midranks for rank. */
  readonly values: Float64Array;
  /** Score of a region of n rows whose values sum to s; every total it needs is invariant under permutation. */
  readonly score: (n: number, s: number) => number;
  /** True when every region scores 0 whatever the order (no cases, only cases, a constant outcome, fewer than two rows). */
  readonly degenerate: boolean;
}

/** The scorer of `kind` over the scanned outcome values (bernoulliScore, normalScore, rankScore). O(N), O(N log N) for ranks. */
export function regionScorer(kind: HotspotScore, outcome: Float64Array, direction: HotspotDirection): RegionScorer {
  const total = outcome.length;
  let sum = 0;
  let squares = 0;
  let lowest = Infinity;
  let highest = -Infinity;
  for (let i = 0; i < total; ++i) {
    const x = outcome[i]!;
    sum += x;
    squares += x * x;
    if (x < lowest) lowest = x;
    if (x > highest) highest = x;
  }
  const degenerate = total < 2 || !(highest > lowest);
  if (kind === "bernoulli") {
    for (let i = 0; i < total; ++i) if (outcome[i] !== 0 && outcome[i] !== 1) throw new Error(`the bernoulli score needs 0/1 values, got ${outcome[i]}`);
    return { values: outcome, degenerate, score: (n, s) => bernoulliScore(n, s, total, sum, direction) };
  }
  if (kind === "normal") return { values: outcome, degenerate, score: (n, s) => normalScore(n, s, total, sum, squares, direction) };
  const { ranks, ties } = midranks(outcome);
  return { values: ranks, degenerate, score: (n, s) => rankScore(n, s, total, ties, direction) };
}
