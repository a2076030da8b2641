// The plain computation the fast paths must reproduce: the greedy net, closed balls and overlap
// edges exactly as Shoal computed them before the candidate indexes (one reference-predicate
// call per tested pair, every pair tested, edges counted in a hash map). Timed against buildCover
// on the small cases of bench/run.ts, which also checks that both give identical results.
import type { CompressedLists, EdgeList, Metric, NumericTable } from "../src/core/index.ts";

export interface PlainCover {
  readonly landmarks: Uint32Array;
  readonly members: CompressedLists;
  readonly edges: EdgeList;
}

/** Greedy net in `order`: a row is a landmark iff no earlier landmark is within r (first hit stops the search). */
export function plainGreedyNet(table: NumericTable, metric: Metric, radius: number, order: ArrayLike<number>): Uint32Array {
  const { values, columns: d } = table;
  const landmarks: number[] = [];
  for (let k = 0; k < order.length; ++k) {
    const i = order[k]!;
    if (!landmarks.some((l) => metric.within(values, d, l, i, radius))) landmarks.push(i);
  }
  return Uint32Array.from(landmarks);
}

/** Closed balls: for each landmark, every row within r, ascending. */
export function plainBalls(table: NumericTable, metric: Metric, radius: number, landmarks: Uint32Array): CompressedLists {
  const { values, columns: d, rows: n } = table;
  const offsets = new Uint32Array(landmarks.length + 1);
  const items: number[] = [];
  landmarks.forEach((l, k) => {
    for (let i = 0; i < n; ++i) if (metric.within(values, d, l, i, radius)) items.push(i);
    offsets[k + 1] = items.length;
  });
  return { offsets, items: Uint32Array.from(items) };
}

/** Edges a < b weighted by shared rows, counted per row in a Map keyed a·L + b, then sorted. */
export function plainEdges(members: CompressedLists, rows: number): EdgeList {
  const nodes = members.offsets.length - 1;
  const perRow: number[][] = Array.from({ length: rows }, () => []);
  for (let k = 0; k < nodes; ++k) for (let t = members.offsets[k]!; t < members.offsets[k + 1]!; ++t) perRow[members.items[t]!]!.push(k);
  const counts = new Map<number, number>();
  for (const list of perRow) {
    for (let s = 0; s < list.length; ++s) for (let t = s + 1; t < list.length; ++t) counts.set(list[s]! * nodes + list[t]!, (counts.get(list[s]! * nodes + list[t]!) ?? 0) + 1);
  }
  const keys = Float64Array.from(counts.keys()).sort();
  return {
    source: Uint32Array.from(keys, (key) => Math.floor(key / nodes)),
    target: Uint32Array.from(keys, (key) => key % nodes),
    shared: Uint32Array.from(keys, (key) => counts.get(key)!),
  };
}

/** Greedy file-order net, balls and edges of a scaled table, by the plain loops. */
export function plainCover(table: NumericTable, metric: Metric, radius: number): PlainCover {
  const landmarks = plainGreedyNet(table, metric, radius, Uint32Array.from({ length: table.rows }, (_, i) => i));
  const members = plainBalls(table, metric, radius, landmarks);
  return { landmarks, members, edges: plainEdges(members, table.rows) };
}
