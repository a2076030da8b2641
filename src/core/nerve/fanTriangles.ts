import type { CompressedLists } from "../lists/compressedLists.ts";

/**
 * Visits, once each, the fan triangles of the sampled nerve: for every row with balls
 * v < n_2 < … < n_c (its node list, ascending), the triples (v, n_j, n_k), j < k, from its lowest
 * node v; C(c − 1, 2) per row instead of the C(c, 3) triangles of its clique. They span the same
 * boundaries as all the nerve's triangles: every nerve triangle lies in some row's clique, and
 * there ∂{a, b, c} = ∂{v, b, c} + ∂{v, a, c} + ∂{v, a, b} over GF(2) (the boundary of the
 * tetrahedron {v, a, b, c} is zero). So rank ∂2, hence b1, can be computed from them alone.
 * Deduplicated in an open-addressing hash set of typed arrays (linear probing, load ≤ 1/2;
 * D. E. Knuth, TAOCP vol. 3, §6.4, Algorithm L). `everyRows` is called every 1,024 rows (a hook
 * for cancellation). O(Σ_rows c²) expected time, O(F) memory for F fan triangles. Returns F.
 * @example forEachFanTriangle({ offsets: Uint32Array.of(0, 4), items: Uint32Array.of(0, 1, 2, 3) }, visit) // => 3 (visits 0,1,2; 0,1,3; 0,2,3)
 */
export function forEachFanTriangle(rowNodes: CompressedLists, visit: (a: number, b: number, c: number) => void, everyRows?: (row: number) => void): number {
  let mask = 1023;
  let slotA = new Uint32Array(mask + 1); // a + 1, so that 0 marks an empty slot
  let slotB = new Uint32Array(mask + 1);
  let slotC = new Uint32Array(mask + 1);
  let count = 0;
  const place = (a1: number, b: number, c: number): boolean => {
    for (let h = hash3(a1, b, c) & mask; ; h = (h + 1) & mask) {
      if (slotA[h] === 0) {
        slotA[h] = a1;
        slotB[h] = b;
        slotC[h] = c;
        return true;
      }
      if (slotA[h] === a1 && slotB[h] === b && slotC[h] === c) return false;
    }
  };
  const { offsets, items } = rowNodes;
  const rows = offsets.length - 1;
  for (let i = 0; i < rows; ++i) {
    if (everyRows && (i & 1023) === 0) everyRows(i);
    const end = offsets[i + 1]!;
    const a = items[offsets[i]!]!;
    for (let q = offsets[i]! + 1; q < end; ++q) {
      const b = items[q]!;
      for (let s = q + 1; s < end; ++s) {
        const c = items[s]!;
        if (!place(a + 1, b, c)) continue;
        visit(a, b, c);
        if (++count * 2 <= mask) continue;
        const [oldA, oldB, oldC] = [slotA, slotB, slotC];
        mask = 2 * mask + 1;
        slotA = new Uint32Array(mask + 1);
        slotB = new Uint32Array(mask + 1);
        slotC = new Uint32Array(mask + 1);
        for (let h = 0; h < oldA.length; ++h) if (oldA[h] !== 0) place(oldA[h]!, oldB[h]!, oldC[h]!);
      }
    }
  }
  return count;
}

/** 32-bit mix of three integers, finished by the MurmurHash3 fmix32 step (A. Appleby, smhasher, 2011). */
function hash3(a: number, b: number, c: number): number {
  let h = Math.imul(a, 0x9e3779b1) ^ Math.imul(b, 0x85ebca77) ^ Math.imul(c, 0xc2b2ae3d);
  h ^= h >>> 16;
  h = Math.imul(h, 0x85ebca6b);
  h ^= h >>> 13;
  h = Math.imul(h, 0xc2b2ae35);
  return (h ^ (h >>> 16)) >>> 0;
}
