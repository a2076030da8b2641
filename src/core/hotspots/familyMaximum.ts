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
