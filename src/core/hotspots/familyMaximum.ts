import type { CandidateFamily } from "./flexibleFamily.ts";

/**
 * Each region's sum from the per-node sums, and the region scores (into `scores`, when given);
 * returns the largest score. `counts[k]` is region k's row count (fixed under permutation).
 * O(total region size) per call: a replicate only recomputes node sums, then these.
 * Memory: borrows `scores` for the call.
 * @example familyMaximum(regions {0}, {0, 1}; node sums [1, 2]; counts [1, 3]; score (n, s) => s / n) // => 1
 */
export function familyMaximum(family: CandidateFamily, counts: Uint32Array, nodeSums: Float64Array, score: (n: number, s: number) => number, scores?: Float64Array): number {
  const { offsets, nodes } = family;
  const regions = offsets.length - 1;
  let best = 0;
  for (let k = 0; k < regions; ++k) {
    let s = 0;
    for (let t = offsets[k]!; t < offsets[k + 1]!; ++t) s += nodeSums[nodes[t]!]!;
    const value = score(counts[k]!, s);
    if (scores) scores[k] = value;
    if (value > best) best = value;
  }
  return best;
}

/** Sums of `values` by node (`nodeOf` per row) into `into` (cleared first). O(N + L). */
export function nodeSums(values: Float64Array, nodeOf: Uint32Array, into: Float64Array): Float64Array {
  into.fill(0);
  for (let i = 0; i < values.length; ++i) into[nodeOf[i]!]! += values[i]!;
  return into;
}

/** Scratch of familyMaximumByCount: the distinct row counts of a family's regions, and room for each count's extreme sums. */
export interface CountGroups {
  readonly counts: Uint32Array;
  /** Each node's neighbourhood (the node, then its nearest), for the regions that carry masks; empty otherwise. */
  readonly hoods: readonly Uint32Array[];
  /** Sums of every subset of one neighbourhood, indexed by mask. */
  readonly subsetSums: Float64Array;
  readonly distinct: Uint32Array;
  readonly highest: Float64Array;
  readonly lowest: Float64Array;
}

/** The row counts of a family's regions, grouped once for every replicate (familyMaximumByCount). O(R + largest count). */
export function countGroups(counts: Uint32Array, neighbours: readonly Uint32Array[] = []): CountGroups {
  let largest = 0;
  for (let k = 0; k < counts.length; ++k) if (counts[k]! > largest) largest = counts[k]!;
  const seen = new Uint8Array(largest + 1);
  for (let k = 0; k < counts.length; ++k) seen[counts[k]!] = 1;
  const distinct: number[] = [];
  seen.forEach((flag, n) => flag && distinct.push(n));
  const hoods = neighbours.map((list, i) => Uint32Array.from([i, ...list]));
  const widest = hoods.reduce((most, hood) => Math.max(most, hood.length), 0);
  return { counts, hoods, subsetSums: new Float64Array(2 ** widest), distinct: Uint32Array.from(distinct), highest: new Float64Array(largest + 1), lowest: new Float64Array(largest + 1) };
}

/**
 * The same maximum as familyMaximum, scoring only two regions per row count: for a fixed row
 * count n, each score here (bernoulliScore, normalScore, rankScore) is 0 at the sum n·S/N and
 * grows as the sum moves away from it on the side its direction allows (the Bernoulli and
 * normal log-likelihood ratios are convex in the sum with their minimum there, the rank score is
 * linear), so the largest score among regions of n rows is that of the largest or the smallest
 * sum. The logarithms cost O(distinct n). The regions' sums cost O(total region size), except
 * where the regions kept at one node outweigh its 2^k neighbourhood subsets: there every subset's
 * sum is made once, each from a smaller one (sum[mask] = sum[mask without its lowest bit] + that
 * bit's node sum), and each region reads its mask's sum.
 * Memory: borrows the groups' two arrays for the call.
 * @example familyMaximumByCount(regions {0}, {0, 1}; node sums [1, 2]; counts [1, 3]; score (n, s) => s / n) // => 1
 */
export function familyMaximumByCount(family: CandidateFamily, groups: CountGroups, nodeSums: Float64Array, score: (n: number, s: number) => number): number {
  const { offsets, nodes } = family;
  const { counts, distinct, highest, lowest } = groups;
  for (let g = 0; g < distinct.length; ++g) {
    highest[distinct[g]!] = -Infinity;
    lowest[distinct[g]!] = Infinity;
  }
  const regions = offsets.length - 1;
  const { origins, masks } = family;
  const { hoods, subsetSums } = groups;
  for (let k = 0; k < regions; ) {
    // the block of regions kept at one node (all regions when they carry no masks)
    let stop = regions;
    let bySubsets = false;
    if (origins && masks && hoods.length > 0) {
      const origin = origins[k]!;
      stop = k + 1;
      while (stop < regions && origins[stop] === origin) ++stop;
      const hood = hoods[origin]!;
      const subsets = 2 ** hood.length;
      bySubsets = subsets < offsets[stop]! - offsets[k]!;
      if (bySubsets) {
        subsetSums[0] = 0;
        for (let mask = 1; mask < subsets; ++mask) {
          const low = mask & -mask;
          subsetSums[mask] = subsetSums[mask ^ low]! + nodeSums[hood[31 - Math.clz32(low)]!]!;
        }
      }
    }
    for (; k < stop; ++k) {
      let s = 0;
      if (bySubsets) s = subsetSums[masks![k]!]!;
      else for (let t = offsets[k]!; t < offsets[k + 1]!; ++t) s += nodeSums[nodes[t]!]!;
      const n = counts[k]!;
      if (s > highest[n]!) highest[n] = s;
      if (s < lowest[n]!) lowest[n] = s;
    }
  }
  let best = 0;
  for (let g = 0; g < distinct.length; ++g) {
    const n = distinct[g]!;
    const high = score(n, highest[n]!);
    const low = score(n, lowest[n]!);
    if (high > best) best = high;
    if (low > best) best = low;
  }
  return best;
}
