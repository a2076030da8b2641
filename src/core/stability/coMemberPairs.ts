import type { CompressedLists } from "../lists/compressedLists.ts";

/** Row pairs (first[p], second[p]), first < second, each sharing at least one ball. */
export interface RowPairs {
  readonly first: Uint32Array;
  readonly second: Uint32Array;
  /** False: every distinct pair; true: a seeded sample, drawn uniformly with replacement. */
  readonly sampled: boolean;
}

/**
 * The row pairs that share a node. When the balls hold at most `sampleSize` pairs counted with
 * multiplicity (Σ_k C(|ball_k|, 2)), every distinct pair is listed; otherwise `sampleSize` pairs
 * are drawn uniformly from the distinct pairs by rejection: a ball with probability ∝ C(|ball|, 2),
 * two distinct members uniformly, kept with probability 1 / (number of balls they share)
 * (J. von Neumann, NBS Appl. Math. Ser. 12:36–38, 1951, acceptance–rejection).
 * Cost: O(Σ_k |ball_k|²) listing; O(sampleSize · (log V + c)) expected sampling, c balls per row.
 * @example coMemberPairs(balls {0, 1, 2}, {2, 3}, rowNodes, 100, random) // => first [0, 0, 1, 2], second [1, 2, 2, 3], sampled false
 */
export function coMemberPairs(members: CompressedLists, rowNodes: CompressedLists, sampleSize: number, random: () => number): RowPairs {
  const nodes = members.offsets.length - 1;
  const rows = rowNodes.offsets.length - 1;
  const cumulative = new Float64Array(nodes + 1);
  for (let k = 0; k < nodes; ++k) {
    const size = members.offsets[k + 1]! - members.offsets[k]!;
    cumulative[k + 1] = cumulative[k]! + (size * (size - 1)) / 2;
  }
  const total = cumulative[nodes]!;
  const first: number[] = [];
  const second: number[] = [];
  if (total <= sampleSize) {
    const seen = new Int32Array(rows).fill(-1);
    for (let x = 0; x < rows; ++x) {
      for (let s = rowNodes.offsets[x]!; s < rowNodes.offsets[x + 1]!; ++s) {
        const k = rowNodes.items[s]!;
        for (let t = members.offsets[k]!; t < members.offsets[k + 1]!; ++t) {
          const y = members.items[t]!;
          if (y <= x || seen[y] === x) continue;
          seen[y] = x;
          first.push(x);
          second.push(y);
        }
      }
    }
    return { first: Uint32Array.from(first), second: Uint32Array.from(second), sampled: false };
  }
  while (first.length < sampleSize) {
    const u = random() * total;
    let lo = 0;
    let hi = nodes - 1;
    while (lo < hi) {
      const mid = (lo + hi) >>> 1;
      if (cumulative[mid + 1]! <= u) lo = mid + 1;
      else hi = mid;
    }
    const start = members.offsets[lo]!;
    const size = members.offsets[lo + 1]! - start;
    const a = Math.floor(random() * size);
    let b = Math.floor(random() * (size - 1));
    if (b >= a) b++;
    const x = Math.min(members.items[start + a]!, members.items[start + b]!);
    const y = Math.max(members.items[start + a]!, members.items[start + b]!);
    if (random() * sharedBalls(rowNodes, x, y) >= 1) continue;
    first.push(x);
    second.push(y);
  }
  return { first: Uint32Array.from(first), second: Uint32Array.from(second), sampled: true };
}

/** Number of balls rows x and y share (their ascending node lists merged). O(c). */
export function sharedBalls(rowNodes: CompressedLists, x: number, y: number): number {
  const { offsets, items } = rowNodes;
  let p = offsets[x]!;
  let q = offsets[y]!;
  let count = 0;
  while (p < offsets[x + 1]! && q < offsets[y + 1]!) {
    const a = items[p]!;
    const b = items[q]!;
    if (a === b) count++;
    if (a <= b) p++;
    if (b <= a) q++;
  }
  return count;
}
