import { checkStop, type RunControl } from "../control.ts";
import { cappedGreedyCount } from "../sweep/cappedGreedyCount.ts";
import { createNetTree } from "../landmark/netTree.ts";
import type { PreparedRows } from "../search/prepareRows.ts";
import { treeNet } from "../landmark/treeNet.ts";

export const rangeFewestNodes = 3; // "a handful of nodes" at the top of the range (issue 6)
export const rangeMostNodes = 2000; // "at most about 2,000 nodes" at the bottom (issue 6): still drawable, a sweep in seconds
const bisectionSteps = 6; // a bracket of a factor 2 ends within 2^(1/64), 1.1% in r, as close as the rounding to 3 digits
const maxHalvings = 64; // below d_far / 2^64 every distinct row is its own node in any real table

export interface RadiusRange {
  readonly min: number;
  readonly max: number;
  /** Node budget T at the lower end. */
  readonly mostNodes: number;
}

export const defaultRangeRule =
  "largest radius: the smallest found at which the greedy net in file order has at most 3 nodes; smallest radius: the smallest found at which it has at most " +
  "T = min(2000, max(6, floor(m/5))) nodes for m rows used (fewer when the rows hold fewer distinct points); each found by halving r from the largest distance " +
  "to the first row, then 6 bisection steps in log r, and rounded up to 3 significant digits when that keeps the node count within its limit";

/**
 * Default radius range of a sweep, from the data (rule in `defaultRangeRule`). Counts greedy
 * nets in file order, each stopped once it exceeds its budget; under a true metric the halving
 * nets are kept as the levels of a net tree (netTree.ts) through which later nets are grown.
 * Throws when fewer than two distinct rows (or too few distinct points for a range) exist.
 * Cost: O(log(d_far / r_min) + 16) capped nets.
 * @example defaultRange(prepareRows(demo pump fleet, its 10 numeric features, zscore, euclidean)) // => { min: 0.206, max: 5.48, mostNodes: 469 }
 */
export function defaultRange(prepared: PreparedRows, control: RunControl = {}): RadiusRange {
  const { table, metric, index } = prepared;
  const m = table.rows;
  let far = 0;
  for (let i = 1; i < m; ++i) far = Math.max(far, metric.distance(table.values, table.columns, 0, i));
  if (!(far > 0)) throw new Error(`a sweep needs at least two distinct rows, got ${m} row${m === 1 ? "" : "s"} without two apart`);
  // a true metric grows each net through the coarser ones kept so far (first-hit searches, no
  // balls); otherwise each capped net finds the balls of its landmarks through the row index
  const tree = metric.isTrueMetric ? createNetTree(table, metric) : null;
  const order = Uint32Array.from({ length: m }, (_, i) => i);
  const count = (radius: number, cap: number, keep = false): number => {
    checkStop(control, "the sweep");
    if (!tree) return cappedGreedyCount(index, radius, cap, control);
    const level = treeNet(tree, radius, order, control, cap);
    if (level < 0) return cap + 1;
    const nodes = tree.levels[level]!.rows.length;
    if (!keep) tree.levels.pop();
    return nodes;
  };
  let budget = Math.min(rangeMostNodes, Math.max(6, Math.floor(m / 5)));
  let radius = far;
  // without the triangle inequality the distance from row 0 need not reach every row
  for (let up = 0; up < maxHalvings && count(radius, rangeFewestNodes) > rangeFewestNodes; ++up) radius *= 2;
  const probes: { radius: number; nodes: number }[] = [];
  for (let h = 0; h <= maxHalvings; ++h, radius /= 2) {
    const nodes = count(radius, budget, true);
    probes.push({ radius, nodes });
    control.onProgress?.(Math.min(0.5, h / 20));
    if (nodes > budget) break;
  }
  const last = probes[probes.length - 1]!;
  if (last.nodes <= budget) budget = last.nodes - 1; // the rows hold at most `last.nodes` distinct points
  const bracket = (cap: number): number => {
    const over = probes.findIndex((p) => p.nodes > cap);
    if (over <= 0) throw new Error(`no radius range: the rows hold too few distinct points (${last.nodes})`);
    let lo = probes[over]!.radius;
    let hi = probes[over - 1]!.radius;
    for (let s = 0; s < bisectionSteps; ++s) {
      const mid = Math.sqrt(lo * hi);
      if (count(mid, cap) <= cap) hi = mid;
      else lo = mid;
    }
    // greedy net sizes are not monotone in r: keep the rounded end only if it still meets the cap
    const rounded = roundUpSignificant(hi, 3);
    return count(rounded, cap) <= cap ? rounded : hi;
  };
  const max = bracket(rangeFewestNodes);
  control.onProgress?.(0.6);
  const min = bracket(budget);
  control.onProgress?.(1);
  if (!(min < max)) throw new Error(`no radius range: the rows hold too few distinct points (${last.nodes})`);
  return { min, max, mostNodes: budget };
}

function roundUpSignificant(x: number, digits: number): number {
  const scale = 10 ** (digits - 1 - Math.floor(Math.log10(x)));
  return Math.ceil(x * scale) / scale;
}
