import type { CompressedLists, NumericTable } from "../../../src/core/index.ts";

/**
 * Independent reference routines for the cover tests, written from the definitions and
 * sharing no code with src/: every one is a plain double loop.
 */

/** Σⱼ (xᵢⱼ − xₖⱼ)², summed in column order. */
export function squaredDistance(table: NumericTable, i: number, k: number): number {
  let sum = 0;
  for (let j = 0; j < table.columns; ++j) {
    const delta = table.values[i * table.columns + j]! - table.values[k * table.columns + j]!;
    sum += delta * delta;
  }
  return sum;
}

export const isWithin = (table: NumericTable, i: number, k: number, radius: number): boolean => squaredDistance(table, i, k) <= radius * radius;

/** The items of list k of compressed lists, as a plain array. */
export function listOf(lists: CompressedLists, k: number): number[] {
  return Array.from(lists.items.subarray(lists.offsets[k]!, lists.offsets[k + 1]!));
}

export function allLists(lists: CompressedLists): number[][] {
  return Array.from({ length: lists.offsets.length - 1 }, (_, k) => listOf(lists, k));
}

/** Greedy net by the definition: visit rows in `order`; keep a row iff no kept row is within r. */
export function bruteGreedyNet(order: ArrayLike<number>, covers: (landmark: number, row: number) => boolean): number[] {
  const kept: number[] = [];
  for (let k = 0; k < order.length; ++k) {
    const row = order[k]!;
    if (!kept.some((landmark) => covers(landmark, row))) kept.push(row);
  }
  return kept;
}

/**
 * Farthest-point net by the definition, on row numbers: from `start`, add the row covered by no
 * landmark (`covers`) whose nearest landmark (`distance`) is farthest, ties to the lowest row;
 * stop when every row is covered.
 */
export function bruteMaximinNet(rows: number, start: number, covers: (landmark: number, row: number) => boolean, distance: (landmark: number, row: number) => number): number[] {
  const nearest = new Float64Array(rows).fill(Infinity);
  const covered = new Uint8Array(rows);
  const landmarks: number[] = [];
  for (let next = start; next >= 0; ) {
    landmarks.push(next);
    for (let i = 0; i < rows; ++i) {
      if (covered[i]) continue;
      if (covers(next, i)) covered[i] = 1;
      else nearest[i] = Math.min(nearest[i]!, distance(next, i));
    }
    next = -1;
    let farthest = -Infinity;
    for (let i = 0; i < rows; ++i) {
      if (covered[i] || !(nearest[i]! > farthest)) continue;
      farthest = nearest[i]!;
      next = i;
    }
  }
  return landmarks;
}

/** Closed balls: for each landmark, every row (ascending) within r of it. */
export function bruteBalls(rows: number, landmarks: readonly number[], covers: (landmark: number, row: number) => boolean): number[][] {
  return landmarks.map((landmark) => Array.from({ length: rows }, (_, i) => i).filter((i) => covers(landmark, i)));
}

/** Edges a < b, sorted, weighted by the size of the intersection of two balls, by counting every pair. */
export function bruteEdges(balls: readonly (readonly number[])[]): { source: number[]; target: number[]; shared: number[] } {
  const source: number[] = [];
  const target: number[] = [];
  const shared: number[] = [];
  for (let a = 0; a < balls.length; ++a) {
    const inA = new Set(balls[a]);
    for (let b = a + 1; b < balls.length; ++b) {
      const count = balls[b]!.filter((row) => inA.has(row)).length;
      if (count === 0) continue;
      source.push(a);
      target.push(b);
      shared.push(count);
    }
  }
  return { source, target, shared };
}

/** Connected components by breadth-first search, numbered in order of their lowest node. */
export function bfsComponents(nodes: number, source: ArrayLike<number>, target: ArrayLike<number>): { component: number[]; count: number } {
  const neighbours: number[][] = Array.from({ length: nodes }, () => []);
  for (let e = 0; e < source.length; ++e) {
    neighbours[source[e]!]!.push(target[e]!);
    neighbours[target[e]!]!.push(source[e]!);
  }
  const component = new Array<number>(nodes).fill(-1);
  let count = 0;
  for (let start = 0; start < nodes; ++start) {
    if (component[start] !== -1) continue;
    component[start] = count;
    const queue = [start];
    for (let head = 0; head < queue.length; ++head) {
      for (const next of neighbours[queue[head]!]!) {
        if (component[next] !== -1) continue;
        component[next] = count;
        queue.push(next);
      }
    }
    count++;
  }
  return { component, count };
}
