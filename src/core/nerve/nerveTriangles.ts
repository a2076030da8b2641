import type { CompressedLists } from "../lists/compressedLists.ts";

/**
 * Lists every triangle; builds use nerveLoops, which needs only fan triangles. Kept as the
 * reference for tests and for exact triangle counts on small nerves.
 * Triangles of the sampled nerve: node triples a < b < c whose three balls share at least one
 * row, listed from each row's nodes (C(c, 3) triples for a row in c balls), deduplicated, sorted.
 * Returned flat: triangle t is (out[3t], out[3t + 1], out[3t + 2]). O(Σ_rows c³ + T log T).
 */
export function nerveTriangles(rowNodes: CompressedLists, nodes: number): Uint32Array {
  const seen = new Set<number | string>();
  // a numeric key is exact while nodes³ < 2⁵³ (nodes < 208,063); beyond, a string key
  const numericKeys = nodes < 208_000;
  const triples: number[] = [];
  const rows = rowNodes.offsets.length - 1;
  for (let i = 0; i < rows; ++i) {
    const start = rowNodes.offsets[i]!;
    const end = rowNodes.offsets[i + 1]!;
    for (let p = start; p < end; ++p) {
      for (let q = p + 1; q < end; ++q) {
        for (let s = q + 1; s < end; ++s) {
          const a = rowNodes.items[p]!;
          const b = rowNodes.items[q]!;
          const c = rowNodes.items[s]!;
          const key = numericKeys ? (a * nodes + b) * nodes + c : `${a},${b},${c}`;
          if (seen.has(key)) continue;
          seen.add(key);
          triples.push(a, b, c);
        }
      }
    }
  }
  const count = triples.length / 3;
  const order = Array.from({ length: count }, (_, t) => t).sort(
    (x, y) => triples[3 * x]! - triples[3 * y]! || triples[3 * x + 1]! - triples[3 * y + 1]! || triples[3 * x + 2]! - triples[3 * y + 2]!,
  );
  const out = new Uint32Array(triples.length);
  order.forEach((t, k) => out.set([triples[3 * t]!, triples[3 * t + 1]!, triples[3 * t + 2]!], 3 * k));
  return out;
}
