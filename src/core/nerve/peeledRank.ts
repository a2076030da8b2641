import { symmetricDifference } from "./symmetricDifference.ts";
/**
 * Rank over GF(2) of a sparse 0/1 matrix whose columns hold at most three row indices
 * (`columns[3t..3t+2]`, −1 for an empty slot; a row index appears at most once per column).
 * Peeling: while some column has exactly one live row e, e is in the column span, so count it
 * and kill it everywhere (rank M = killed rows + rank of M with those rows deleted). What is left
 * is reduced by lowest pivot (Edelsbrunner and Harer, Computational Topology, AMS 2010, §IV.2).
 * Cost O(T + R) for T columns and R rows, plus the reduction of the columns left after peeling.
 * @example peeledRank(Int32Array.of(0, 1, -1, 1, 2, -1, 0, 2, -1), 3) // => 2 (the three columns sum to zero)
 */
export function peeledRank(columns: Int32Array, rows: number): number {
  const count = columns.length / 3;
  const live = new Uint8Array(count);
  const start = new Uint32Array(rows + 1);
  for (let t = 0; t < count; ++t) {
    for (let s = 3 * t; s < 3 * t + 3; ++s) {
      if (columns[s]! < 0) continue;
      live[t]!++;
      start[columns[s]! + 1]!++;
    }
  }
  for (let e = 0; e < rows; ++e) start[e + 1]! += start[e]!;
  const cursor = start.slice(0, rows);
  const holders = new Uint32Array(start[rows]!);
  for (let t = 0; t < count; ++t) for (let s = 3 * t; s < 3 * t + 3; ++s) if (columns[s]! >= 0) holders[cursor[columns[s]!]!++] = t;

  const dead = new Uint8Array(rows);
  const stack: number[] = [];
  for (let t = 0; t < count; ++t) if (live[t] === 1) stack.push(t);
  let rank = 0;
  while (stack.length > 0) {
    const t = stack.pop()!;
    if (live[t] !== 1) continue;
    let e = -1;
    for (let s = 3 * t; s < 3 * t + 3; ++s) if (columns[s]! >= 0 && !dead[columns[s]!]) e = columns[s]!;
    dead[e] = 1;
    rank++;
    for (let h = start[e]!; h < start[e + 1]!; ++h) {
      const u = holders[h]!;
      if (--live[u]! === 1) stack.push(u);
    }
  }

  const owner = new Map<number, number[]>(); // pivot row → reduced column with that largest entry
  for (let t = 0; t < count; ++t) {
    if (live[t]! < 2) continue;
    let column: number[] = [];
    for (let s = 3 * t; s < 3 * t + 3; ++s) if (columns[s]! >= 0 && !dead[columns[s]!]) column.push(columns[s]!);
    column.sort((x, y) => x - y);
    while (column.length > 0) {
      const other = owner.get(column[column.length - 1]!);
      if (!other) {
        owner.set(column[column.length - 1]!, column);
        rank++;
        break;
      }
      column = symmetricDifference(column, other);
    }
  }
  return rank;
}
