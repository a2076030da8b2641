import type { Metric } from "../metric/types.ts";
import type { NumericTable } from "../table/types.ts";

// Relative safety margin on every triangle-inequality bound. A Float64 sum of d nonnegative terms
// is off by at most about d·2⁻⁵³ relative (N. J. Higham, Accuracy and Stability of Numerical
// Algorithms, 2nd ed., SIAM 2002, §4.2), far below 1e-9 for any table we read; the margin only
// lets through a few more candidates, which the reference predicate then decides.
export const pruneSlack = 1 + 1e-9;

/** One complete r-net of the rows, linked to a coarser net (its parent level). */
export interface NetLevel {
  readonly radius: number;
  /** Index of the parent level in the tree, or −1 for a root level (searched by a plain scan). */
  readonly parentLevel: number;
  /** Levels from the root down to the parent level. */
  readonly chain: readonly number[];
  /** Landmark row of node k, in the order the landmarks were chosen. */
  readonly rows: number[];
  /** Node of the parent level whose ball holds this landmark (the nearest such). */
  readonly parent: number[];
  /** Computed distance from the landmark to its parent's landmark. */
  readonly parentDistance: number[];
  /** Largest computed distance from the landmark to any landmark below it in the tree. */
  readonly reach: number[];
  /** byParent[c]: nodes of this level whose parent is node c of the parent level. */
  readonly byParent: number[][];
}

/**
 * A hierarchy of nets over one table, coarse to fine, for a true metric: every landmark of a
 * level lies within the parent level's radius R of its parent, so a landmark l with
 * d(x, l) ≤ r can only lie below parent-level nodes c with d(x, c) ≤ r + reach(c); a search
 * walks down the chain of levels pruning by that bound (and by |d(x, c) − d(c, k)| ≤ d(x, k)
 * before computing d(x, k)). Every final decision is the metric's reference predicate.
 * The idea follows net-trees (S. Har-Peled and M. Mendel, SIAM J. Comput. 35(5), 2006) and
 * cover trees (A. Beygelzimer, S. Kakade and J. Langford, ICML 2006).
 */
export interface NetTree {
  readonly table: NumericTable;
  readonly metric: Metric;
  readonly levels: NetLevel[];
  front: Int32Array;
  frontDistance: Float64Array;
  next: Int32Array;
  nextDistance: Float64Array;
  readonly found: number[];
}

export function createNetTree(table: NumericTable, metric: Metric): NetTree {
  if (!metric.isTrueMetric) throw new Error(`a net tree needs the triangle inequality, which ${metric.name} distance lacks`);
  return { table, metric, levels: [], front: new Int32Array(16), frontDistance: new Float64Array(16), next: new Int32Array(16), nextDistance: new Float64Array(16), found: [] };
}

/** Adds an empty level under `parentLevel` (−1: a root) and returns its index. */
export function addLevel(tree: NetTree, radius: number, parentLevel: number): number {
  if (!(radius > 0) || !Number.isFinite(radius)) throw new Error(`invalid radius: ${radius}`);
  const chain = parentLevel < 0 ? [] : [...tree.levels[parentLevel]!.chain, parentLevel];
  tree.levels.push({ radius, parentLevel, chain, rows: [], parent: [], parentDistance: [], reach: [], byParent: [] });
  return tree.levels.length - 1;
}

/** Fills tree.front with the parent-level nodes that may have a node of `level` within r of row x; returns their count. */
function descend(tree: NetTree, x: number, level: NetLevel, r: number): number {
  const { values, columns: d } = tree.table;
  const distance = tree.metric.distance;
  let count = 0;
  for (let c = 0; c < level.chain.length; ++c) {
    const lv = tree.levels[level.chain[c]!]!;
    if (tree.next.length < lv.rows.length) {
      tree.next = new Int32Array(2 * lv.rows.length);
      tree.nextDistance = new Float64Array(2 * lv.rows.length);
    }
    const { next, nextDistance } = tree;
    let kept = 0;
    for (let i = 0; i < (c === 0 ? lv.rows.length : count); ++i) {
      const kids = c === 0 ? null : lv.byParent[tree.front[i]!];
      if (c > 0 && !kids) continue;
      const dp = c === 0 ? 0 : tree.frontDistance[i]!;
      for (let t = 0; t < (kids ? kids.length : 1); ++t) {
        const k = kids ? kids[t]! : i;
        const reach = lv.reach[k]!;
        if (kids && dp > (r + reach + lv.parentDistance[k]!) * pruneSlack) continue;
        const dk = distance(values, d, x, lv.rows[k]!);
        if (dk > (r + reach) * pruneSlack) continue;
        next[kept] = k;
        nextDistance[kept++] = dk;
      }
    }
    [tree.front, tree.next] = [tree.next, tree.front];
    [tree.frontDistance, tree.nextDistance] = [tree.nextDistance, tree.frontDistance];
    count = kept;
  }
  return count;
}

/**
 * Nodes of level m whose landmark lies within r of row x by the reference predicate (into
 * tree.found, in no particular order); with `firstOnly`, stops at the first. Returns the count.
 */
export function searchLevel(tree: NetTree, x: number, m: number, r: number, firstOnly: boolean): number {
  const level = tree.levels[m]!;
  const { values, columns: d } = tree.table;
  const { within } = tree.metric;
  const found = tree.found;
  found.length = 0;
  const roots = level.parentLevel < 0;
  const count = roots ? 1 : descend(tree, x, level, r);
  for (let i = 0; i < count; ++i) {
    const kids = roots ? null : level.byParent[tree.front[i]!];
    if (!roots && !kids) continue;
    const dp = roots ? 0 : tree.frontDistance[i]!;
    for (let t = 0; t < (kids ? kids.length : level.rows.length); ++t) {
      const k = kids ? kids[t]! : t;
      if (kids && dp > (r + level.parentDistance[k]!) * pruneSlack) continue;
      if (!within(values, d, level.rows[k]!, x, r)) continue;
      found.push(k);
      if (firstOnly) return 1;
    }
  }
  return found.length;
}

/** Appends row x as the next landmark of level m, under its nearest covering parent; updates the reach of its ancestors. */
export function insertLandmark(tree: NetTree, m: number, x: number): void {
  const level = tree.levels[m]!;
  const { values, columns: d } = tree.table;
  const distance = tree.metric.distance;
  let parent = -1;
  let best = 0;
  if (level.parentLevel >= 0) {
    const up = tree.levels[level.parentLevel]!;
    const count = searchLevel(tree, x, level.parentLevel, up.radius, false);
    best = Infinity;
    for (let i = 0; i < count; ++i) {
      const k = tree.found[i]!;
      const dk = distance(values, d, x, up.rows[k]!);
      if (dk > best || (dk === best && k > parent)) continue;
      best = dk;
      parent = k;
    }
    if (parent < 0) throw new Error(`row ${x} is not covered by the net of radius ${up.radius}`);
    (level.byParent[parent] ??= []).push(level.rows.length);
    up.reach[parent] = Math.max(up.reach[parent]!, best);
    for (let a = parent, lv = up; lv.parentLevel >= 0; lv = tree.levels[lv.parentLevel]!) {
      a = lv.parent[a]!;
      const above = tree.levels[lv.parentLevel]!;
      above.reach[a] = Math.max(above.reach[a]!, distance(values, d, x, above.rows[a]!));
    }
  }
  level.rows.push(x);
  level.parent.push(parent);
  level.parentDistance.push(best);
  level.reach.push(0);
}
