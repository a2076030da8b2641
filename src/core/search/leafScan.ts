import type { TreeQuery } from "./treeQuery.ts";

/**
 * Candidate positions [from, to) of a tree: writes p to out (from index `count`) for every
 * position whose norm value Σ δₖ², Σ |δₖ| or max |δₖ| (δₖ = cₖ − xₖ, column order,
 * cₖ = query.centre[query.centreBase + k], xₖ = query.coords[p · dims + k]) is ≤ query.limit, and
 * returns the new count. Four positions are scanned together (independent sums keep the processor busy;
 * each sum still runs in column order), and the scan of the four stops as soon as all four
 * partial values exceed the limit: the terms are non-negative and floating-point addition of
 * non-negative numbers is monotone, so a partial value above the limit proves the full value is
 * above it too (the same holds for a running maximum). A NaN value is never ≤ limit. O((to − from)·d).
 * The inner loops below take their arguments one by one, so that they read locals only.
 * @example scanLeaf({ norm: "squares", dims: 1, coords: Float64Array.of(0, 3), centre: Float64Array.of(1), centreBase: 0, limit: 1, … }, 0, 2, new Uint32Array(2), 0) // => 1 (position 0 only)
 */
export function scanLeaf(query: TreeQuery, from: number, to: number, out: Uint32Array, count: number): number {
  const { norm, coords, dims, centre, centreBase, limit } = query;
  if (norm === "squares") return scanSquares(coords, dims, centre, centreBase, from, to, limit, out, count);
  return scanAbsolute(norm === "max", coords, dims, centre, centreBase, from, to, limit, out, count);
}

function scanSquares(coords: Float64Array, d: number, q: Float64Array, c0: number, from: number, to: number, limit: number, out: Uint32Array, count: number): number {
  let p = from;
  for (; p + 4 <= to; p += 4) {
    const a0 = p * d;
    const a1 = a0 + d;
    const a2 = a1 + d;
    const a3 = a2 + d;
    let s0 = 0;
    let s1 = 0;
    let s2 = 0;
    let s3 = 0;
    for (let k = 0; k < d; ) {
      const stop = k + 8 < d ? k + 8 : d;
      for (; k < stop; ++k) {
        const c = q[c0 + k]!;
        const e0 = c - coords[a0 + k]!;
        const e1 = c - coords[a1 + k]!;
        const e2 = c - coords[a2 + k]!;
        const e3 = c - coords[a3 + k]!;
        s0 += e0 * e0;
        s1 += e1 * e1;
        s2 += e2 * e2;
        s3 += e3 * e3;
      }
      if (s0 > limit && s1 > limit && s2 > limit && s3 > limit) break;
    }
    if (s0 <= limit) out[count++] = p;
    if (s1 <= limit) out[count++] = p + 1;
    if (s2 <= limit) out[count++] = p + 2;
    if (s3 <= limit) out[count++] = p + 3;
  }
  for (; p < to; ++p) {
    const a = p * d;
    let s = 0;
    for (let k = 0; k < d && !(s > limit); ++k) {
      const e = q[c0 + k]! - coords[a + k]!;
      s += e * e;
    }
    if (s <= limit) out[count++] = p;
  }
  return count;
}

function scanAbsolute(max: boolean, coords: Float64Array, d: number, q: Float64Array, c0: number, from: number, to: number, limit: number, out: Uint32Array, count: number): number {
  let p = from;
  for (; p + 4 <= to; p += 4) {
    const a0 = p * d;
    const a1 = a0 + d;
    const a2 = a1 + d;
    const a3 = a2 + d;
    let s0 = 0;
    let s1 = 0;
    let s2 = 0;
    let s3 = 0;
    for (let k = 0; k < d; ) {
      const stop = k + 8 < d ? k + 8 : d;
      for (; k < stop; ++k) {
        const c = q[c0 + k]!;
        const e0 = Math.abs(c - coords[a0 + k]!);
        const e1 = Math.abs(c - coords[a1 + k]!);
        const e2 = Math.abs(c - coords[a2 + k]!);
        const e3 = Math.abs(c - coords[a3 + k]!);
        if (max) {
          s0 = Math.max(s0, e0);
          s1 = Math.max(s1, e1);
          s2 = Math.max(s2, e2);
          s3 = Math.max(s3, e3);
        } else {
          s0 += e0;
          s1 += e1;
          s2 += e2;
          s3 += e3;
        }
      }
      if (s0 > limit && s1 > limit && s2 > limit && s3 > limit) break;
    }
    if (s0 <= limit) out[count++] = p;
    if (s1 <= limit) out[count++] = p + 1;
    if (s2 <= limit) out[count++] = p + 2;
    if (s3 <= limit) out[count++] = p + 3;
  }
  for (; p < to; ++p) {
    const a = p * d;
    let s = 0;
    for (let k = 0; k < d && !(s > limit); ++k) {
      const e = Math.abs(q[c0 + k]! - coords[a + k]!);
      s = max ? Math.max(s, e) : s + e;
    }
    if (s <= limit) out[count++] = p;
  }
  return count;
}
