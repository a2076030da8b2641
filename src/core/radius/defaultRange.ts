import { checkStop, type RunControl } from "../control.ts";
import { greedyBalls } from "../landmark/greedyBalls.ts";
import { createNetTree } from "../landmark/netTree.ts";
import type { PreparedRows } from "../search/prepareRows.ts";
import { treeNet } from "../landmark/treeNet.ts";
import { farthestFromFirst } from "./farthestFromFirst.ts";
import { logBisect } from "./logBisect.ts";
import { roundUpSignificant } from "./roundUpSignificant.ts";

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
  "The largest radius is the smallest one tried at which the graph has at most 3 nodes. " +
  "The smallest radius is the smallest one tried at which the graph has at most min(2000, max(6, m/5)) nodes, m being the number of rows used " +
  "(fewer when the rows hold fewer distinct points). For this rule the graph's landmarks are picked in file order. " +
  "Both ends are found by halving the radius from the largest distance to the first row and then narrowing down, and are rounded up to 3 significant digits. " +
  "The range is widened to include the current radius, unless the graph there would have more than 2000 nodes"; // no final period: the readers add one

export interface RangeOptions extends RunControl {
  /** The radius of the graph on screen: the range is widened to contain it unless it would pass the node budget there. */
  readonly current?: number;
}

/**
 * Default radius range of a sweep, from the data (rule in `defaultRangeRule`). Counts greedy
 * nets in file order (greedyBalls, the one greedy loop), each stopped once it exceeds its budget;
 * under a true metric the halving nets are kept as the levels of a net tree
 * (landmark/netTree.ts) through which later nets are grown (treeNet, the same net). Each end is
 * bracketed by halving and narrowed by log-bisection (logBisect.ts). A current radius outside
 * the range moves the nearer end to it when its net stays within the range's node cap
 * (at most 2,000 landmarks, `rangeMostNodes`); otherwise the range is left as it is.
 * Throws when fewer than two distinct rows (farthestFromFirst.ts) or too few distinct points for a range exist.
 * Cost: O(log(d_far / r_min) + 16) capped nets.
 * @example defaultRange(prepareRows(demo pump fleet, its 10 numeric features, zscore, euclidean)) // => { min: 0.206, max: 5.48, mostNodes: 469 }
 */
export function defaultRange(prepared: PreparedRows, options: RangeOptions = {}): RadiusRange {
  const { current, ...control } = options;
  const { table, metric, index } = prepared;
  const m = table.rows;
  const far = farthestFromFirst(table, metric);
  // a true metric grows each net through the coarser ones kept so far (first-hit searches, no
  // balls); otherwise each capped net finds the balls of its landmarks through the row index
  const tree = metric.isTrueMetric ? createNetTree(table, metric) : null;
  const order = Uint32Array.from({ length: m }, (_, i) => i);
  const count = (radius: number, cap: number, keep = false): number => {
    checkStop(control, "the sweep");
    const stop = (): void => checkStop(control, "the sweep");
    if (!tree) return greedyBalls(index, radius, order, { balls: false, firstHit: false, maxLandmarks: cap, onProgress: stop }).landmarks.length;
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
    const { hi } = logBisect(probes[over]!.radius, probes[over - 1]!.radius, bisectionSteps, (mid) => count(mid, cap) <= cap);
    // greedy net sizes are not monotone in r: keep the rounded end only if it still meets the cap
    const rounded = roundUpSignificant(hi, 3);
    return count(rounded, cap) <= cap ? rounded : hi;
  };
  let max = bracket(rangeFewestNodes);
  control.onProgress?.(0.6);
  let min = bracket(budget);
  if (!(min < max)) throw new Error(`no radius range: the rows hold too few distinct points (${last.nodes})`);
  // show where the user stands, unless the graph there has more nodes than the range allows
  if (current !== undefined && Number.isFinite(current) && current > 0 && (current < min || current > max) && count(current, rangeMostNodes) <= rangeMostNodes) {
    if (current < min) min = current;
    else max = current;
  }
  control.onProgress?.(1);
  return { min, max, mostNodes: budget };
}
