import type { CoverResult } from "../cover/buildCover.ts";
import { nodeMembers } from "../cover/nodeMeans.ts";
import type { CompressedLists } from "../lists/compressedLists.ts";

/** Every node in the same connected component as one of `nodes`, ascending. O(V). */
export function componentNodes(result: Pick<CoverResult, "component">, nodes: readonly number[]): number[] {
  const wanted = new Set(nodes.filter((k) => k < result.component.length).map((k) => result.component[k]!));
  const out: number[] = [];
  for (let k = 0; k < result.component.length; ++k) if (wanted.has(result.component[k]!)) out.push(k);
  return out;
}

/** `nodes` and every node one edge away from one of them, ascending. O(V + E). */
export function growByOneStep(result: Pick<CoverResult, "edges" | "component">, nodes: readonly number[]): number[] {
  const inside = new Set(nodes.filter((k) => k < result.component.length));
  const grown = new Set(inside);
  const { source, target } = result.edges;
  for (let e = 0; e < source.length; ++e) {
    if (inside.has(source[e]!)) grown.add(target[e]!);
    if (inside.has(target[e]!)) grown.add(source[e]!);
  }
  return [...grown].sort((a, b) => a - b);
}

/**
 * Count of each node's rows that lie in `rows` (ascending parsed-table rows), by a membership mask.
 * O(n + total members) for n = largest row + 1.
 */
export function rowsInRegion(members: CompressedLists, rows: Uint32Array): Uint32Array {
  const nodes = members.offsets.length - 1;
  const mask = new Uint8Array((rows.length > 0 ? rows[rows.length - 1]! : 0) + 1);
  for (const row of rows) mask[row] = 1;
  const counts = new Uint32Array(nodes);
  for (let k = 0; k < nodes; ++k) {
    let count = 0;
    for (const row of nodeMembers(members, k)) count += mask[row] ?? 0;
    counts[k] = count;
  }
  return counts;
}

/** Nodes most of whose rows lie in the region: strictly more than half (exactly half is not most), ascending. */
export function majorityNodes(members: CompressedLists, rows: Uint32Array): number[] {
  const inside = rowsInRegion(members, rows);
  const out: number[] = [];
  for (let k = 0; k < inside.length; ++k) if (2 * inside[k]! > members.offsets[k + 1]! - members.offsets[k]!) out.push(k);
  return out;
}

/** Rows two regions share: both ascending, merged in one pass. O(|a| + |b|). */
export function sharedRowCount(a: Uint32Array, b: Uint32Array): number {
  let i = 0;
  let j = 0;
  let shared = 0;
  while (i < a.length && j < b.length) {
    if (a[i]! < b[j]!) ++i;
    else if (a[i]! > b[j]!) ++j;
    else {
      ++shared;
      ++i;
      ++j;
    }
  }
  return shared;
}

/** Nodes whose balls hold `row`, ascending. O(total members). */
export function nodesHoldingRow(members: CompressedLists, row: number): number[] {
  const out: number[] = [];
  for (let k = 0; k + 1 < members.offsets.length; ++k) if (nodeMembers(members, k).includes(row)) out.push(k);
  return out;
}
