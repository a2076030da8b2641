import type { LandmarkRule, MetricName, ScaleName } from "../../../src/core/index.ts";
import { bfsComponents, bruteBalls, bruteEdges, bruteGreedyNet, bruteMaximinNet } from "./bruteForce.ts";
import { independentNerve } from "./gf2Betti.ts";

/**
 * A whole cover build by the definitions, on plain arrays of rows, for the open-dataset tests.
 * It shares no code with src/: scalings are two-pass, distances follow the textbook formulas
 * (square roots taken, cosine over a product of two norms), nets, balls, edges, components and
 * the nerve's b1 are computed by brute force.
 */
export type Rows = readonly (readonly number[])[];
export type Distance = (x: readonly number[], y: readonly number[]) => number;

/** Quantile of sorted values, Hyndman and Fan type 7 (R's default): h = (n − 1)p, linear between neighbours. */
export function quantileType7(sorted: readonly number[], p: number): number {
  const h = (sorted.length - 1) * p;
  const lo = Math.floor(h);
  const hi = Math.min(lo + 1, sorted.length - 1);
  return sorted[lo]! + (h - lo) * (sorted[hi]! - sorted[lo]!);
}

/** Per-column (center, spread) by the definition of each scaling; a zero spread makes the column all 0. */
export function bruteScale(rows: Rows, scale: ScaleName): number[][] {
  if (scale === "none") return rows.map((row) => [...row]);
  const d = rows[0]?.length ?? 0;
  const out = rows.map(() => new Array<number>(d).fill(0));
  for (let j = 0; j < d; ++j) {
    const xs = rows.map((row) => row[j]!);
    const sorted = [...xs].sort((a, b) => a - b);
    let center: number;
    let spread: number;
    if (scale === "zscore") {
      center = xs.reduce((a, b) => a + b, 0) / xs.length;
      spread = Math.sqrt(xs.reduce((a, x) => a + (x - center) ** 2, 0) / (xs.length - 1)); // sample sd, n − 1
    } else if (scale === "minmax") {
      center = sorted[0]!;
      spread = sorted[sorted.length - 1]! - sorted[0]!;
    } else {
      center = quantileType7(sorted, 0.5);
      spread = quantileType7(sorted, 0.75) - quantileType7(sorted, 0.25);
    }
    if (!(spread > 0)) continue;
    xs.forEach((x, i) => (out[i]![j] = (x - center) / spread));
  }
  return out;
}

const sum = (xs: readonly number[]): number => xs.reduce((a, b) => a + b, 0);
const norm = (xs: readonly number[]): number => Math.sqrt(sum(xs.map((x) => x * x)));
const centred = (xs: readonly number[]): number[] => xs.map((x) => x - sum(xs) / xs.length);

/** The five distances by their formulas (Deza and Deza, Encyclopedia of Distances, 2009, §5.1, §5.2, §17.1, §17.4). */
export const bruteDistances: Readonly<Record<MetricName, Distance>> = {
  euclidean: (x, y) => Math.sqrt(sum(x.map((v, j) => (v - y[j]!) ** 2))),
  manhattan: (x, y) => sum(x.map((v, j) => Math.abs(v - y[j]!))),
  chebyshev: (x, y) => Math.max(...x.map((v, j) => Math.abs(v - y[j]!))),
  cosine: (x, y) => 1 - sum(x.map((v, j) => v * y[j]!)) / (norm(x) * norm(y)),
  correlation: (x, y) => {
    const a = centred(x);
    const b = centred(y);
    return 1 - sum(a.map((v, j) => v * b[j]!)) / (norm(a) * norm(b));
  },
};

/** Rows on which a distance is undefined: a zero row for cosine, a constant row for correlation. */
export function isUndefinedRow(metric: MetricName, row: readonly number[]): boolean {
  if (metric === "cosine") return row.every((x) => x === 0);
  if (metric === "correlation") return row.every((x) => x === row[0]);
  return false;
}

/** Smallest |d(a, b) − r| over all pairs: far above rounding, two routes to d must decide every pair alike. */
export function tieMargin(points: Rows, distance: Distance, radius: number): number {
  let margin = Infinity;
  for (let a = 0; a < points.length; ++a) for (let b = a + 1; b < points.length; ++b) margin = Math.min(margin, Math.abs(distance(points[a]!, points[b]!) - radius));
  return margin;
}


/** b0, b1 over GF(2) of the nerve's 2-skeleton, with the triangle count and rank ∂2: the tests' one nerve reference (gf2Betti.ts). */
function bruteBetti(balls: readonly (readonly number[])[]) {
  const nerve = independentNerve(balls);
  return { b0: nerve.b0, b1: nerve.b1, triangles: nerve.triangles.length, boundaryRank: nerve.boundaryRank };
}

export interface BruteCoverOptions {
  readonly metric: MetricName;
  readonly radius: number;
  readonly landmarks: LandmarkRule;
  /** Visiting order (greedy, random) as indices into the defined rows. */
  readonly order?: readonly number[];
  /** Starting row (maximin) as an index into the defined rows. */
  readonly start?: number;
  /** Replaces the test d(a, b) ≤ r (rows a, b of `points`), e.g. by the metric's reference predicate. */
  readonly within?: (a: number, b: number) => boolean;
  /** Replaces the textbook distance between rows a, b of `points` (maximin ranks by it). */
  readonly distance?: (a: number, b: number) => number;
  /** Compute the nerve's b0/b1 (default true; O(L³) triples). */
  readonly loops?: boolean;
}

/**
 * The cover of `points` (already scaled): rows where the metric is undefined are left out, then
 * the net, closed balls, weighted edges, components and b0/b1, all as indices into `points`.
 */
export function bruteCover(points: Rows, options: BruteCoverOptions) {
  const distance = bruteDistances[options.metric];
  const defined = points.map((_, i) => i).filter((i) => !isUndefinedRow(options.metric, points[i]!));
  const local = defined.map((i) => points[i]!);
  const { within, distance: between } = options;
  const apart = (l: number, i: number): number => (between ? between(defined[l]!, defined[i]!) : distance(local[l]!, local[i]!));
  const covers = (l: number, i: number): boolean => (within ? within(defined[l]!, defined[i]!) : apart(l, i) <= options.radius);
  const net =
    options.landmarks === "maximin"
      ? bruteMaximinNet(local.length, options.start ?? 0, covers, apart)
      : bruteGreedyNet(options.order ?? local.map((_, i) => i), covers);
  const balls = bruteBalls(local.length, net, covers);
  const edges = bruteEdges(balls);
  const components = bfsComponents(net.length, edges.source, edges.target);
  const toPoint = (k: number): number => defined[k]!;
  return {
    defined,
    landmarks: net.map(toPoint),
    balls: balls.map((ball) => ball.map(toPoint)),
    edges,
    component: components.component,
    componentCount: components.count,
    cycleRank: edges.source.length - net.length + components.count,
    betti: options.loops === false ? null : bruteBetti(balls),
  };
}
